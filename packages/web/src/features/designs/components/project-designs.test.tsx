import { screen, waitFor, within } from '@testing-library/react';

import { listItemOf, makeDesign, makeProject, serveDesign } from '@/testing/design-fakes';
import { installFakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';
import type { Design } from '@/types/design-api';

const PROJECT = makeProject({
  id: 1,
  name: 'Harbour Chiller Hall',
  site: 'Basement plant room',
  client: 'Harbour Estates',
  description: 'Two chilled water pump skids.',
  designCount: 2,
});

const RELEASED = makeDesign({ id: 21, name: 'CHW pump 1 skid', status: 'released', revision: 2 });
const DRAFT = makeDesign({ id: 22, name: 'CHW pump 2 skid', status: 'draft' });

function serveProject(designs: Design[] = [RELEASED, DRAFT]) {
  return installFakeApi()
    .on('get', '/projects/1', { status: 200, data: PROJECT })
    .on('get', '/projects/1/designs', { status: 200, data: designs.map(listItemOf) });
}

describe('Project page', () => {
  it('shows the project and its designs with revision, status, author and last change', async () => {
    serveProject();
    renderApp({ signedInAs: 'viewer', path: '/projects/1' });

    expect(await screen.findByRole('heading', { name: 'Harbour Chiller Hall', level: 1 })).toBeInTheDocument();
    const about = screen.getByRole('region', { name: 'About this project' });
    expect(about).toHaveTextContent('Basement plant room');
    expect(about).toHaveTextContent('Two chilled water pump skids.');

    const table = await screen.findByRole('table', { name: 'Designs' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(
      rows.map((row) =>
        within(row)
          .getAllByRole('cell')
          .map((c) => c.textContent),
      ),
    ).toEqual([
      ['CHW pump 1 skid', '2', 'Released', 'Erin Engineer', '8 Jan 2025'],
      ['CHW pump 2 skid', '1', 'Draft', 'Erin Engineer', '8 Jan 2025'],
    ]);
    expect(within(rows[0]!).getByText('Released').closest('.bp6-tag')).toHaveClass('tc-status--released');
    expect(within(rows[1]!).getByRole('link', { name: 'CHW pump 2 skid' })).toHaveAttribute('href', '/designs/22');
    expect(screen.queryByRole('button', { name: 'New design' })).not.toBeInTheDocument();
  });

  it('creates a design and opens it', async () => {
    const fake = serveProject();
    const created = makeDesign({ id: 30, name: 'Condenser pump skid', projectId: 1, version: 1 });
    serveDesign(fake, created);
    fake.on('post', '/projects/:id/designs', { status: 201, data: created });
    const { user, router } = renderApp({ signedInAs: 'engineer', path: '/projects/1' });

    await user.click(await screen.findByRole('button', { name: 'New design' }));
    const dialog = await screen.findByRole('dialog', { name: 'New design' });
    await user.type(within(dialog).getByLabelText('Name'), 'Condenser pump skid');
    await user.click(within(dialog).getByRole('button', { name: 'Create and open' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/designs/30'));
    expect(fake.calls('post', '/projects/1/designs')[0]?.body).toEqual({ name: 'Condenser pump skid' });
    expect(await screen.findByRole('heading', { name: 'Condenser pump skid', level: 1 })).toBeInTheDocument();
  });

  it('shows “not found” for a project that does not exist', async () => {
    installFakeApi().on('get', '/projects/99', { status: 404, data: { statusCode: 404, message: 'Project not found' } });
    renderApp({ signedInAs: 'engineer', path: '/projects/99' });
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeInTheDocument();
  });
});
