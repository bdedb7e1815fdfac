import { Button, Callout } from '@blueprintjs/core';

import { errorMessage } from '@/lib/api-errors';
import { formatDateTime } from '@/lib/dates';

import { useDesignHistory } from '../api/get-design-history';
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
          {entry.comment ? <q className="tc-review-comment">{entry.comment}</q> : null}
        </li>
      ))}
    </ol>
  );
}
