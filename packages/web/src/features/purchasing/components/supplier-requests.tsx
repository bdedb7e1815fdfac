import { Button, Callout, FormGroup, TextArea } from '@blueprintjs/core';
import { EditIcon, EnvelopeIcon, RefreshIcon } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';

import { errorMessage } from '@/lib/api-errors';
import { formatDateTime } from '@/lib/dates';
import type { SupplierRef } from '@/types/design-api';

import { useRetryRfq } from '../api/retry-rfq';
import { useSendRfq } from '../api/send-rfq';
import { nextStatuses } from '../schemas/rfq-status-schema';
import type { Rfq } from '../types';
import { formatPrice } from './format';
import { RfqStatusDialog } from './rfq-status-dialog';
import { RFQ_STATUS_LABELS, RfqStatusTag } from './rfq-status-tag';

const MESSAGE_MAX = 2000;

export interface SupplierRequestsProps {
  designId: number;
  supplier: SupplierRef;
  lineCount: number;
  currency: string;
  /** This supplier's requests, newest first. */
  rfqs: readonly Rfq[];
  /** Requests may be sent (a released design and a role that buys). */
  canSend: boolean;
}

function RfqItem({ rfq, currency }: { rfq: Rfq; currency: string }) {
  const retry = useRetryRfq();
  const [recording, setRecording] = useState(false);
  const canRecord = nextStatuses(rfq.status).length > 0;
  return (
    <li className="tc-rfq" data-testid="rfq" data-rfq-id={rfq.id}>
      <div className="tc-rfq-line">
        <RfqStatusTag status={rfq.status} />
        <span>
          Sent {formatDateTime(rfq.createdAt)} by {rfq.createdBy.name}
        </span>
        {rfq.quotedPrice !== null ? <span className="tc-rfq-quote">Quoted {formatPrice(rfq.quotedPrice, currency)}</span> : null}
        <span className="tc-rfq-buttons">
          {rfq.status === 'failed' ? (
            <Button size="small" icon={<RefreshIcon />} text="Send again" loading={retry.isPending} onClick={() => retry.mutate(rfq.id)} />
          ) : null}
          {canRecord ? <Button size="small" icon={<EditIcon />} text="Record progress" onClick={() => setRecording(true)} /> : null}
        </span>
      </div>
      {rfq.status === 'failed' && rfq.failureReason ? (
        <p className="tc-rfq-failure" role="status">
          The e-mail could not be sent: {rfq.failureReason}
        </p>
      ) : null}
      {retry.isError ? (
        <p className="tc-alert-error" role="alert">
          {errorMessage(retry.error)}
        </p>
      ) : null}
      {rfq.history.length > 0 ? (
        <ol className="tc-rfq-history" aria-label={`History of request ${rfq.id}`}>
          {rfq.history.map((entry, index) => (
            <li key={`${entry.at}-${index}`}>
              <span className="tc-muted">{formatDateTime(entry.at)}</span> {RFQ_STATUS_LABELS[entry.status]}
              {entry.user ? ` — ${entry.user.name}` : ''}
              {entry.note ? `: ${entry.note}` : ''}
            </li>
          ))}
        </ol>
      ) : null}
      {recording ? <RfqStatusDialog rfq={rfq} currency={currency} onClose={() => setRecording(false)} /> : null}
    </li>
  );
}

/** One supplier of the BOM: a request-for-quotation form and the requests sent so far. */
export function SupplierRequests({ designId, supplier, lineCount, currency, rfqs, canSend }: SupplierRequestsProps) {
  const send = useSendRfq();
  const [message, setMessage] = useState('');
  const [sent, setSent] = useState<Rfq | null>(null);
  const headingId = `supplier-${supplier.id}-title`;
  const tooLong = message.length > MESSAGE_MAX;

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (tooLong) return;
    setSent(null);
    try {
      const rfq = await send.mutateAsync({ designId, supplierId: supplier.id, message: message.trim() || undefined });
      setSent(rfq);
      setMessage('');
    } catch {
      // Shown below from the mutation's error.
    }
  };

  return (
    <section className="tc-supplier-requests" aria-labelledby={headingId}>
      <h3 id={headingId} className="tc-supplier-title">
        {supplier.name}
        <span className="tc-muted"> · {lineCount === 1 ? '1 BOM line' : `${lineCount} BOM lines`}</span>
      </h3>
      {canSend ? (
        <form className="tc-rfq-form" onSubmit={(event) => void submit(event)} aria-label={`Request for quotation to ${supplier.name}`}>
          <FormGroup
            label="Message to the supplier (optional)"
            labelFor={`rfq-message-${supplier.id}`}
            intent={tooLong ? 'danger' : 'none'}
            helperText={
              tooLong
                ? `Keep the message under ${MESSAGE_MAX} characters.`
                : 'Their BOM lines go along as a CSV file, with the calculation report.'
            }
          >
            <TextArea
              id={`rfq-message-${supplier.id}`}
              fill
              rows={2}
              value={message}
              intent={tooLong ? 'danger' : 'none'}
              onChange={(event) => setMessage(event.target.value)}
            />
          </FormGroup>
          <Button
            type="submit"
            intent="primary"
            icon={<EnvelopeIcon />}
            text="Send request for quotation"
            loading={send.isPending}
            disabled={tooLong}
          />
          {send.isError ? (
            <Callout intent="danger" role="alert" className="tc-note" title="Not sent">
              {errorMessage(send.error)}
            </Callout>
          ) : null}
          {sent && sent.status === 'failed' ? (
            <Callout intent="warning" role="alert" className="tc-note" title="Recorded, but the e-mail did not go out">
              {sent.failureReason ?? 'The mail server refused it.'} Use “Send again” once the problem is fixed.
            </Callout>
          ) : null}
        </form>
      ) : null}
      {rfqs.length === 0 ? (
        <p className="tc-muted">No request sent to {supplier.name} yet.</p>
      ) : (
        <ul className="tc-rfq-list" aria-label={`Requests to ${supplier.name}`}>
          {rfqs.map((rfq) => (
            <RfqItem key={rfq.id} rfq={rfq} currency={currency} />
          ))}
        </ul>
      )}
    </section>
  );
}
