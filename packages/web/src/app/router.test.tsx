import { screen, waitFor, within } from '@testing-library/react';

import { getToken } from '@/lib/session';
import { TEST_USERS } from '@/testing/factories';
import { installFakeApi, networkError } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';

describe('routing and guards', () => {
  it('sends a signed-out visitor to sign in, remembering the page', async () => {
    const { router } = renderApp({ path: '/admin/users' });
    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?next=%2Fadmin%2Fusers');
  });

  it('sends a signed-out visitor from the start page to a plain sign-in', async () => {
    const { router } = renderApp({ path: '/' });
    await screen.findByRole('button', { name: 'Sign in' });
    expect(router.state.location.search).toBe('');
  });

  it.each([
    ['engineer', '/admin/users'],
    ['viewer', '/purchasing'],
    ['engineer', '/purchasing/designs/7'],
    ['catalog_manager', '/projects'],
    ['purchaser', '/admin/outbox'],
  ] as const)('tells a %s that %s is not for their role', async (role, path) => {
    renderApp({ signedInAs: role, path });
    expect(await screen.findByText('Your role does not give access to this page')).toBeInTheDocument();
    // The frame stays, so the user can go elsewhere.
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeInTheDocument();
  });

  it('shows a not-found page for an unknown address', async () => {
    renderApp({ signedInAs: 'viewer', path: '/no/such/page' });
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeInTheDocument();
  });

  it('opens the purchasing queue for an admin', async () => {
    installFakeApi().on('get', '/purchasing/designs', { status: 200, data: [] });
    renderApp({ signedInAs: 'admin', path: '/purchasing' });
    expect(await screen.findByRole('heading', { name: 'Purchasing', level: 1 })).toBeInTheDocument();
    expect(await screen.findByText('Nothing released yet')).toBeInTheDocument();
  });

  it('shows the overview with the cautions and the areas of the role', async () => {
    renderApp({ signedInAs: 'catalog_manager', path: '/' });
    expect(await screen.findByRole('heading', { name: 'Welcome, Cato', level: 1 })).toBeInTheDocument();
    const areas = screen.getByRole('region', { name: 'Your areas' });
    expect(
      within(areas)
        .getAllByRole('heading', { level: 3 })
        .map((h) => h.textContent),
    ).toEqual(['Catalog']);
    expect(within(areas).getByText(/import the catalog from CSV/)).toBeInTheDocument();
    const cautions = screen.getByRole('region', { name: 'Cautions' });
    expect(cautions).toHaveTextContent('licensed engineer');
    expect(cautions).toHaveTextContent('seismic and wind restraint');
    expect(cautions).toHaveTextContent('confirmed with the supplier before purchase');
  });

  it('shows who is signed in and signs out', async () => {
    const { user, router } = renderApp({ signedInAs: 'admin', path: '/admin/outbox' });
    const bar = await screen.findByRole('banner');
    expect(within(bar).getByText('Ada Admin')).toBeInTheDocument();
    expect(within(bar).getByText('Administrator')).toBeInTheDocument();

    await user.click(within(bar).getByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('');
    expect(getToken()).toBeNull();
  });

  it('loads the user from /api/auth/me when a token is stored', async () => {
    const fake = installFakeApi().on('get', '/auth/me', {
      status: 200,
      data: { ...TEST_USERS.purchaser, active: true, createdAt: '2025-01-01T00:00:00Z', updatedAt: '2025-01-01T00:00:00Z' },
    });
    window.localStorage.setItem('tacet.token', 'stored');
    renderApp({ path: '/purchasing' });

    expect(await screen.findByRole('heading', { name: 'Purchasing', level: 1 })).toBeInTheDocument();
    expect(within(screen.getByRole('banner')).getByText('Bea Buyer')).toBeInTheDocument();
    expect(fake.calls('get', '/auth/me')[0]?.headers.authorization).toBe('Bearer stored');
  });

  it('sends the user to sign in when the stored token is no longer accepted', async () => {
    installFakeApi().on('get', '/auth/me', { status: 401, data: { statusCode: 401, message: 'Unauthorized' } });
    window.localStorage.setItem('tacet.token', 'expired');
    const { router } = renderApp({ path: '/catalog' });

    expect(await screen.findByText(/Your session has ended/)).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?next=%2Fcatalog');
    expect(getToken()).toBeNull();
  });

  it('offers to try again when the server cannot be reached', async () => {
    let reachable = false;
    installFakeApi().on('get', '/auth/me', () => {
      if (!reachable) throw networkError();
      return { status: 200, data: TEST_USERS.viewer };
    });
    window.localStorage.setItem('tacet.token', 'stored');
    const { user } = renderApp({ path: '/' });

    expect(await screen.findByText('Tacet cannot load your session')).toBeInTheDocument();
    expect(screen.getByText(/Cannot reach the Tacet server/)).toBeInTheDocument();
    reachable = true;
    await user.click(screen.getByRole('button', { name: 'Try again' }));
    await waitFor(() => expect(screen.getByRole('heading', { name: 'Welcome, Vic', level: 1 })).toBeInTheDocument());
  });
});
