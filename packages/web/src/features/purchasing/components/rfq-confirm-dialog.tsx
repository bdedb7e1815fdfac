import { Button, Callout, Dialog, DialogBody, DialogFooter, HTMLTable } from '@blueprintjs/core';
import { EnvelopeIcon, PaperclipIcon } from '@blueprintjs/icons';

import { formatBytes } from '@/lib/format-bytes';

import type { RfqPreview } from '../types';

export interface RfqConfirmDialogProps {
  preview: RfqPreview;
  busy: boolean;
  failure: string | null;
  onCancel: () => void;
  onSend: () => void;
}

/** Shows exactly what goes to the supplier — recipient, text, lines, attachments — before it goes. */
export function RfqConfirmDialog({ preview, busy, failure, onCancel, onSend }: RfqConfirmDialogProps) {
  return (
    <Dialog title={`Send this request to ${preview.supplier.name}?`} isOpen onClose={onCancel} className="tc-dialog tc-dialog--wide">
      <DialogBody>
        <dl className="tc-facts tc-rfq-envelope">
          <dt>To</dt>
          <dd data-testid="rfq-to">
            {preview.supplier.name} &lt;{preview.to}&gt;
          </dd>
          <dt>Replies to</dt>
          <dd>{preview.replyTo}</dd>
          <dt>Subject</dt>
          <dd>{preview.subject}</dd>
          <dt>Machines</dt>
          <dd>{preview.machineCount === 1 ? 'One machine' : `${preview.machineCount} identical machines`}</dd>
        </dl>
        <HTMLTable compact className="tc-table" aria-label="Lines asked for">
          <thead>
            <tr>
              <th scope="col">Part number</th>
              <th scope="col" className="tc-number">
                Quantity
              </th>
              <th scope="col" className="tc-number">
                Per machine
              </th>
              <th scope="col">Mount points</th>
            </tr>
          </thead>
          <tbody>
            {preview.lines.map((line) => (
              <tr key={line.partNumber}>
                <td className="tc-part-number">{line.partNumber}</td>
                <td className="tc-number">{line.quantity}</td>
                <td className="tc-number">{line.quantityPerMachine}</td>
                <td>{line.mountPoints.join(', ')}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
        <h4 className="tc-rfq-subtitle">Message</h4>
        <pre className="tc-rfq-text" aria-label="Message to the supplier">
          {preview.text}
        </pre>
        <h4 className="tc-rfq-subtitle">Attachments</h4>
        <ul className="tc-rfq-attachments" aria-label="Attachments">
          {preview.attachments.map((attachment) => (
            <li key={attachment.filename}>
              <PaperclipIcon /> {attachment.filename} <span className="tc-muted">({formatBytes(attachment.size)})</span>
            </li>
          ))}
        </ul>
        <p className="tc-muted">Our catalog prices stay with us: the list and the report sent to the supplier carry none.</p>
        {failure ? (
          <Callout intent="danger" role="alert" className="tc-note" title="Not sent">
            {failure}
          </Callout>
        ) : null}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Back" onClick={onCancel} disabled={busy} />
            <Button intent="primary" icon={<EnvelopeIcon />} text="Send request" loading={busy} onClick={onSend} />
          </>
        }
      />
    </Dialog>
  );
}
