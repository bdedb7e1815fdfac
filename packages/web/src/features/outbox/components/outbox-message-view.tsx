import { Button, Callout, NonIdealState } from '@blueprintjs/core';
import { DownloadIcon, EnvelopeIcon } from '@blueprintjs/icons';

import { PageLoader } from '@/components/page-loader';
import { errorMessage, errorStatus } from '@/lib/api-errors';
import { formatDateTime } from '@/lib/dates';

import { useDownloadOutboxAttachment } from '../api/download-outbox-attachment';
import { useOutboxMessage } from '../api/get-outbox-message';
import { formatBytes } from '@/lib/format-bytes';
import { NO_SUBJECT } from './outbox-table';

/** One captured message: who sent it to whom, its text and its attachments to download. */
export function OutboxMessageView({ id }: { id: number }) {
  const message = useOutboxMessage(id);
  const download = useDownloadOutboxAttachment();

  if (message.isPending) return <PageLoader label="Loading the message" />;
  if (message.isError) {
    return errorStatus(message.error) === 404 ? (
      <NonIdealState
        icon={<EnvelopeIcon size={32} />}
        title="This message is no longer in the outbox"
        description="The outbox keeps the last 500 messages while the server runs; older ones, and everything from before a restart, are gone."
      />
    ) : (
      <Callout intent="danger" title="The message could not be loaded">
        <p>{errorMessage(message.error)}</p>
        <Button text="Try again" onClick={() => void message.refetch()} />
      </Callout>
    );
  }

  const { subject, from, to, receivedAt, text, attachments } = message.data;
  const titleId = `tc-outbox-message-${id}`;
  return (
    <section aria-labelledby={titleId}>
      <h2 id={titleId} className="tc-outbox-message-title">
        {subject || NO_SUBJECT}
      </h2>
      <dl className="tc-facts">
        <dt>From</dt>
        <dd>{from}</dd>
        <dt>To</dt>
        <dd>{to}</dd>
        <dt>Received</dt>
        <dd>
          <time dateTime={receivedAt}>{formatDateTime(receivedAt)}</time>
        </dd>
      </dl>
      <pre className="tc-outbox-text" aria-label="Message text">
        {text || '(no text)'}
      </pre>
      <h3 className="tc-subsection-title">Attachments</h3>
      {attachments.length === 0 ? (
        <p className="tc-muted">No attachments.</p>
      ) : (
        <ul className="tc-outbox-attachments" aria-label="Attachments">
          {attachments.map((attachment, index) => (
            <li key={`${index}-${attachment.filename}`}>
              <span className="tc-outbox-attachment-name">{attachment.filename}</span>
              <span className="tc-muted">{formatBytes(attachment.size)}</span>
              <Button
                icon={<DownloadIcon />}
                text="Download"
                aria-label={`Download ${attachment.filename}`}
                loading={download.isPending && download.variables?.index === index}
                onClick={() => download.mutate({ messageId: id, index, filename: attachment.filename })}
              />
            </li>
          ))}
        </ul>
      )}
      {download.isError ? (
        <Callout intent="danger" className="tc-form-error" role="alert">
          {download.variables?.filename ?? 'The attachment'} could not be downloaded. {errorMessage(download.error)}
        </Callout>
      ) : null}
    </section>
  );
}
