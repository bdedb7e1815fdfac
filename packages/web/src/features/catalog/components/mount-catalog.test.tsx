import { screen, waitFor, within } from '@testing-library/react';

import { makeMount, makeMounts, QUILLMERE, serveCatalog, TAMBERLIN } from '@/testing/catalog-fakes';
import { installFakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';

/** The last `GET /api/mounts` query string the page sent. */
function lastQuery(catalog: ReturnType<typeof serveCatalog>) {
  return catalog.listCalls().at(-1)?.query;
}

async function openCatalog() {
  return screen.findByRole('region', { name: 'Catalog mounts' });
}

// Whole-app renders with Blueprint's overlays take a few seconds each on a busy 2-core machine:
// this is how long a test may run before it is abandoned, not a speed check.
vi.setConfig({ testTimeout: 30_000 });

describe('Catalog page', () => {
  it('shows the first page of mounts from the server, with the total', async () => {
    const catalog = serveCatalog(installFakeApi(), { mounts: makeMounts(250) });
    renderApp({ signedInAs: 'engineer', path: '/catalog' });

    const table = await openCatalog();
    expect(await screen.findByText('250 mounts')).toBeInTheDocument();
    expect(lastQuery(catalog)).toEqual({ page: '1', pageSize: '100' });
    // Only the rows in view are rendered; the first row is there with its figures in words.
    expect(within(table).getAllByRole('button', { name: 'QM-0001' }).length).toBeGreaterThan(0);
    expect(within(table).getAllByText('Quillmere Isolation').length).toBeGreaterThan(0);
    expect(within(table).getAllByText('Open spring').length).toBeGreaterThan(0);
    expect(screen.getAllByText(/Page 1 of 3/).length).toBeGreaterThan(0);
  });

  it('asks the server for the next page and shows where it is', async () => {
    const catalog = serveCatalog(installFakeApi(), { mounts: makeMounts(250) });
    const { user } = renderApp({ signedInAs: 'engineer', path: '/catalog' });
    await screen.findByText('250 mounts');

    await user.click(screen.getAllByRole('button', { name: 'Next page' })[0]!);
    await waitFor(() => expect(lastQuery(catalog)).toMatchObject({ page: '2', pageSize: '100' }));
    expect(await screen.findAllByText(/Page 2 of 3 · rows 101–200/)).not.toHaveLength(0);
    expect((await screen.findAllByRole('button', { name: 'QM-0101' })).length).toBeGreaterThan(0);

    await user.click(screen.getAllByRole('button', { name: 'Last page' })[0]!);
    await waitFor(() => expect(lastQuery(catalog)).toMatchObject({ page: '3' }));
    expect(screen.getAllByRole('button', { name: 'Next page' })[0]).toBeDisabled();
  });

  it('sends the search once typing pauses, and the filters and sort as query parameters', async () => {
    const catalog = serveCatalog(installFakeApi(), { mounts: makeMounts(250) });
    const { user, router } = renderApp({ signedInAs: 'engineer', path: '/catalog?page=2' });
    await screen.findByText('250 mounts');
    expect(lastQuery(catalog)).toMatchObject({ page: '2' });

    await user.type(screen.getByLabelText('Search'), 'TE-');
    await waitFor(() => expect(lastQuery(catalog)).toEqual({ page: '1', pageSize: '100', q: 'TE-' }));
    expect(await screen.findByText('83 mounts')).toBeInTheDocument();

    await user.selectOptions(screen.getByLabelText('Supplier'), 'Tamberlin Elastics');
    await waitFor(() => expect(lastQuery(catalog)).toMatchObject({ supplierId: String(TAMBERLIN.id), q: 'TE-' }));

    await user.click(screen.getByLabelText('Mount types'));
    const housed = await screen.findByRole('option', { name: 'Housed spring' });
    await user.click(within(housed).getByText('Housed spring'));
    const open = await screen.findByRole('option', { name: 'Open spring' });
    await user.click(within(open).getByText('Open spring'));
    await waitFor(() => expect(lastQuery(catalog)).toMatchObject({ type: 'open_spring,housed_spring' }));

    await user.selectOptions(screen.getByLabelText('Sort by'), 'Rated load');
    await waitFor(() => expect(lastQuery(catalog)).toMatchObject({ sort: 'ratedLoadN' }));
    await user.click(screen.getByRole('button', { name: /Ascending: switch to descending/ }));
    await waitFor(() => expect(lastQuery(catalog)).toMatchObject({ sort: '-ratedLoadN', page: '1' }));

    // The whole view lives in the address, so it can be bookmarked and shared.
    const params = new URLSearchParams(router.state.location.search);
    expect(Object.fromEntries(params)).toEqual({
      q: 'TE-',
      supplier: '2',
      type: 'open_spring,housed_spring',
      sort: '-ratedLoadN',
    });

    await user.click(screen.getByRole('button', { name: 'Clear filters' }));
    await waitFor(() => expect(lastQuery(catalog)).toEqual({ page: '1', pageSize: '100' }));
    expect(screen.getByLabelText('Search')).toHaveValue('');
    expect(screen.getByLabelText('Supplier')).toHaveValue('');
  });

  it('sorts from a column header menu', async () => {
    const catalog = serveCatalog(installFakeApi(), { mounts: makeMounts(20) });
    const { user, container } = renderApp({ signedInAs: 'engineer', path: '/catalog' });
    await screen.findByText('20 mounts');

    // Columns are virtualized too; the frozen ones (supplier, part number) are always rendered.
    const headers = [...container.querySelectorAll('.bp6-table-column-header-cell')];
    const header = headers.find((cell) => cell.textContent?.startsWith('Part number'));
    const menuButton = header?.querySelector('.bp6-table-th-menu') as HTMLElement | null;
    expect(menuButton).toBeTruthy();
    await user.click(menuButton!);
    await user.click(await screen.findByRole('menuitem', { name: /Sort Z to A/ }));
    await waitFor(() => expect(lastQuery(catalog)).toMatchObject({ sort: '-partNumber' }));
    expect(screen.getByLabelText('Sort by')).toHaveValue('partNumber');
  });

  it('takes the load range in the user’s units (US: lbf) and asks in newtons', async () => {
    const catalog = serveCatalog(installFakeApi(), { mounts: makeMounts(250) });
    const { user } = renderApp({ signedInAs: 'purchaser', path: '/catalog' });
    await screen.findByText('250 mounts');

    // Purchaser Bea Buyer prefers US customary units.
    const min = screen.getByLabelText('Minimum rated load (lbf)');
    const max = screen.getByLabelText('Maximum rated load (lbf)');
    await user.type(min, '200');
    await user.type(max, '500');
    // 1 lbf = 4.4482216152605 N exactly (international avoirdupois pound × standard gravity).
    await waitFor(() => expect(lastQuery(catalog)).toMatchObject({ minLoadN: '889.644', maxLoadN: '2224.11' }));
    expect(lastQuery(catalog)?.page).toBe('1');
    // Mounts rated 500 + 10·i N with 889.644 ≤ 500 + 10·i ≤ 2224.11: i = 39 … 172, 134 of them.
    expect(await screen.findByText('134 mounts')).toBeInTheDocument();
    expect(screen.getAllByText('Rated load (lbf)').length).toBeGreaterThan(0);
  });

  it('opens a mount with the figures computed at its rated load', async () => {
    // 2,400 N on 72.5 N/mm: δ = W/k = 33.1 mm; fn = (1/2π)·√(g/δ) = 2.74 Hz with a steel spring's
    // dynamic ratio of 1 (closed form; the trade's rule of thumb 15.76/√δ[mm] gives the same).
    const mount = makeMount({ id: 7, partNumber: 'QM-S1-02400', restraintCapacityN: 6220 });
    serveCatalog(installFakeApi(), { mounts: [mount] });
    const { user, router } = renderApp({ signedInAs: 'engineer', path: '/catalog' });
    await screen.findByText('1 mount');

    await user.click(screen.getAllByRole('button', { name: 'QM-S1-02400' })[0]!);
    const drawer = await screen.findByRole('dialog', { name: 'Mount QM-S1-02400' });
    expect(router.state.location.search).toBe('?mount=7');
    const facts = within(drawer);
    expect(facts.getByText('Static deflection').nextElementSibling).toHaveTextContent('33.1 mm');
    expect(facts.getByText('Static deflection').nextElementSibling).toHaveTextContent('67 % of the maximum deflection');
    expect(facts.getByText('Natural frequency').nextElementSibling).toHaveTextContent('2.74 Hz');
    expect(facts.getByText('Damping').nextElementSibling).toHaveTextContent('ζ 0.00800 (viscous)');
    expect(facts.getByText('Temperature range').nextElementSibling).toHaveTextContent('−40 … 120 °C');
    expect(facts.getByText('Unit price').nextElementSibling).toHaveTextContent('USD 48.20');
    expect(facts.getByText('Horizontal restraint rating').nextElementSibling).toHaveTextContent('6,220 N');
    expect(facts.getByText('Uplift rating').nextElementSibling).toHaveTextContent('—');
    expect(await facts.findByRole('figure', { name: 'Static load against deflection' })).toBeInTheDocument();
    expect(facts.getByRole('figure', { name: 'Natural frequency against load' })).toBeInTheDocument();
    expect(facts.getByText('2.74 Hz at rated load')).toBeInTheDocument();
  });

  it('computes an elastomer with its dynamic stiffness ratio and names the hysteretic model', async () => {
    // δ = 1500 N / 250 N/mm = 6.00 mm; fn = (1/2π)·√(1.4·g/δ) = 7.61 Hz (closed form). The same from
    // k_dyn = 1.4 × 250 N/mm and m = 1500 N / g: (1/2π)·√(k_dyn/m) = 7.61 Hz.
    const mount = makeMount({
      id: 8,
      partNumber: 'TE-E1-01500',
      supplier: { id: TAMBERLIN.id, name: TAMBERLIN.name },
      mountType: 'elastomer_mount',
      ratedLoadN: 1500,
      verticalStiffnessNPerM: 250_000,
      dynamicStiffnessRatio: 1.4,
      dampingModel: 'hysteretic',
      dampingRatio: null,
      lossFactor: 0.15,
      maxDeflectionMm: 9,
    });
    serveCatalog(installFakeApi(), { mounts: [mount] });
    renderApp({ signedInAs: 'viewer', path: '/catalog?mount=8' });
    const drawer = await screen.findByRole('dialog', { name: 'Mount TE-E1-01500' });
    expect(within(drawer).getByText('Static deflection').nextElementSibling).toHaveTextContent('6.00 mm');
    expect(within(drawer).getByText('Natural frequency').nextElementSibling).toHaveTextContent('7.61 Hz');
    expect(within(drawer).getByText('Damping').nextElementSibling).toHaveTextContent('η 0.150 (hysteretic)');
  });

  it('shows a viewer no way to change the catalog', async () => {
    serveCatalog(installFakeApi(), { mounts: [makeMount({ id: 9, partNumber: 'QM-S1-00900' })] });
    const { user } = renderApp({ signedInAs: 'viewer', path: '/catalog' });
    await screen.findByText('1 mount');

    expect(screen.queryByRole('button', { name: 'Add mount' })).not.toBeInTheDocument();
    expect(screen.queryByLabelText('Show retired')).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Export CSV' })).toBeInTheDocument();
    const sections = screen.getByRole('navigation', { name: 'Catalog sections' });
    expect(within(sections).queryByRole('link', { name: 'Import' })).not.toBeInTheDocument();
    expect(within(sections).getByRole('link', { name: 'Suppliers' })).toBeInTheDocument();

    await user.click(screen.getAllByRole('button', { name: 'QM-S1-00900' })[0]!);
    const drawer = await screen.findByRole('dialog', { name: 'Mount QM-S1-00900' });
    expect(within(drawer).getByText('Natural frequency')).toBeInTheDocument();
    expect(within(drawer).queryByRole('button', { name: 'Edit' })).not.toBeInTheDocument();
    expect(within(drawer).queryByRole('button', { name: 'Retire' })).not.toBeInTheDocument();
  });

  it('lets a catalog manager retire a mount after confirming, and restore it', async () => {
    const fake = installFakeApi();
    serveCatalog(fake, { mounts: [makeMount({ id: 11, partNumber: 'QM-S1-01100' })] });
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog?mount=11' });
    const drawer = await screen.findByRole('dialog', { name: 'Mount QM-S1-01100' });

    await user.click(within(drawer).getByRole('button', { name: 'Retire' }));
    const alert = await screen.findByRole('alertdialog');
    expect(alert).toHaveTextContent(`Retire QM-S1-01100 of ${QUILLMERE.name}?`);
    await user.click(within(alert).getByRole('button', { name: 'Retire' }));
    await waitFor(() => expect(fake.calls('delete', '/mounts/11')).toHaveLength(1));
    expect(await within(drawer).findByText(/Retired: selections no longer offer this mount/)).toBeInTheDocument();

    await user.click(within(drawer).getByRole('button', { name: 'Restore' }));
    await waitFor(() => expect(fake.calls('patch', '/mounts/11')[0]?.body).toEqual({ active: true }));
    await waitFor(() => expect(within(drawer).getByRole('button', { name: 'Retire' })).toBeInTheDocument());
  });

  it('lets a manager include retired mounts in the list', async () => {
    const catalog = serveCatalog(installFakeApi(), {
      mounts: [makeMount({ id: 1, partNumber: 'QM-A' }), makeMount({ id: 2, partNumber: 'QM-B', active: false })],
    });
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog' });
    await screen.findByText('1 mount');
    await user.click(screen.getByLabelText('Show retired'));
    await waitFor(() => expect(lastQuery(catalog)).toMatchObject({ includeRetired: 'true' }));
    expect(await screen.findByText('2 mounts')).toBeInTheDocument();
  });

  it('edits a mount in US units and sends only the changes, in SI', async () => {
    const fake = installFakeApi();
    serveCatalog(fake, { mounts: [makeMount({ id: 12, partNumber: 'QM-S1-01200' })] });
    const manager = {
      id: 2,
      email: 'catalog@tacet.test',
      name: 'Cato Catalog',
      role: 'catalog_manager',
      unitSystem: 'US',
      mustChangePassword: false,
    } as const;
    const { user } = renderApp({ signedInAs: manager, path: '/catalog?mount=12' });
    const drawer = await screen.findByRole('dialog', { name: 'Mount QM-S1-01200' });

    await user.click(within(drawer).getByRole('button', { name: 'Edit' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit QM-S1-01200' });
    const load = within(dialog).getByLabelText('Rated load (lbf)');
    // 2,400 N shown as 539.541 lbf (÷ 4.4482216152605).
    expect(load).toHaveValue('539.541');
    await user.clear(load);
    await user.type(load, '600');
    await user.clear(within(dialog).getByLabelText('Lead time (days)'));
    await user.type(within(dialog).getByLabelText('Lead time (days)'), '28');
    await user.click(within(dialog).getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(fake.calls('patch', '/mounts/12')).toHaveLength(1));
    const body = fake.calls('patch', '/mounts/12')[0]?.body as Record<string, number>;
    expect(Object.keys(body).sort()).toEqual(['leadTimeDays', 'ratedLoadN']);
    expect(body.ratedLoadN).toBeCloseTo(600 * 4.4482216152605, 6);
    expect(body.leadTimeDays).toBe(28);
  });

  it('adds a mount in SI and opens it', async () => {
    const fake = installFakeApi();
    const catalog = serveCatalog(fake, { mounts: [] });
    fake.on('post', '/mounts', ({ body }) => {
      const input = body as { supplierId: number } & Record<string, unknown>;
      const created = makeMount({ ...(input as object), id: 77, supplier: { id: input.supplierId, name: TAMBERLIN.name } });
      catalog.mounts.push(created);
      return { status: 201, data: created };
    });
    const { user, router } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog' });
    await user.click(await screen.findByRole('button', { name: 'Add mount' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a mount' });
    // One input event per box (a paste) keeps this long form quick to fill.
    const fill = async (label: string, text: string) => {
      const box = within(dialog).getByLabelText(label);
      await user.clear(box);
      await user.click(box);
      await user.paste(text);
    };
    // Inactive suppliers are not offered for new mounts.
    expect(within(dialog).queryByRole('option', { name: 'Oswin Springworks' })).not.toBeInTheDocument();
    await user.selectOptions(within(dialog).getByLabelText('Supplier'), 'Tamberlin Elastics');
    await fill('Part number', 'TE-E1-01500');
    await user.selectOptions(within(dialog).getByLabelText('Mount type'), 'Elastomer mount');
    await fill('Rated load (N)', '1500');
    await fill('Vertical stiffness (N/mm)', '250');
    await fill('Dynamic stiffness ratio', '1.4');
    await user.click(within(dialog).getByLabelText('Hysteretic (loss factor η)'));
    await fill('Loss factor η', '0.15');
    await fill('Maximum deflection (mm)', '9');
    await user.click(within(dialog).getByRole('button', { name: 'Add mount' }));

    await waitFor(() => expect(fake.calls('post', '/mounts')).toHaveLength(1));
    expect(fake.calls('post', '/mounts')[0]?.body).toEqual({
      supplierId: TAMBERLIN.id,
      partNumber: 'TE-E1-01500',
      mountType: 'elastomer_mount',
      ratedLoadN: 1500,
      verticalStiffnessNPerM: 250_000,
      dynamicStiffnessRatio: 1.4,
      lossFactor: 0.15,
      maxDeflectionMm: 9,
      currency: 'USD',
    });
    expect(await screen.findByRole('dialog', { name: 'Mount TE-E1-01500' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?mount=77');
  });

  it('checks the mount form before sending it', async () => {
    const fake = installFakeApi();
    serveCatalog(fake, { mounts: [] });
    const { user } = renderApp({ signedInAs: 'admin', path: '/catalog' });
    await user.click(await screen.findByRole('button', { name: 'Add mount' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a mount' });
    await user.type(within(dialog).getByLabelText('Rated load (N)'), '-5');
    await user.type(within(dialog).getByLabelText('Damping ratio ζ'), '1.5');
    await user.click(within(dialog).getByRole('button', { name: 'Add mount' }));

    expect(await within(dialog).findByText('Choose a supplier')).toBeInTheDocument();
    expect(within(dialog).getByText('Enter the part number')).toBeInTheDocument();
    expect(within(dialog).getByText('Must be more than zero')).toBeInTheDocument();
    expect(within(dialog).getByText('A damping ratio is below 1')).toBeInTheDocument();
    expect(fake.calls('post', '/mounts')).toHaveLength(0);
  });

  it('exports the catalog as CSV through the API client, for any role', async () => {
    const fake = installFakeApi();
    serveCatalog(fake, { mounts: [makeMount()] });
    fake.on('get', '/mounts/export.csv', {
      status: 200,
      data: 'supplier,part_number\n',
      headers: { 'content-disposition': 'attachment; filename="tacet-catalog-2025-03-10.csv"' },
    });
    const saved: string[] = [];
    Object.defineProperty(URL, 'createObjectURL', { value: vi.fn(() => 'blob:tacet-test'), configurable: true });
    Object.defineProperty(URL, 'revokeObjectURL', { value: vi.fn(), configurable: true });
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      saved.push(this.download);
    });
    const { user } = renderApp({ signedInAs: 'viewer', path: '/catalog' });
    await user.click(await screen.findByRole('button', { name: 'Export CSV' }));

    await waitFor(() => expect(saved).toEqual(['tacet-catalog-2025-03-10.csv']));
    expect(fake.calls('get', '/mounts/export.csv')[0]?.headers.authorization).toBe('Bearer test-token');
  });

  it('shows catalog managers the import section', async () => {
    serveCatalog(installFakeApi(), { mounts: [] });
    renderApp({ signedInAs: 'catalog_manager', path: '/catalog' });
    const sections = await screen.findByRole('navigation', { name: 'Catalog sections' });
    expect(
      within(sections)
        .getAllByRole('link')
        .map((link) => link.textContent),
    ).toEqual(['Mounts', 'Import', 'Suppliers']);
    expect(await screen.findByText('No mounts match')).toBeInTheDocument();
  });

  it('explains a failed load in words', async () => {
    installFakeApi()
      .on('get', '/suppliers', { status: 200, data: [] })
      .on('get', '/mounts', { status: 400, data: { statusCode: 400, message: 'pageSize must not be greater than 500' } });
    renderApp({ signedInAs: 'viewer', path: '/catalog' });
    expect(await screen.findByText('The catalog could not be loaded')).toBeInTheDocument();
    expect(screen.getByText('PageSize must not be greater than 500.')).toBeInTheDocument();
  });
});
