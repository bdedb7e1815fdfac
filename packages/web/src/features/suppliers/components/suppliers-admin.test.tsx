import { screen, waitFor, within } from '@testing-library/react';

import type { Supplier } from '@/features/suppliers/types';
import { makeSupplier, OSWIN, QUILLMERE, TAMBERLIN } from '@/testing/catalog-fakes';
import { installFakeApi, type FakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';

/** Suppliers behind the fake API, answering like the catalog API contract. */
function serveSuppliers(initial: Supplier[] = [QUILLMERE, TAMBERLIN, OSWIN]): FakeApi {
  const suppliers = initial.map((supplier) => ({ ...supplier }));
  return installFakeApi()
    .on('get', '/suppliers', () => ({ status: 200, data: [...suppliers].sort((a, b) => a.name.localeCompare(b.name)) }))
    .on('post', '/suppliers', ({ body }) => {
      const input = body as { name: string; contactEmail?: string; phone?: string };
      if (suppliers.some((supplier) => supplier.name.toLowerCase() === input.name.toLowerCase())) {
        return { status: 409, data: { statusCode: 409, message: 'A supplier with this name already exists' } };
      }
      const created = makeSupplier({ id: 50 + suppliers.length, ...input });
      suppliers.push(created);
      return { status: 201, data: created };
    })
    .on('patch', '/suppliers/:id', ({ params, body }) => {
      const supplier = suppliers.find((candidate) => candidate.id === Number(params.id));
      if (!supplier) return { status: 404, data: { statusCode: 404, message: 'Supplier not found' } };
      Object.assign(supplier, body);
      return { status: 200, data: supplier };
    });
}

async function openSuppliers() {
  return screen.findByRole('table', { name: 'Suppliers' });
}

// Whole-app renders with Blueprint's overlays take a few seconds each on a busy 2-core machine:
// this is how long a test may run before it is abandoned, not a speed check.
vi.setConfig({ testTimeout: 30_000 });

describe('Suppliers page', () => {
  it('lists every supplier with contact details, mount count and status', async () => {
    serveSuppliers();
    renderApp({ signedInAs: 'engineer', path: '/catalog/suppliers' });
    const table = await openSuppliers();
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((row) => within(row).getAllByRole('cell')[0]?.textContent)).toEqual([
      'Oswin Springworks',
      'Quillmere Isolation',
      'Tamberlin Elastics',
    ]);
    expect(
      within(rows[1]!)
        .getAllByRole('cell')
        .map((cell) => cell.textContent),
    ).toEqual(['Quillmere Isolation', 'orders@quillmere.test', '+1 555 0100', '180', 'Active']);
    expect(rows[0]).toHaveTextContent('Inactive');
    expect(screen.getByText('3 suppliers, 2 active')).toBeInTheDocument();
  });

  it('lets viewers and engineers read only', async () => {
    serveSuppliers();
    renderApp({ signedInAs: 'viewer', path: '/catalog/suppliers' });
    await openSuppliers();
    expect(screen.queryByRole('button', { name: 'Add supplier' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Edit / })).not.toBeInTheDocument();
  });

  it('checks the supplier form before sending it', async () => {
    const fake = serveSuppliers();
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/suppliers' });
    await openSuppliers();

    await user.click(screen.getByRole('button', { name: 'Add supplier' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a supplier' });
    await user.type(within(dialog).getByLabelText('Contact email'), 'sales-at-example');
    await user.type(within(dialog).getByLabelText('Phone'), 'call us');
    await user.click(within(dialog).getByRole('button', { name: 'Add supplier' }));

    expect(await within(dialog).findByText('Enter the supplier’s name')).toBeInTheDocument();
    expect(within(dialog).getByText('Enter a valid email address, like sales@example.com')).toBeInTheDocument();
    expect(within(dialog).getByText('Use digits, spaces and + ( ) - . only')).toBeInTheDocument();
    expect(fake.calls('post', '/suppliers')).toHaveLength(0);
  });

  it('adds a supplier, leaving out the empty boxes', async () => {
    const fake = serveSuppliers();
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/suppliers' });
    await openSuppliers();

    await user.click(screen.getByRole('button', { name: 'Add supplier' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a supplier' });
    await user.type(within(dialog).getByLabelText('Name'), '  Varrow Dampers ');
    await user.type(within(dialog).getByLabelText('Contact email'), 'quotes@varrow.test');
    await user.click(within(dialog).getByRole('button', { name: 'Add supplier' }));

    await waitFor(() => expect(screen.queryByRole('dialog', { name: 'Add a supplier' })).not.toBeInTheDocument());
    expect(fake.calls('post', '/suppliers')[0]?.body).toEqual({ name: 'Varrow Dampers', contactEmail: 'quotes@varrow.test' });
    expect(await screen.findByText('Varrow Dampers')).toBeInTheDocument();
    expect(screen.getByText('4 suppliers, 3 active')).toBeInTheDocument();
  });

  it('explains a name that is already taken', async () => {
    serveSuppliers();
    const { user } = renderApp({ signedInAs: 'admin', path: '/catalog/suppliers' });
    await openSuppliers();
    await user.click(screen.getByRole('button', { name: 'Add supplier' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a supplier' });
    await user.type(within(dialog).getByLabelText('Name'), 'quillmere isolation');
    await user.click(within(dialog).getByRole('button', { name: 'Add supplier' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent('A supplier with this name already exists');
  });

  it('edits a supplier and sends only what changed', async () => {
    const fake = serveSuppliers();
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/suppliers' });
    await openSuppliers();

    await user.click(screen.getByRole('button', { name: 'Edit Tamberlin Elastics' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit Tamberlin Elastics' });
    await user.type(within(dialog).getByLabelText('Phone'), '+44 20 7946 0000');
    await user.click(within(dialog).getByLabelText(/Active/));
    await user.click(within(dialog).getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(fake.calls('patch', '/suppliers/2')).toHaveLength(1));
    expect(fake.calls('patch', '/suppliers/2')[0]?.body).toEqual({ phone: '+44 20 7946 0000', active: false });
    await waitFor(() => expect(screen.getByText('3 suppliers, 1 active')).toBeInTheDocument());
  });
});
