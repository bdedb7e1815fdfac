import { screen, waitFor, within } from '@testing-library/react';

import { makeUser, userRecordFor, type UserRecord } from '@/testing/factories';
import { installFakeApi, type FakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';

/** A small in-memory user list behind the fake API, answering like the server does. */
function serveUsers(initial: UserRecord[]): { fake: FakeApi; users: UserRecord[] } {
  const users = [...initial];
  const fake = installFakeApi()
    .on('get', '/users', () => ({
      status: 200,
      data: [...users].sort((a, b) => a.email.localeCompare(b.email)),
    }))
    .on('post', '/users', ({ body }) => {
      const input = body as Omit<UserRecord, 'id' | 'active' | 'createdAt' | 'updatedAt'> & { password: string };
      if (users.some((user) => user.email === input.email)) {
        return { status: 409, data: { statusCode: 409, message: 'A user with this email already exists' } };
      }
      const created = makeUser({ email: input.email, name: input.name, role: input.role, unitSystem: input.unitSystem });
      users.push(created);
      return { status: 201, data: created };
    })
    .on('patch', '/users/:id', ({ params, body }) => {
      const user = users.find((candidate) => candidate.id === Number(params.id));
      if (!user) return { status: 404, data: { statusCode: 404, message: 'User not found' } };
      Object.assign(user, body);
      return { status: 200, data: user };
    })
    .on('delete', '/users/:id', ({ params }) => {
      const user = users.find((candidate) => candidate.id === Number(params.id));
      if (!user) return { status: 404, data: { statusCode: 404, message: 'User not found' } };
      user.active = false;
      return { status: 200, data: user };
    });
  return { fake, users };
}

const PEOPLE = () => [userRecordFor('admin'), userRecordFor('engineer'), userRecordFor('purchaser', { active: false })];

async function openPeople() {
  const table = await screen.findByRole('table', { name: 'People' });
  return table;
}

describe('People page', () => {
  it('lists every account with its role, units and status', async () => {
    serveUsers(PEOPLE());
    renderApp({ signedInAs: 'admin', path: '/admin/users' });

    const table = await openPeople();
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((row) => within(row).getAllByRole('cell')[0]?.textContent)).toEqual([
      'admin@tacet.test',
      'buyer@tacet.test',
      'engineer@tacet.test',
    ]);
    const buyer = rows[1]!;
    expect(buyer).toHaveTextContent('Bea Buyer');
    expect(buyer).toHaveTextContent('Purchaser');
    expect(buyer).toHaveTextContent('US customary');
    expect(buyer).toHaveTextContent('Deactivated');
    expect(rows[2]).toHaveTextContent('Active');
    expect(screen.getByText('3 people, 2 active')).toBeInTheDocument();
  });

  it('offers no way to deactivate yourself or an inactive account', async () => {
    serveUsers(PEOPLE());
    renderApp({ signedInAs: 'admin', path: '/admin/users' });
    await openPeople();
    expect(screen.queryByRole('button', { name: 'Deactivate Ada Admin' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Deactivate Bea Buyer' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Deactivate Erin Engineer' })).toBeInTheDocument();
  });

  it('checks the new-person form before sending it', async () => {
    const { fake } = serveUsers(PEOPLE());
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/users' });
    await openPeople();

    await user.click(screen.getByRole('button', { name: 'Add person' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a person' });
    await user.type(within(dialog).getByLabelText('Email'), 'not-an-email');
    await user.type(within(dialog).getByLabelText('Initial password'), 'short');
    await user.click(within(dialog).getByRole('button', { name: 'Add person' }));

    expect(await within(dialog).findByText(/Enter a valid email address/)).toBeInTheDocument();
    expect(within(dialog).getByText('Enter the person’s name')).toBeInTheDocument();
    expect(within(dialog).getByText('The initial password needs at least 10 characters')).toBeInTheDocument();
    expect(fake.calls('post', '/users')).toHaveLength(0);
  });

  it('adds a person and shows them in the list', async () => {
    const { fake } = serveUsers(PEOPLE());
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/users' });
    await openPeople();

    await user.click(screen.getByRole('button', { name: 'Add person' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a person' });
    await user.type(within(dialog).getByLabelText('Email'), 'quinn@tacet.test');
    await user.type(within(dialog).getByLabelText('Name'), 'Quinn Quartz');
    await user.selectOptions(within(dialog).getByLabelText('Role'), 'Catalog manager');
    await user.selectOptions(within(dialog).getByLabelText('Units'), 'US');
    await user.type(within(dialog).getByLabelText('Initial password'), 'a long enough one');
    await user.click(within(dialog).getByRole('button', { name: 'Add person' }));

    await waitFor(() => expect(screen.queryByRole('dialog', { name: 'Add a person' })).not.toBeInTheDocument());
    expect(fake.calls('post', '/users')[0]?.body).toEqual({
      email: 'quinn@tacet.test',
      name: 'Quinn Quartz',
      role: 'catalog_manager',
      unitSystem: 'US',
      password: 'a long enough one',
    });
    expect(await screen.findByText('quinn@tacet.test')).toBeInTheDocument();
    expect(screen.getByText('4 people, 3 active')).toBeInTheDocument();
  });

  it('shows the server’s refusal of a taken email in words', async () => {
    serveUsers(PEOPLE());
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/users' });
    await openPeople();

    await user.click(screen.getByRole('button', { name: 'Add person' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a person' });
    await user.type(within(dialog).getByLabelText('Email'), 'engineer@tacet.test');
    await user.type(within(dialog).getByLabelText('Name'), 'Erin Again');
    await user.type(within(dialog).getByLabelText('Initial password'), 'a long enough one');
    await user.click(within(dialog).getByRole('button', { name: 'Add person' }));

    expect(await within(dialog).findByRole('alert')).toHaveTextContent('A user with this email already exists.');
  });

  it('shows server field errors beside the fields', async () => {
    const { fake } = serveUsers(PEOPLE());
    fake.on('post', '/users', {
      status: 400,
      data: {
        statusCode: 400,
        message: 'Validation failed',
        errors: [{ field: 'email', message: 'Email must be an email' }],
      },
    });
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/users' });
    await openPeople();

    await user.click(screen.getByRole('button', { name: 'Add person' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a person' });
    await user.type(within(dialog).getByLabelText('Email'), 'odd@tacet.test');
    await user.type(within(dialog).getByLabelText('Name'), 'Odd One');
    await user.type(within(dialog).getByLabelText('Initial password'), 'a long enough one');
    await user.click(within(dialog).getByRole('button', { name: 'Add person' }));

    // once, beside the email (no general message repeating it)
    expect(await within(dialog).findByText('Email must be an email')).toBeInTheDocument();
    expect(within(dialog).getAllByText(/Email must be an email/)).toHaveLength(1);
  });

  it('changes a role and sends only what changed', async () => {
    const { fake } = serveUsers(PEOPLE());
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/users' });
    await openPeople();

    await user.click(screen.getByRole('button', { name: 'Edit Erin Engineer' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit Erin Engineer' });
    await user.selectOptions(within(dialog).getByLabelText('Role'), 'viewer');
    await user.click(within(dialog).getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(fake.calls('patch', '/users/3')).toHaveLength(1));
    expect(fake.calls('patch', '/users/3')[0]?.body).toEqual({ role: 'viewer' });
    const row = (await screen.findByText('engineer@tacet.test')).closest('tr')!;
    await waitFor(() => expect(row).toHaveTextContent('Viewer'));
  });

  it('does not let an admin change their own role or deactivate themselves', async () => {
    serveUsers(PEOPLE());
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/users' });
    await openPeople();

    await user.click(screen.getByRole('button', { name: 'Edit Ada Admin' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit Ada Admin' });
    expect(within(dialog).getByLabelText('Role')).toBeDisabled();
    expect(within(dialog).getByLabelText(/Active/)).toBeDisabled();
  });

  it('deactivates after confirmation', async () => {
    const { fake } = serveUsers(PEOPLE());
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/users' });
    await openPeople();

    await user.click(screen.getByRole('button', { name: 'Deactivate Erin Engineer' }));
    const alert = await screen.findByRole('alertdialog');
    expect(alert).toHaveTextContent('Deactivate Erin Engineer?');
    await user.click(within(alert).getByRole('button', { name: 'Deactivate' }));

    await waitFor(() => expect(fake.calls('delete', '/users/3')).toHaveLength(1));
    await waitFor(() => expect(screen.getByText('3 people, 1 active')).toBeInTheDocument());
  });

  it('cancelling the confirmation deactivates no one', async () => {
    const { fake } = serveUsers(PEOPLE());
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/users' });
    await openPeople();

    await user.click(screen.getByRole('button', { name: 'Deactivate Erin Engineer' }));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Cancel' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    expect(fake.calls('delete', '/users/:id')).toHaveLength(0);
  });

  it('explains a failed load', async () => {
    installFakeApi().on('get', '/users', { status: 500, data: { statusCode: 500, message: 'Internal server error' } });
    renderApp({ signedInAs: 'admin', path: '/admin/users' });
    expect(await screen.findByText('The list of people could not be loaded')).toBeInTheDocument();
    expect(screen.getByText(/Something went wrong on the server/)).toBeInTheDocument();
  });
});
