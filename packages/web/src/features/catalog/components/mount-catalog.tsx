import { Button, Callout, NonIdealState, Spinner, Switch } from '@blueprintjs/core';
import { FilterRemoveIcon, PlusIcon, SearchIcon } from '@blueprintjs/icons';
import { useState } from 'react';

import { PageHeader } from '@/components/page-header';
import { errorMessage } from '@/lib/api-errors';
import { formatNumber } from '@/lib/units';

import { useMounts } from '../api/get-mounts';
import { useUpdateMount } from '../api/update-mount';
import { useCatalogQuery } from '../hooks/use-catalog-query';
import type { Mount, SupplierOption } from '../types';
import { CatalogFilters } from './catalog-filters';
import { CatalogPager, pageCount } from './catalog-pager';
import { CatalogSortControl } from './catalog-sort-control';
import { ExportCatalogButton } from './export-catalog-button';
import { MountDetailDrawer } from './mount-detail-drawer';
import { MountFormDialog } from './mount-form-dialog';
import { MountsTable } from './mounts-table';
import { RetireMountAlert } from './retire-mount-alert';

import './catalog.css';

export interface MountCatalogProps {
  /** Suppliers for the filter and the mount form (composed in by the route). */
  suppliers: readonly SupplierOption[];
  /** Catalog managers and admins: add, edit, retire, restore, and see retired mounts. */
  canWrite: boolean;
}

function countText(total: number): string {
  return total === 1 ? '1 mount' : `${formatNumber(total, 0)} mounts`;
}

/** The catalog page: every supplier's mounts, searched, filtered and sorted on the server a page at a time. */
export function MountCatalog({ suppliers, canWrite }: MountCatalogProps) {
  const { query, change, reset, selectedId, select } = useCatalogQuery({ allowRetired: canWrite });
  const mounts = useMounts(query);
  const restore = useUpdateMount();
  const [creating, setCreating] = useState(false);
  const [editing, setEditing] = useState<Mount | null>(null);
  const [retiring, setRetiring] = useState<Mount | null>(null);
  const [restoreFailure, setRestoreFailure] = useState<string | null>(null);

  const items = mounts.data?.items ?? [];
  const total = mounts.data?.total ?? 0;
  const pages = pageCount(total, query.pageSize);
  const offset = (query.page - 1) * query.pageSize;
  const selectedRow = items.find((mount) => mount.id === selectedId);

  const filtered =
    query.q !== '' ||
    query.supplierId !== null ||
    query.types.length > 0 ||
    query.minLoadN !== null ||
    query.maxLoadN !== null ||
    query.includeRetired;

  /** Drops every filter and the sort; the filter boxes follow the address. */
  const clearFilters = () => reset();

  const restoreMount = async (mount: Mount) => {
    setRestoreFailure(null);
    try {
      await restore.mutateAsync({ id: mount.id, changes: { active: true } });
    } catch (error) {
      setRestoreFailure(errorMessage(error));
    }
  };

  const pager = (label: string) => (
    <CatalogPager page={query.page} pageSize={query.pageSize} total={total} onPage={(page) => change({ page })} label={label} />
  );

  return (
    <>
      <PageHeader
        title="Catalog"
        description="Every supplier’s mounts with their ratings, stiffness and damping. Figures at the rated load are computed from the catalog values."
        actions={
          <>
            <ExportCatalogButton />
            {canWrite ? <Button intent="primary" icon={<PlusIcon />} text="Add mount" onClick={() => setCreating(true)} /> : null}
          </>
        }
      />
      <div className="tc-panel tc-catalog-panel">
        <CatalogFilters query={query} suppliers={suppliers} onChange={change} />
        <div className="tc-catalog-toolbar">
          <div className="tc-catalog-count" aria-live="polite">
            {mounts.data ? <strong>{countText(total)}</strong> : 'Loading the catalog…'}
            {mounts.isFetching && mounts.data ? <Spinner size={14} aria-label="Updating" className="tc-inline-spinner" /> : null}
          </div>
          {canWrite ? (
            <Switch
              className="tc-catalog-retired"
              label="Show retired"
              checked={query.includeRetired}
              onChange={(event) => change({ includeRetired: event.currentTarget.checked })}
            />
          ) : null}
          <Button variant="minimal" icon={<FilterRemoveIcon />} text="Clear filters" disabled={!filtered} onClick={clearFilters} />
          <CatalogSortControl sort={query.sort} onSort={(sort) => change({ sort })} />
          {pager('Pages above the table')}
        </div>
        {mounts.isError ? (
          <Callout intent="danger" title="The catalog could not be loaded">
            <p>{errorMessage(mounts.error)}</p>
            <Button text="Try again" onClick={() => void mounts.refetch()} />
          </Callout>
        ) : null}
        {mounts.data && total === 0 ? (
          <NonIdealState
            icon={<SearchIcon size={32} />}
            title="No mounts match"
            description="Try fewer words, another supplier or a wider load range."
            action={<Button text="Clear filters" onClick={clearFilters} />}
          />
        ) : null}
        {mounts.data && total > 0 && query.page > pages ? (
          <Callout intent="primary" className="tc-catalog-past-end">
            There are only {formatNumber(pages, 0)} pages.{' '}
            <Button variant="minimal" text="Go to the last page" onClick={() => change({ page: pages })} />
          </Callout>
        ) : null}
        {!mounts.isError && (!mounts.data || total > 0) ? (
          <MountsTable
            mounts={items}
            offset={offset}
            loading={mounts.isPending}
            sort={query.sort}
            onSort={(sort) => change({ sort })}
            openId={selectedId}
            onOpen={(mount) => select(mount.id)}
          />
        ) : null}
        {total > query.pageSize ? <div className="tc-catalog-footer">{pager('Pages below the table')}</div> : null}
      </div>
      <MountDetailDrawer
        mountId={selectedId}
        placeholder={selectedRow}
        canWrite={canWrite}
        onClose={() => {
          setRestoreFailure(null);
          select(null);
        }}
        onEdit={setEditing}
        onRetire={setRetiring}
        onRestore={(mount) => void restoreMount(mount)}
        restoring={restore.isPending}
        actionError={restoreFailure}
      />
      {canWrite ? (
        <>
          <MountFormDialog
            isOpen={creating}
            suppliers={suppliers}
            onClose={() => setCreating(false)}
            onSaved={(mount) => select(mount.id)}
          />
          <MountFormDialog isOpen={editing !== null} mount={editing} suppliers={suppliers} onClose={() => setEditing(null)} />
          <RetireMountAlert mount={retiring} onClose={() => setRetiring(null)} />
        </>
      ) : null}
    </>
  );
}
