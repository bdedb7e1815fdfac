import { DESIGN_STATE_LABELS } from '@tacet/vibration';

import type { DesignStatus } from '@/types/design-api';

/** The states in the glossary's words ("In check"). */
export const REVIEW_STATE_LABELS: Record<DesignStatus, string> = DESIGN_STATE_LABELS;

const TRACK: readonly DesignStatus[] = ['draft', 'in_review', 'released'];

/**
 * Where the design stands on its way from draft to release, as a short track of steps in
 * Tacet's own colours (review.css). A superseded revision shows the track completed and struck.
 */
export function ReviewStage({ status }: { status: DesignStatus }) {
  const reached = status === 'superseded' ? TRACK.length - 1 : TRACK.indexOf(status);
  return (
    <ol className={`tc-stage-track tc-stage-track--${status}`} aria-label="Stage" data-testid="review-stage" data-status={status}>
      {TRACK.map((step, index) => {
        const state = index < reached ? 'done' : index === reached ? 'current' : 'ahead';
        return (
          <li key={step} className={`tc-stage tc-stage--${state}`} aria-current={state === 'current' ? 'step' : undefined}>
            <span className="tc-stage-dot" aria-hidden="true" />
            {REVIEW_STATE_LABELS[step]}
          </li>
        );
      })}
      {status === 'superseded' ? (
        <li className="tc-stage tc-stage--superseded" aria-current="step">
          <span className="tc-stage-dot" aria-hidden="true" />
          {REVIEW_STATE_LABELS.superseded}
        </li>
      ) : null}
    </ol>
  );
}
