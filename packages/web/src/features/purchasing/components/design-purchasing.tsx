import { Button, Callout, Tag } from '@blueprintjs/core';
import { WarningSignIcon } from '@blueprintjs/icons';
import { DESIGN_STATE_LABELS } from '@tacet/vibration';

import { PageHeader } from '@/components/page-header';
import { SafetyCautions } from '@/components/safety-cautions';
import { errorMessage } from '@/lib/api-errors';
import type { Design, SupplierRef } from '@/types/design-api';

import { useRfqs } from '../api/get-rfqs';
import type { Rfq } from '../types';
import { BomTable } from './bom-table';
import { DesignDocuments } from './design-documents';
import { documentBaseName } from './format';
import { SupplierRequests } from './supplier-requests';

import './purchasing.css';

const STAGE_WORDS: Record<Design['status'], string> = {
  ...DESIGN_STATE_LABELS,
  superseded: `${DESIGN_STATE_LABELS.superseded} by a later revision`,
};

/** The BOM's suppliers in first-seen order, with their line counts. */
function suppliersOf(design: Design): { supplier: SupplierRef; lineCount: number }[] {
  const found = new Map<number, { supplier: SupplierRef; lineCount: number }>();
  for (const line of design.bom) {
    const entry = found.get(line.supplier.id) ?? { supplier: line.supplier, lineCount: 0 };
    entry.lineCount += 1;
    found.set(line.supplier.id, entry);
  }
  return [...found.values()];
}

function byNewest(a: Rfq, b: Rfq): number {
  return b.createdAt.localeCompare(a.createdAt) || b.id - a.id;
}

/**
 * What a purchaser does with one released design: read the BOM, download it and the report,
 * send requests for quotation per supplier and record how each one progresses.
 */
export function DesignPurchasing({ design }: { design: Design }) {
  const buyable = design.status === 'released';
  const readable = buyable || design.status === 'superseded';
  const rfqs = useRfqs(design.id);
  const suppliers = suppliersOf(design);
  const currency = design.bom[0]?.currency ?? 'USD';

  return (
    <>
      <PageHeader
        title={design.name}
        description={
          <span className="tc-design-meta">
            <span>{design.projectName}</span>
            <span aria-hidden="true">·</span>
            <span>Revision {design.revision}</span>
            <Tag minimal round className={`tc-buy-stage tc-buy-stage--${design.status}`}>
              {STAGE_WORDS[design.status]}
            </Tag>
            {design.checker ? <span>checked by {design.checker.name}</span> : null}
          </span>
        }
      />
      {!readable ? (
        <Callout intent="warning" icon={<WarningSignIcon />} className="tc-note" title="Not released">
          Purchasing starts once a second engineer has released this design.
        </Callout>
      ) : null}
      {design.status === 'superseded' ? (
        <Callout intent="warning" icon={<WarningSignIcon />} className="tc-note" title="A later revision exists">
          This revision has been superseded; buy from the released one. Its files stay available for the record.
        </Callout>
      ) : null}

      <div className="tc-panel tc-purchase-section">
        <div className="tc-section-row">
          <h2 className="tc-purchase-title">Bill of materials</h2>
          {readable ? <DesignDocuments designId={design.id} baseName={documentBaseName(design.name, design.revision)} /> : null}
        </div>
        {design.bom.length === 0 ? (
          <p className="tc-muted">No mounts chosen, so there is nothing to buy.</p>
        ) : (
          <BomTable lines={design.bom} />
        )}
        <p className="tc-muted tc-purchase-caution">
          Prices and lead times are the catalog’s at release, not a quote. Restraints, snubbers and flexible connections are not in this
          list.
        </p>
        <SafetyCautions use="supplier" />
      </div>

      {readable && suppliers.length > 0 ? (
        <div className="tc-panel tc-purchase-section">
          <h2 className="tc-purchase-title">Requests for quotation</h2>
          {rfqs.isPending ? <p className="tc-muted">Loading the requests…</p> : null}
          {rfqs.isError ? (
            <Callout intent="danger" className="tc-note" title="The requests could not be loaded">
              <p>{errorMessage(rfqs.error)}</p>
              <Button text="Try again" onClick={() => void rfqs.refetch()} />
            </Callout>
          ) : null}
          {rfqs.data
            ? suppliers.map(({ supplier, lineCount }) => (
                <SupplierRequests
                  key={supplier.id}
                  designId={design.id}
                  supplier={supplier}
                  lineCount={lineCount}
                  currency={currency}
                  canSend={buyable}
                  rfqs={rfqs.data.filter((rfq) => rfq.supplier.id === supplier.id).sort(byNewest)}
                />
              ))
            : null}
        </div>
      ) : null}
    </>
  );
}
