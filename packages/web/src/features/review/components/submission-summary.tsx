import { Callout } from '@blueprintjs/core';

import { useDesignHistory } from '../api/get-design-history';
import { changesSince, InputChangesList } from './input-changes-list';

/**
 * For the checker of a design in check: the author's note (or reply), who was asked to check,
 * and what changed since the last submission.
 */
export function SubmissionSummary({ designId }: { designId: number }) {
  const history = useDesignHistory(designId);
  const entries = history.data ?? [];
  const submission = [...entries].reverse().find((entry) => entry.to === 'in_review');
  if (!submission) return null;
  const previousReturn = [...entries].reverse().find((entry) => entry.from === 'in_review' && entry.to === 'draft');
  return (
    <Callout intent="primary" className="tc-note tc-submission" title="Sent for check" aria-label="What the author sent">
      <p>
        {submission.user.name} sent it
        {submission.requestedChecker ? ` and asked ${submission.requestedChecker.name} to check it` : ''}.
      </p>
      {previousReturn?.comment && submission.note ? (
        <p>
          Reply to “{previousReturn.comment}”: <q className="tc-review-comment">{submission.note}</q>
        </p>
      ) : submission.note ? (
        <p>
          Note: <q className="tc-review-comment">{submission.note}</q>
        </p>
      ) : null}
      {submission.changes ? (
        <>
          <h4 className="tc-review-subtitle">What changed {changesSince(submission.changes)}</h4>
          <InputChangesList changes={submission.changes} />
        </>
      ) : (
        <p className="tc-muted">This is the first time this revision was sent for check.</p>
      )}
    </Callout>
  );
}
