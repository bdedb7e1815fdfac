import { screen, waitFor, within } from '@testing-library/react';

import { installFakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';

vi.setConfig({ testTimeout: 15_000 });

/** One message per problem, at its field (PRODUCT.md "One voice"); a general message only for what has no field. */
describe('New project: the server’s refusal', () => {
  const refuse = (errors: Array<{ field: string; message: string }>) =>
    installFakeApi()
      .on('get', '/projects', { status: 200, data: [] })
      .on('post', '/projects', { status: 400, data: { statusCode: 400, message: 'Validation failed', errors } });

  const submit = async (name: string) => {
    const { user } = renderApp({ signedInAs: 'engineer', path: '/projects' });
    await user.click(await screen.findByRole('button', { name: 'New project' }));
    const dialog = await screen.findByRole('dialog', { name: 'New project' });
    await user.type(within(dialog).getByLabelText('Name'), name);
    await user.click(within(dialog).getByRole('button', { name: 'Create project' }));
    return dialog;
  };

  it('shows a problem with a field once, beside the field', async () => {
    const fake = refuse([{ field: 'name', message: 'A project with that name already exists in your firm' }]);
    const dialog = await submit('Harbour Chiller Hall');
    await waitFor(() => expect(fake.calls('post', '/projects')).toHaveLength(1));
    const shown = await within(dialog).findAllByText(/A project with that name already exists/);
    expect(shown).toHaveLength(1);
    expect(within(dialog).getByLabelText('Name')).toHaveAccessibleDescription(/A project with that name already exists/);
    expect(within(dialog).queryByText(/Some fields need attention/)).not.toBeInTheDocument();
  });

  it('says in the general message what has no field on the form, and only that', async () => {
    refuse([
      { field: 'name', message: 'Name must be at most 120 characters long' },
      { field: 'owner', message: 'Owner is not expected here' },
    ]);
    const dialog = await submit('Ridge Road');
    expect(await within(dialog).findByText(/Some fields need attention — Owner is not expected here\./)).toBeInTheDocument();
    expect(within(dialog).getAllByText(/Name must be at most 120 characters long/)).toHaveLength(1);
  });
});
