import { Button, Callout } from '@blueprintjs/core';

import { errorMessage } from '@/lib/api-errors';
import { formatDateTime } from '@/lib/dates';

import { useDesignHistory } from '../api/get-design-history';
import { changesSince, InputChangesList } from './input-changes-list';
import { REVIEW_STATE_LABELS } from './review-stage';

/** Who moved the design, when, from which state to which, and what they wrote. Oldest first. */
export function ReviewHistory({ designId }: { designId: number }) {
  const history = useDesignHistory(designId);
  if (history.isPending) return <p className="tc-muted">Loading the record…</p>;
  if (history.isError) {
    return (
      <Callout intent="warning" className="tc-note" title="The record could not be loaded">
        <p>{errorMessage(history.error)}</p>
        <Button text="Try again" onClick={() => void history.refetch()} />
      </Callout>
    );
  }
  if (history.data.length === 0) return <p className="tc-muted">Nothing recorded yet: the design has not moved since it was created.</p>;
  return (
    <ol className="tc-review-history" aria-label="Check and release record">
      {history.data.map((entry) => (
        <li key={entry.id} className="tc-review-entry">
          <span className="tc-review-when">{formatDateTime(entry.at)}</span>
          <span className="tc-review-who">{entry.user.name}</span>
          <span className="tc-review-move">
            {entry.from
              ? `${REVIEW_STATE_LABELS[entry.from]} → ${REVIEW_STATE_LABELS[entry.to]}`
              : `New revision (${REVIEW_STATE_LABELS[entry.to]})`}
          </span>
          {entry.requestedChecker ? <span className="tc-muted">asked {entry.requestedChecker.name} to check</span> : null}
          {entry.note ? <q className="tc-review-comment">{entry.note}</q> : null}
          {entry.comment ? (
            <q className="tc-review-comment">
              {entry.to === 'released' ? 'Release notes: ' : ''}
              {entry.comment}
            </q>
          ) : null}
          {entry.changes ? (
            <details className="tc-review-changes">
              <summary>
                {entry.changes.items.length === 0
                  ? `No change ${changesSince(entry.changes)}`
                  : `${entry.changes.items.length === 1 ? '1 change' : `${entry.changes.items.length} changes`} ${changesSince(entry.changes)}`}
              </summary>
              <InputChangesList changes={entry.changes} />
            </details>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
