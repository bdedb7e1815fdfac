import { Button, Callout, Card, Tag } from '@blueprintjs/core';
import { Link } from 'react-router-dom';

import { errorMessage } from '@/lib/api-errors';
import type { Role } from '@/lib/authorization';
import { formatDate } from '@/lib/dates';

import { useMyWork } from '../api/get-my-work';
import type { MyWork, WorkItem } from '../types';

import './work.css';

interface ListSpec {
  key: keyof MyWork;
  title: string;
  /** Shown when the list is empty. */
  empty: string;
  /** Where an item leads. */
  path: (item: WorkItem) => string;
  /** A line under the name. */
  detail: (item: WorkItem, userId: number) => string | null;
}

const designPath = (item: WorkItem) => `/designs/${item.designId}`;

const TO_CHECK: ListSpec = {
  key: 'toCheck',
  title: 'Waiting for your check',
  empty: 'No design is waiting for a check.',
  path: designPath,
  detail: (item, userId) =>
    `Sent by ${item.author.name}${item.requestedChecker?.id === userId ? ', who asked you to check it' : item.requestedChecker ? `, asked of ${item.requestedChecker.name}` : ''}`,
};
const RETURNED: ListSpec = {
  key: 'returned',
  title: 'Returned to you',
  empty: 'Nothing came back to you.',
  path: designPath,
  detail: (item) => (item.lastComment ? `“${item.lastComment}”` : null),
};
const DRAFTS: ListSpec = {
  key: 'drafts',
  title: 'Your drafts',
  empty: 'You have no drafts.',
  path: designPath,
  detail: () => null,
};
const RELEASED: ListSpec = {
  key: 'released',
  title: 'Released lately',
  empty: 'Nothing was released in the last 30 days.',
  path: designPath,
  detail: (item) => `By ${item.author.name}`,
};
const TO_REQUEST: ListSpec = {
  key: 'released',
  title: 'Released, waiting for a request for quotation',
  empty: 'Every released design has a request for quotation.',
  path: (item) => `/purchasing/designs/${item.designId}`,
  detail: (item) => `By ${item.author.name}`,
};

/** The lists each role starts with, most urgent first. */
function listsFor(role: Role): ListSpec[] {
  if (role === 'engineer') return [TO_CHECK, RETURNED, DRAFTS, RELEASED];
  if (role === 'admin') return [TO_CHECK, RETURNED, DRAFTS, TO_REQUEST];
  if (role === 'purchaser') return [TO_REQUEST];
  return [RELEASED];
}

function WorkList({ spec, items, userId }: { spec: ListSpec; items: readonly WorkItem[]; userId: number }) {
  const headingId = `tc-work-${spec.key}-${spec.title.length}`;
  return (
    <Card className="tc-work-card" aria-labelledby={headingId} role="region">
      <h3 id={headingId} className="tc-work-title">
        {spec.title}{' '}
        <Tag minimal round intent={items.length > 0 ? 'primary' : 'none'}>
          {items.length}
        </Tag>
      </h3>
      {items.length === 0 ? (
        <p className="tc-muted">{spec.empty}</p>
      ) : (
        <ul className="tc-work-list">
          {items.map((item) => {
            const detail = spec.detail(item, userId);
            return (
              <li key={item.designId}>
                <Link to={spec.path(item)}>{item.name}</Link> <span className="tc-muted">rev {item.revision}</span>
                <div className="tc-work-meta">
                  {item.projectName} · {formatDate(item.updatedAt)}
                </div>
                {detail ? <div className="tc-work-detail">{detail}</div> : null}
              </li>
            );
          })}
        </ul>
      )}
    </Card>
  );
}

/** "Your work": what the signed-in person has to do, the first thing the overview shows. */
export function WorkLists({ role, userId }: { role: Role; userId: number }) {
  const work = useMyWork();
  if (work.isPending) return <p className="tc-muted">Loading your work…</p>;
  if (work.isError) {
    return (
      <Callout intent="warning" title="Your work list could not be loaded">
        <p>{errorMessage(work.error)}</p>
        <Button text="Try again" onClick={() => void work.refetch()} />
      </Callout>
    );
  }
  return (
    <div className="tc-work-grid">
      {listsFor(role).map((spec) => (
        <WorkList key={spec.title} spec={spec} items={work.data[spec.key]} userId={userId} />
      ))}
    </div>
  );
}
