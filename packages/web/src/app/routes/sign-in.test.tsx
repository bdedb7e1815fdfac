import { screen, waitFor, within } from '@testing-library/react';

import { getToken } from '@/lib/session';
import { TEST_USERS } from '@/testing/factories';
import { installFakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';

function acceptLogin() {
  return installFakeApi().on('post', '/auth/login', ({ body }) => {
    const { email, password } = body as { email: string; password: string };
    if (email === 'engineer@tacet.test' && password === 'correct horse') {
      return { status: 200, data: { accessToken: 'jwt-engineer', user: TEST_USERS.engineer } };
    }
    return { status: 401, data: { statusCode: 401, message: 'Email or password is incorrect' } };
  });
}

describe('sign-in page', () => {
  it('asks for both fields before sending anything', async () => {
    const fake = acceptLogin();
    const { user } = renderApp({ path: '/sign-in' });

    await user.click(await screen.findByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter your email address')).toBeInTheDocument();
    expect(screen.getByText('Enter your password')).toBeInTheDocument();
    expect(screen.getByLabelText('Email')).toHaveAttribute('aria-invalid', 'true');
    expect(fake.calls('post', '/auth/login')).toHaveLength(0);
  });

  it('rejects an email address that is not one', async () => {
    const fake = acceptLogin();
    const { user } = renderApp({ path: '/sign-in' });

    await user.type(await screen.findByLabelText('Email'), 'engineer');
    await user.type(screen.getByLabelText('Password'), 'whatever12');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText(/Enter a valid email address/)).toBeInTheDocument();
    expect(fake.calls('post', '/auth/login')).toHaveLength(0);
  });

  it('signs in, stores the token and goes to the page asked for', async () => {
    const fake = acceptLogin();
    const { user, router } = renderApp({ path: '/sign-in?next=%2Fcatalog' });

    await user.type(await screen.findByLabelText('Email'), '  engineer@tacet.test ');
    await user.type(screen.getByLabelText('Password'), 'correct horse');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { name: 'Catalog', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/catalog');
    expect(getToken()).toBe('jwt-engineer');
    expect(fake.calls('post', '/auth/login')[0]?.body).toEqual({ email: 'engineer@tacet.test', password: 'correct horse' });
    expect(within(screen.getByRole('banner')).getByText('Erin Engineer')).toBeInTheDocument();
  });

  it('goes to the overview when no page was asked for', async () => {
    acceptLogin();
    const { user, router } = renderApp({ path: '/sign-in' });

    await user.type(await screen.findByLabelText('Email'), 'engineer@tacet.test');
    await user.type(screen.getByLabelText('Password'), 'correct horse');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { name: 'Welcome, Erin', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/');
  });

  it('ignores a next address that leaves the app', async () => {
    acceptLogin();
    const { user, router } = renderApp({ path: '/sign-in?next=https%3A%2F%2Fexample.com%2F' });

    await user.type(await screen.findByLabelText('Email'), 'engineer@tacet.test');
    await user.type(screen.getByLabelText('Password'), 'correct horse');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
  });

  it('says so in words when the password is wrong', async () => {
    acceptLogin();
    const { user, router } = renderApp({ path: '/sign-in' });

    await user.type(await screen.findByLabelText('Email'), 'engineer@tacet.test');
    await user.type(screen.getByLabelText('Password'), 'wrong password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Email or password is incorrect');
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(getToken()).toBeNull();
  });

  it('explains a lock-out after too many attempts', async () => {
    installFakeApi().on('post', '/auth/login', {
      status: 429,
      data: { statusCode: 429, message: 'ThrottlerException: Too Many Requests' },
    });
    const { user } = renderApp({ path: '/sign-in' });

    await user.type(await screen.findByLabelText('Email'), 'engineer@tacet.test');
    await user.type(screen.getByLabelText('Password'), 'anything at all');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Too many attempts');
  });

  it('in demo mode, points to the README for demo accounts without showing any password', async () => {
    installFakeApi().on('get', '/health', { status: 200, data: { status: 'ok', demo: true } });
    renderApp({ path: '/sign-in' });
    expect(await screen.findByText('Demo accounts are listed in the README.')).toBeInTheDocument();
    expect(document.body.textContent).not.toMatch(/tacet-demo/);
  });

  it('outside demo mode, says nothing of demo accounts', async () => {
    const fake = installFakeApi().on('get', '/health', { status: 200, data: { status: 'ok', demo: false } });
    renderApp({ path: '/sign-in' });
    await screen.findByRole('button', { name: 'Sign in' });
    await waitFor(() => expect(fake.requests.some((r) => r.path === '/health')).toBe(true));
    expect(screen.queryByText(/demo accounts/i)).not.toBeInTheDocument();
  });

  it('sends a signed-in visitor straight on', async () => {
    const { router } = renderApp({ path: '/sign-in?next=%2Fprojects', signedInAs: 'viewer' });
    expect(await screen.findByRole('heading', { name: 'Projects', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/projects');
  });
});
