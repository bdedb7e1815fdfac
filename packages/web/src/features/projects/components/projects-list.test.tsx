import { screen, waitFor, within } from '@testing-library/react';

import { makeProject } from '@/testing/design-fakes';
import { installFakeApi, type FakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';
import type { CreateProjectInput, Project } from '@/types/design-api';

function serveProjects(initial: Project[]): { fake: FakeApi; projects: Project[] } {
  const projects = [...initial];
  const fake = installFakeApi()
    .on('get', '/projects', () => ({ status: 200, data: projects }))
    .on('get', '/projects/:id', ({ params }) => {
      const project = projects.find((p) => p.id === Number(params.id));
      return project ? { status: 200, data: project } : { status: 404, data: { statusCode: 404, message: 'Project not found' } };
    })
    .on('get', '/projects/:id/designs', { status: 200, data: [] })
    .on('post', '/projects', ({ body }) => {
      const input = body as CreateProjectInput;
      const created = makeProject({
        name: input.name,
        site: input.site ?? null,
        client: input.client ?? null,
        description: input.description ?? null,
        designCount: 0,
      });
      projects.push(created);
      return { status: 201, data: created };
    });
  return { fake, projects };
}

const PROJECTS = () => [
  makeProject({
    id: 1,
    name: 'Harbour Chiller Hall',
    site: 'Basement plant room',
    client: 'Harbour Estates',
    designCount: 2,
    statusCounts: { draft: 0, in_review: 1, released: 1, superseded: 0 },
  }),
  makeProject({
    id: 2,
    name: 'Ridge Road Boiler House',
    site: null,
    client: null,
    designCount: 1,
    owner: { id: 9, name: 'Chris Checker' },
    updatedAt: '2025-02-03T08:00:00.000Z',
  }),
];

describe('Projects page', () => {
  it('lists the projects with site, client, designs, owner and last change', async () => {
    serveProjects(PROJECTS());
    renderApp({ signedInAs: 'viewer', path: '/projects' });

    const table = await screen.findByRole('table', { name: 'Projects' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    const cells = within(rows[0]!)
      .getAllByRole('cell')
      .map((cell) => cell.textContent);
    expect(cells).toEqual([
      'Harbour Chiller Hall',
      'Basement plant room',
      'Harbour Estates',
      '2',
      '1 in check1 released',
      'Erin Engineer',
      '8 Jan 2025',
    ]);
    expect(
      within(rows[1]!)
        .getAllByRole('cell')
        .map((cell) => cell.textContent),
    ).toEqual(['Ridge Road Boiler House', '—', '—', '1', '—', 'Chris Checker', '3 Feb 2025']);
    expect(within(rows[0]!).getByRole('link', { name: 'Harbour Chiller Hall' })).toHaveAttribute('href', '/projects/1');
    expect(screen.getByText('2 projects, 3 designs')).toBeInTheDocument();
  });

  it('hides archived projects until asked', async () => {
    serveProjects([...PROJECTS(), makeProject({ id: 3, name: 'Old Quay Pump House', archived: true })]);
    const { user } = renderApp({ signedInAs: 'viewer', path: '/projects' });
    const table = await screen.findByRole('table', { name: 'Projects' });
    expect(within(table).queryByText('Old Quay Pump House')).not.toBeInTheDocument();
    await user.click(screen.getByLabelText('Show archived projects (1)'));
    expect(within(table).getByText('Old Quay Pump House')).toBeInTheDocument();
  });

  it('offers “New project” to engineers and admins only', async () => {
    serveProjects(PROJECTS());
    renderApp({ signedInAs: 'viewer', path: '/projects' });
    await screen.findByRole('table', { name: 'Projects' });
    expect(screen.queryByRole('button', { name: 'New project' })).not.toBeInTheDocument();
  });

  it('checks the name before sending', async () => {
    const { fake } = serveProjects(PROJECTS());
    const { user } = renderApp({ signedInAs: 'engineer', path: '/projects' });
    await screen.findByRole('table', { name: 'Projects' });

    await user.click(screen.getByRole('button', { name: 'New project' }));
    const dialog = await screen.findByRole('dialog', { name: 'New project' });
    await user.click(within(dialog).getByRole('button', { name: 'Create project' }));

    expect(await within(dialog).findByText('Give the project a name')).toBeInTheDocument();
    expect(fake.calls('post', '/projects')).toHaveLength(0);
  });

  it('creates a project, leaving blank fields out, and opens it', async () => {
    const { fake } = serveProjects(PROJECTS());
    const { user, router } = renderApp({ signedInAs: 'engineer', path: '/projects' });
    await screen.findByRole('table', { name: 'Projects' });

    await user.click(screen.getByRole('button', { name: 'New project' }));
    const dialog = await screen.findByRole('dialog', { name: 'New project' });
    await user.type(within(dialog).getByLabelText('Name'), '  Quarry Lane Pumping Station ');
    await user.type(within(dialog).getByLabelText('Site'), 'Pump hall 2');
    await user.click(within(dialog).getByRole('button', { name: 'Create project' }));

    await waitFor(() => expect(fake.calls('post', '/projects')).toHaveLength(1));
    expect(fake.calls('post', '/projects')[0]?.body).toEqual({ name: 'Quarry Lane Pumping Station', site: 'Pump hall 2' });
    expect(await screen.findByRole('heading', { name: 'Quarry Lane Pumping Station', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toMatch(/^\/projects\/\d+$/);
    expect(screen.getByText('Pump hall 2')).toBeInTheDocument();
  });

  it('shows the server’s refusal in words', async () => {
    const { fake } = serveProjects(PROJECTS());
    fake.on('post', '/projects', {
      status: 400,
      data: { statusCode: 400, message: 'Validation failed', errors: [{ field: 'name', message: 'Name is too long' }] },
    });
    const { user } = renderApp({ signedInAs: 'admin', path: '/projects' });
    await screen.findByRole('table', { name: 'Projects' });

    await user.click(screen.getByRole('button', { name: 'New project' }));
    const dialog = await screen.findByRole('dialog', { name: 'New project' });
    await user.type(within(dialog).getByLabelText('Name'), 'Something');
    await user.click(within(dialog).getByRole('button', { name: 'Create project' }));
    // once, beside the name (no general message repeating it)
    expect(await within(dialog).findByText('Name is too long')).toBeInTheDocument();
    expect(within(dialog).getAllByText(/Name is too long/)).toHaveLength(1);
  });

  it('says so when there are no projects yet', async () => {
    serveProjects([]);
    renderApp({ signedInAs: 'engineer', path: '/projects' });
    expect(await screen.findByText('No projects yet')).toBeInTheDocument();
    expect(screen.getByText(/Start one with “New project”/)).toBeInTheDocument();
  });
});
