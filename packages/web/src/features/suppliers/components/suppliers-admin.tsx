import { Button, Callout, NonIdealState } from '@blueprintjs/core';
import { PlusIcon, OfficeIcon } from '@blueprintjs/icons';
import { useState } from 'react';

import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { errorMessage } from '@/lib/api-errors';

import { useSuppliers } from '../api/get-suppliers';
import type { Supplier } from '../types';
import { SupplierFormDialog } from './supplier-form-dialog';
import { SuppliersTable } from './suppliers-table';

function summary(suppliers: readonly Supplier[]): string {
  const active = suppliers.filter((supplier) => supplier.active).length;
  const count = suppliers.length === 1 ? '1 supplier' : `${suppliers.length} suppliers`;
  return `${count}, ${active} active`;
}

export interface SuppliersAdminProps {
  /** Catalog managers and admins add and edit; everyone else reads. */
  canWrite: boolean;
}

/** The suppliers page: who sells the catalog's mounts and how to reach them. */
export function SuppliersAdmin({ canWrite }: SuppliersAdminProps) {
  const suppliers = useSuppliers();
  const [creating, setCreating] = useState(false);
  const [editing, setEditing] = useState<Supplier | null>(null);

  return (
    <>
      <PageHeader
        title="Suppliers"
        description="The companies whose mounts are in the catalog, and whom requests for quotation go to."
        actions={
          canWrite ? <Button intent="primary" icon={<PlusIcon />} text="Add supplier" onClick={() => setCreating(true)} /> : undefined
        }
      />
      <div className="tc-panel">
        {suppliers.isPending ? <PageLoader label="Loading suppliers" /> : null}
        {suppliers.isError ? (
          <Callout intent="danger" title="The suppliers could not be loaded">
            <p>{errorMessage(suppliers.error)}</p>
            <Button text="Try again" onClick={() => void suppliers.refetch()} />
          </Callout>
        ) : null}
        {suppliers.data && suppliers.data.length === 0 ? (
          <NonIdealState
            icon={<OfficeIcon size={32} />}
            title="No suppliers yet"
            description="Suppliers are added here, or by the first catalog import that names them."
          />
        ) : null}
        {suppliers.data && suppliers.data.length > 0 ? (
          <>
            <p className="tc-muted tc-table-summary">{summary(suppliers.data)}</p>
            <SuppliersTable suppliers={suppliers.data} onEdit={canWrite ? setEditing : undefined} />
          </>
        ) : null}
      </div>
      {canWrite ? (
        <>
          <SupplierFormDialog isOpen={creating} onClose={() => setCreating(false)} />
          <SupplierFormDialog isOpen={editing !== null} supplier={editing} onClose={() => setEditing(null)} />
        </>
      ) : null}
    </>
  );
}
