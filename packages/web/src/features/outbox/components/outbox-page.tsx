import { Button, Callout, NonIdealState } from '@blueprintjs/core';
import { InboxIcon, RefreshIcon } from '@blueprintjs/icons';
import { useSearchParams } from 'react-router-dom';

import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { errorMessage, errorStatus } from '@/lib/api-errors';

import { useOutbox } from '../api/get-outbox';
import { OutboxMessageView } from './outbox-message-view';
import { OutboxTable } from './outbox-table';

import './outbox.css';

/** The address parameter that holds the open message's id. */
const MESSAGE_PARAM = 'message';

function summary(count: number): string {
  const messages = count === 1 ? '1 message' : `${count} messages`;
  return `${messages}, newest first (the outbox keeps the last 500 while the server runs)`;
}

/**
 * The admin's outbox (demo mode): every e-mail Tacet sent, as the local mail catcher received
 * it. Nothing shown here left the server.
 */
export function OutboxPage() {
  const outbox = useOutbox();
  const [searchParams, setSearchParams] = useSearchParams();
  const openParam = Number(searchParams.get(MESSAGE_PARAM));
  const openId = Number.isInteger(openParam) && openParam > 0 ? openParam : null;

  const linkTo = (id: number) => `?${new URLSearchParams({ [MESSAGE_PARAM]: String(id) })}`;
  const open = (id: number) => setSearchParams({ [MESSAGE_PARAM]: String(id) });

  return (
    <>
      <PageHeader
        title="Outbox"
        description="E-mail Tacet has sent in demo mode, as the built-in mail catcher received it. None of it left this server."
        actions={
          <Button
            icon={<RefreshIcon />}
            text="Refresh"
            loading={outbox.isFetching && !outbox.isPending}
            disabled={outbox.isPending}
            onClick={() => void outbox.refetch()}
          />
        }
      />
      <div className="tc-panel">
        {outbox.isPending ? <PageLoader label="Loading the outbox" /> : null}
        {outbox.isError ? <OutboxError error={outbox.error} onRetry={() => void outbox.refetch()} /> : null}
        {outbox.data?.length === 0 ? (
          <NonIdealState
            icon={<InboxIcon size={40} />}
            title="No messages yet"
            description="Messages Tacet sends in demo mode — requests for quotation to suppliers, for example — appear here as soon as they are sent. Use Refresh to look again."
          />
        ) : null}
        {outbox.data && outbox.data.length > 0 ? (
          <>
            <p className="tc-muted tc-table-summary">{summary(outbox.data.length)}</p>
            <div className="tc-outbox">
              <OutboxTable messages={outbox.data} selectedId={openId} linkTo={linkTo} onOpen={open} />
              <div>
                {openId !== null ? (
                  <OutboxMessageView key={openId} id={openId} />
                ) : (
                  <p className="tc-muted">Choose a message to read its text and download its attachments.</p>
                )}
              </div>
            </div>
          </>
        ) : null}
      </div>
    </>
  );
}

function OutboxError({ error, onRetry }: { error: unknown; onRetry: () => void }) {
  if (errorStatus(error) === 404) {
    return (
      <Callout intent="primary" title="There is no outbox on this server">
        <p>{errorMessage(error)}</p>
        <p>
          Here Tacet hands its e-mail to the mail server its administrator configured (SMTP_URL), so sent messages are in that server’s
          records, not in Tacet.
        </p>
      </Callout>
    );
  }
  return (
    <Callout intent="danger" title="The outbox could not be loaded">
      <p>{errorMessage(error)}</p>
      <Button text="Try again" onClick={onRetry} />
    </Callout>
  );
}
