import { Tag } from '@blueprintjs/core';

import type { RfqStatus } from '../types';

export const RFQ_STATUS_LABELS: Record<RfqStatus, string> = {
  requested: 'Requested',
  quoted: 'Quoted',
  ordered: 'Ordered',
  received: 'Received',
  failed: 'Not sent',
};

/** A request for quotation's state in Tacet's own colours (purchasing.css). */
export function RfqStatusTag({ status, count }: { status: RfqStatus; count?: number }) {
  return (
    <Tag minimal round className={`tc-rfq-tag tc-rfq-tag--${status}`} data-status={status}>
      {count === undefined ? RFQ_STATUS_LABELS[status] : `${count} ${RFQ_STATUS_LABELS[status].toLowerCase()}`}
    </Tag>
  );
}
