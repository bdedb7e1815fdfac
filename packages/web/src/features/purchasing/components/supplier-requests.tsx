import { Button, Callout, FormGroup, InputGroup, TextArea } from '@blueprintjs/core';
import { EditIcon, EnvelopeIcon, RefreshIcon } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';

import { errorMessage } from '@/lib/api-errors';
import { formatDateTime } from '@/lib/dates';
import type { SupplierRef } from '@/types/design-api';

import { usePreviewRfq } from '../api/preview-rfq';
import { useRetryRfq } from '../api/retry-rfq';
import { useSendRfq } from '../api/send-rfq';
import { nextStatuses } from '../schemas/rfq-status-schema';
import type { Rfq, RfqPreview } from '../types';
import { formatLeadTime, formatPrice } from './format';
import { RfqConfirmDialog } from './rfq-confirm-dialog';
import { RfqStatusDialog } from './rfq-status-dialog';
import { RFQ_STATUS_LABELS, RfqStatusTag } from './rfq-status-tag';

const MESSAGE_MAX = 2000;
const MACHINES_MAX = 10_000;

/** The machine count as typed: a whole number from 1, or null. */
export function machineCountOf(text: string): number | null {
  const trimmed = text.trim();
  if (!/^\d+$/.test(trimmed)) return null;
  const count = Number(trimmed);
  return count >= 1 && count <= MACHINES_MAX ? count : null;
}

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
        {rfq.machineCount > 1 ? <span className="tc-muted">for {rfq.machineCount} machines</span> : null}
        {rfq.quotedPrice !== null ? (
          <span className="tc-rfq-quote">
            Quoted {formatPrice(rfq.quotedPrice, rfq.quoteCurrency ?? currency)}
            {rfq.quoteReference ? ` (ref. ${rfq.quoteReference})` : ''}
            {rfq.quoteValidUntil ? `, valid until ${rfq.quoteValidUntil}` : ''}
          </span>
        ) : null}
        {rfq.dueBy ? <span className="tc-rfq-due">Delivery due by {rfq.dueBy}</span> : null}
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
      {rfq.lines.some((line) => line.unitPrice !== null) ? (
        <ul className="tc-rfq-quoted-lines" aria-label={`Quote of request ${rfq.id}`}>
          {rfq.lines.map((line) => (
            <li key={line.id}>
              {line.partNumber} × {line.quantity}: {formatPrice(line.unitPrice, rfq.quoteCurrency ?? currency)} each,{' '}
              {formatLeadTime(line.leadTimeDays)}
            </li>
          ))}
        </ul>
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
  const preview = usePreviewRfq();
  const [message, setMessage] = useState('');
  const [machines, setMachines] = useState('1');
  const [sent, setSent] = useState<Rfq | null>(null);
  const [confirming, setConfirming] = useState<RfqPreview | null>(null);
  const headingId = `supplier-${supplier.id}-title`;
  const tooLong = message.length > MESSAGE_MAX;
  const machineCount = machineCountOf(machines);
  const request = () => ({ designId, supplierId: supplier.id, message: message.trim() || undefined, machineCount: machineCount ?? 1 });

  /** First the confirmation: what would go, to whom, with which files. */
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (tooLong || machineCount === null) return;
    setSent(null);
    send.reset();
    try {
      setConfirming(await preview.mutateAsync(request()));
    } catch {
      // Shown below from the mutation's error.
    }
  };

  const confirmSend = async () => {
    try {
      const rfq = await send.mutateAsync(request());
      setSent(rfq);
      setConfirming(null);
      setMessage('');
      setMachines('1');
    } catch {
      // Shown in the confirmation.
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
                : 'Their lines go along as CSV and Excel files, with the calculation report — without our prices.'
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
          <FormGroup
            label="Identical machines"
            labelFor={`rfq-machines-${supplier.id}`}
            intent={machineCount === null ? 'danger' : 'none'}
            helperText={
              machineCount === null
                ? `Enter a whole number from 1 to ${MACHINES_MAX}.`
                : 'The quantities asked for are those of one machine times this.'
            }
          >
            <InputGroup
              id={`rfq-machines-${supplier.id}`}
              inputMode="numeric"
              className="tc-rfq-machines"
              value={machines}
              intent={machineCount === null ? 'danger' : 'none'}
              onChange={(event) => setMachines(event.target.value)}
            />
          </FormGroup>
          <Button
            type="submit"
            intent="primary"
            icon={<EnvelopeIcon />}
            text="Preview request for quotation"
            loading={preview.isPending}
            disabled={tooLong || machineCount === null}
          />
          {preview.isError ? (
            <Callout intent="danger" role="alert" className="tc-note" title="Cannot be sent">
              {errorMessage(preview.error)}
            </Callout>
          ) : null}
          {sent && sent.status === 'failed' ? (
            <Callout intent="warning" role="alert" className="tc-note" title="Recorded, but the e-mail did not go out">
              {sent.failureReason ?? 'The mail server refused it.'} Use “Send again” once the problem is fixed.
            </Callout>
          ) : null}
        </form>
      ) : null}
      {confirming ? (
        <RfqConfirmDialog
          preview={confirming}
          busy={send.isPending}
          failure={send.isError ? errorMessage(send.error) : null}
          onCancel={() => setConfirming(null)}
          onSend={() => void confirmSend()}
        />
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
