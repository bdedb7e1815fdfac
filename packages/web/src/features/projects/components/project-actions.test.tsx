import { screen, waitFor, within } from '@testing-library/react';

import { makeProject } from '@/testing/design-fakes';
import { TEST_USERS } from '@/testing/factories';
import { installFakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';
import type { Project } from '@/types/design-api';

vi.setConfig({ testTimeout: 15_000 });

function serveProject(project: Project) {
  let current = project;
  const fake = installFakeApi()
    .on('get', '/projects', () => ({ status: 200, data: [current] }))
    .on('get', '/projects/:id', () => ({ status: 200, data: current }))
    .on('get', '/projects/:id/designs', { status: 200, data: [] })
    .on('patch', '/projects/:id', ({ body }) => {
      current = { ...current, ...(body as Partial<Project>) };
      return { status: 200, data: current };
    })
    .on('delete', '/projects/:id', { status: 204, data: '' });
  return fake;
}

describe('Project actions (owner and admins)', () => {
  it('renames and archives the project, sending only the change', async () => {
    const fake = serveProject(makeProject({ id: 5, name: 'Harbour Chiller Hall' }));
    const { user } = renderApp({ signedInAs: 'engineer', path: '/projects/5' });
    await user.click(await screen.findByRole('button', { name: 'Rename' }));
    const dialog = await screen.findByRole('dialog', { name: 'Rename the project' });
    const name = within(dialog).getByLabelText('Name');
    await user.clear(name);
    await user.type(name, 'Harbour Chiller Hall 2');
    await user.click(within(dialog).getByRole('button', { name: 'Rename' }));
    await waitFor(() => expect(fake.calls('patch', '/projects/:id')[0]?.body).toEqual({ name: 'Harbour Chiller Hall 2' }));

    await user.click(await screen.findByRole('button', { name: 'Archive' }));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Archive the project' }));
    await waitFor(() => expect(fake.calls('patch', '/projects/:id')[1]?.body).toEqual({ archived: true }));
    expect(await screen.findByRole('button', { name: 'Restore' })).toBeInTheDocument();
  });

  it('deletes a project without released designs and goes back to the list', async () => {
    const fake = serveProject(makeProject({ id: 6, name: 'Ridge Road Boiler House' }));
    const { user, router } = renderApp({ signedInAs: 'engineer', path: '/projects/6' });
    await user.click(await screen.findByRole('button', { name: 'Delete' }));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Delete the project' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/projects'));
    expect(fake.calls('delete', '/projects/:id')).toHaveLength(1);
  });

  it('offers nothing to an engineer who does not own the project', async () => {
    serveProject(makeProject({ id: 7, name: 'Old Quay', owner: { id: 99, name: 'Someone Else' } }));
    renderApp({ signedInAs: 'engineer', path: '/projects/7' });
    await screen.findByRole('heading', { name: 'Old Quay', level: 1 });
    expect(screen.queryByRole('button', { name: 'Rename' })).not.toBeInTheDocument();
  });

  it('disables delete while the project holds a released design', async () => {
    serveProject(
      makeProject({
        id: 8,
        name: 'Signed-off plant',
        owner: { id: TEST_USERS.engineer.id, name: TEST_USERS.engineer.name },
        statusCounts: { draft: 0, in_review: 0, released: 1, superseded: 0 },
      }),
    );
    renderApp({ signedInAs: 'engineer', path: '/projects/8' });
    expect(await screen.findByRole('button', { name: 'Delete' })).toBeDisabled();
  });
});
