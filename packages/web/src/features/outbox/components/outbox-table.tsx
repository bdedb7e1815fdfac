import { HTMLTable } from '@blueprintjs/core';
import { Link } from 'react-router-dom';

import { formatDateTime } from '@/lib/dates';

import type { OutboxMessageSummary } from '../types';

export interface OutboxTableProps {
  messages: readonly OutboxMessageSummary[];
  selectedId: number | null;
  /** Where a message opens (the page keeps the open message in the address). */
  linkTo: (id: number) => string;
  onOpen: (id: number) => void;
}

export const NO_SUBJECT = '(no subject)';

/** The captured messages, newest first; a row opens its message. */
export function OutboxTable({ messages, selectedId, linkTo, onOpen }: OutboxTableProps) {
  return (
    <HTMLTable className="tc-table tc-outbox-table" interactive aria-label="Captured messages">
      <thead>
        <tr>
          <th scope="col">Received</th>
          <th scope="col">To</th>
          <th scope="col">Subject</th>
          <th scope="col" className="tc-number">
            Attachments
          </th>
        </tr>
      </thead>
      <tbody>
        {messages.map((message) => {
          const selected = message.id === selectedId;
          return (
            <tr key={message.id} className={selected ? 'is-selected' : undefined} onClick={() => onOpen(message.id)}>
              <td>
                <time dateTime={message.receivedAt}>{formatDateTime(message.receivedAt)}</time>
              </td>
              <td>{message.to}</td>
              <td>
                <Link
                  className="tc-outbox-subject"
                  to={linkTo(message.id)}
                  aria-current={selected ? 'true' : undefined}
                  onClick={(event) => event.stopPropagation()}
                >
                  {message.subject || NO_SUBJECT}
                </Link>
              </td>
              <td className="tc-number">{message.attachments.length}</td>
            </tr>
          );
        })}
      </tbody>
    </HTMLTable>
  );
}
