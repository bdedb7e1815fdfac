import { screen, waitFor, within } from '@testing-library/react';

import { TEST_USERS } from '@/testing/factories';
import { installFakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';

function serveProfile() {
  const me = { ...TEST_USERS.engineer, active: true, createdAt: '2025-01-01T00:00:00Z', updatedAt: '2025-01-01T00:00:00Z' };
  return installFakeApi()
    .on('patch', '/auth/me', ({ body }) => {
      Object.assign(me, body);
      return { status: 200, data: { ...me } };
    })
    .on('post', '/auth/me/password', ({ body }) => {
      const { currentPassword } = body as { currentPassword: string };
      if (currentPassword === 'refused by the rules') {
        return {
          status: 400,
          data: {
            statusCode: 400,
            message: 'Validation failed',
            errors: [{ field: 'newPassword', message: 'New password must not contain the email address' }],
          },
        };
      }
      if (currentPassword !== 'the old secret') {
        return { status: 400, data: { statusCode: 400, message: 'Current password is incorrect' } };
      }
      return { status: 204 };
    });
}

function preview() {
  return screen.getByRole('table', { name: 'How figures appear' });
}

describe('Account page', () => {
  it('switches every figure to US customary once the preference is saved', async () => {
    const fake = serveProfile();
    const { user } = renderApp({ signedInAs: 'engineer', path: '/account' });

    await screen.findByRole('heading', { name: 'Your account', level: 1 });
    expect(preview()).toHaveTextContent('25.4 mm');
    expect(preview()).toHaveTextContent('2,450 N');

    await user.click(screen.getByLabelText(/US customary/));
    // Not saved yet: figures keep the stored preference.
    expect(preview()).toHaveTextContent('25.4 mm');
    await user.click(screen.getByRole('button', { name: 'Save profile' }));

    await waitFor(() => expect(preview()).toHaveTextContent('1.00 in'));
    expect(preview()).toHaveTextContent('551 lbf');
    expect(preview()).toHaveTextContent('104 °F');
    expect(fake.calls('patch', '/auth/me')[0]?.body).toEqual({ unitSystem: 'US' });
    expect(screen.getByText('Your profile is saved.')).toBeInTheDocument();
  });

  it('renames the user, and the top bar follows', async () => {
    const fake = serveProfile();
    const { user } = renderApp({ signedInAs: 'engineer', path: '/account' });

    const name = await screen.findByLabelText('Name');
    await user.clear(name);
    await user.type(name, 'Erin Q. Engineer');
    await user.click(screen.getByRole('button', { name: 'Save profile' }));

    await waitFor(() => expect(within(screen.getByRole('banner')).getByText('Erin Q. Engineer')).toBeInTheDocument());
    expect(fake.calls('patch', '/auth/me')[0]?.body).toEqual({ name: 'Erin Q. Engineer' });
  });

  it('requires a name', async () => {
    const fake = serveProfile();
    const { user } = renderApp({ signedInAs: 'engineer', path: '/account' });

    await user.clear(await screen.findByLabelText('Name'));
    await user.click(screen.getByRole('button', { name: 'Save profile' }));

    expect(await screen.findByText('Enter your name')).toBeInTheDocument();
    expect(fake.calls('patch', '/auth/me')).toHaveLength(0);
  });

  it('checks the new password before sending it', async () => {
    const fake = serveProfile();
    const { user } = renderApp({ signedInAs: 'engineer', path: '/account' });

    await user.type(await screen.findByLabelText('Current password'), 'the old secret');
    await user.type(screen.getByLabelText('New password'), 'too short');
    await user.type(screen.getByLabelText('New password again'), 'different');
    await user.click(screen.getByRole('button', { name: 'Change password' }));

    expect(await screen.findByText('The new password needs at least 10 characters')).toBeInTheDocument();
    expect(screen.getByText('The two new passwords do not match')).toBeInTheDocument();
    expect(fake.calls('post', '/auth/me/password')).toHaveLength(0);
  });

  it('says when the current password is wrong', async () => {
    serveProfile();
    const { user } = renderApp({ signedInAs: 'engineer', path: '/account' });

    await user.type(await screen.findByLabelText('Current password'), 'not the one');
    await user.type(screen.getByLabelText('New password'), 'a brand new secret');
    await user.type(screen.getByLabelText('New password again'), 'a brand new secret');
    await user.click(screen.getByRole('button', { name: 'Change password' }));

    const form = screen.getByRole('form', { name: 'Change password' });
    expect(await within(form).findByRole('alert')).toHaveTextContent('Current password is incorrect.');
  });

  it('shows a refused new password once, at its field', async () => {
    serveProfile();
    const { user } = renderApp({ signedInAs: 'engineer', path: '/account' });

    await user.type(await screen.findByLabelText('Current password'), 'refused by the rules');
    await user.type(screen.getByLabelText('New password'), 'a brand new secret');
    await user.type(screen.getByLabelText('New password again'), 'a brand new secret');
    await user.click(screen.getByRole('button', { name: 'Change password' }));

    const form = screen.getByRole('form', { name: 'Change password' });
    expect(await within(form).findByText('New password must not contain the email address')).toBeInTheDocument();
    expect(within(form).getAllByText(/must not contain the email address/)).toHaveLength(1);
  });

  it('changes the password and clears the form', async () => {
    const fake = serveProfile();
    const { user } = renderApp({ signedInAs: 'engineer', path: '/account' });

    await user.type(await screen.findByLabelText('Current password'), 'the old secret');
    await user.type(screen.getByLabelText('New password'), 'a brand new secret');
    await user.type(screen.getByLabelText('New password again'), 'a brand new secret');
    await user.click(screen.getByRole('button', { name: 'Change password' }));

    expect(await screen.findByText(/Your password has been changed/)).toBeInTheDocument();
    expect(fake.calls('post', '/auth/me/password')[0]?.body).toEqual({
      currentPassword: 'the old secret',
      newPassword: 'a brand new secret',
    });
    expect(screen.getByLabelText('Current password')).toHaveValue('');
  });
});
