import { Button, Callout, HTMLTable, NonIdealState } from '@blueprintjs/core';
import { BoxIcon, RefreshIcon } from '@blueprintjs/icons';
import { Link } from 'react-router-dom';

import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { errorMessage } from '@/lib/api-errors';
import { formatDate } from '@/lib/dates';

import { usePurchasingDesigns } from '../api/get-purchasing-designs';
import { RFQ_STATUSES, type OpenRfq, type PurchasingDesign } from '../types';
import { formatPrice } from './format';
import { RfqStatusTag } from './rfq-status-tag';

import './purchasing.css';

export const purchasingDesignPath = (designId: number) => `/purchasing/designs/${designId}`;

function RfqSummary({ counts }: { counts: PurchasingDesign['rfqs'] }) {
  const present = RFQ_STATUSES.filter((status) => counts[status] > 0);
  if (present.length === 0) return <span className="tc-muted">None sent</span>;
  return (
    <span className="tc-rfq-counts">
      {present.map((status) => (
        <RfqStatusTag key={status} status={status} count={counts[status]} />
      ))}
    </span>
  );
}

/** One open request in words: waiting for a quote, quoted (total, validity), or ordered (due date). */
export function openRequestText(request: OpenRfq): string {
  const supplier = request.supplier.name;
  if (request.status === 'quoted') {
    const total = formatPrice(request.quotedPrice, request.quoteCurrency);
    return `Quoted by ${supplier}: ${total}${request.quoteValidUntil ? `, valid until ${request.quoteValidUntil}` : ''}`;
  }
  if (request.status === 'ordered') return `Ordered from ${supplier}${request.dueBy ? `: due by ${request.dueBy}` : ''}`;
  return `Waiting for a quote from ${supplier} (asked ${formatDate(request.requestedAt)})`;
}

function OpenRequests({ requests }: { requests: readonly OpenRfq[] }) {
  if (requests.length === 0) return <span className="tc-muted">—</span>;
  return (
    <ul className="tc-open-requests">
      {requests.map((request) => (
        <li key={request.rfqId}>{openRequestText(request)}</li>
      ))}
    </ul>
  );
}

function QueueTable({ designs }: { designs: readonly PurchasingDesign[] }) {
  return (
    <HTMLTable className="tc-table tc-queue-table" striped interactive aria-label="Released designs">
      <thead>
        <tr>
          <th scope="col">Project</th>
          <th scope="col">Design</th>
          <th scope="col" className="tc-number">
            Revision
          </th>
          <th scope="col">Released</th>
          <th scope="col" className="tc-number">
            BOM lines
          </th>
          <th scope="col" className="tc-number">
            Total
          </th>
          <th scope="col">Requests for quotation</th>
          <th scope="col">Quoted and due</th>
        </tr>
      </thead>
      <tbody>
        {designs.map((design) => (
          <tr key={design.designId}>
            <td>{design.projectName}</td>
            <td>
              <Link to={purchasingDesignPath(design.designId)}>{design.name}</Link>
            </td>
            <td className="tc-number">{design.revision}</td>
            <td>{formatDate(design.releasedAt)}</td>
            <td className="tc-number">{design.lineCount}</td>
            <td className="tc-number">{formatPrice(design.total, design.currency)}</td>
            <td>
              <RfqSummary counts={design.rfqs} />
            </td>
            <td>
              <OpenRequests requests={design.openRequests} />
            </td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}

/** The purchaser's starting point: every released design, newest first, with its requests. */
export function PurchasingQueue() {
  const designs = usePurchasingDesigns();
  return (
    <>
      <PageHeader
        title="Purchasing"
        description="Released designs ready to buy: bills of materials, calculation reports and requests for quotation."
        actions={
          <Button
            icon={<RefreshIcon />}
            text="Refresh"
            loading={designs.isFetching && !designs.isPending}
            disabled={designs.isPending}
            onClick={() => void designs.refetch()}
          />
        }
      />
      <div className="tc-panel">
        {designs.isPending ? <PageLoader label="Loading released designs" /> : null}
        {designs.isError ? (
          <Callout intent="danger" title="The released designs could not be loaded">
            <p>{errorMessage(designs.error)}</p>
            <Button text="Try again" onClick={() => void designs.refetch()} />
          </Callout>
        ) : null}
        {designs.data?.length === 0 ? (
          <NonIdealState
            icon={<BoxIcon size={40} />}
            title="Nothing released yet"
            description="A design appears here once a second engineer has checked and released it."
          />
        ) : null}
        {designs.data && designs.data.length > 0 ? <QueueTable designs={designs.data} /> : null}
      </div>
    </>
  );
}
