import type { DesignStatus } from '../designs/design-status.js';
import type { User } from '../users/user.entity.js';

/** The messages of the review rules (the API returns them as they are). */
export const REVIEW_MESSAGES = {
  chooseFirst: 'Choose mounts before sending the design for check',
  authorSubmits: 'Only the author of this design or an admin sends it for check',
  commentRequired: 'Say why the design goes back to draft (comment)',
  otherReleases: 'A design is released by an engineer other than its author',
  revisionFrom: 'A new revision starts from a released or superseded design',
  notAllowed: (from: DesignStatus, to: DesignStatus) => `A design cannot go from ${from} to ${to}`,
} as const;

export type ReviewVerdict = { ok: true } | { ok: false; kind: 'forbidden' | 'conflict' | 'bad-request'; message: string };

interface TransitionCase {
  status: DesignStatus;
  authorId: number;
  hasChosen: boolean;
}

/**
 * The review state machine (pure, so it is tested on its own):
 * draft → in_review (author or admin; mounts chosen), in_review → draft (any engineer or admin,
 * with a comment), in_review → released (an engineer or admin other than the author).
 * Everything else is refused.
 */
export function checkTransition(
  user: Pick<User, 'id' | 'role'>,
  design: TransitionCase,
  to: DesignStatus,
  comment: string | undefined,
): ReviewVerdict {
  const from = design.status;
  const isAdmin = user.role === 'admin';
  const isEngineer = user.role === 'engineer';
  if (!isAdmin && !isEngineer) return { ok: false, kind: 'forbidden', message: 'Only engineers and admins change a design' };
  if (from === 'draft' && to === 'in_review') {
    if (!isAdmin && design.authorId !== user.id) return { ok: false, kind: 'forbidden', message: REVIEW_MESSAGES.authorSubmits };
    if (!design.hasChosen) return { ok: false, kind: 'conflict', message: REVIEW_MESSAGES.chooseFirst };
    return { ok: true };
  }
  if (from === 'in_review' && to === 'draft') {
    if (!comment?.trim()) return { ok: false, kind: 'bad-request', message: REVIEW_MESSAGES.commentRequired };
    return { ok: true };
  }
  if (from === 'in_review' && to === 'released') {
    if (design.authorId === user.id) return { ok: false, kind: 'forbidden', message: REVIEW_MESSAGES.otherReleases };
    return { ok: true };
  }
  return { ok: false, kind: 'conflict', message: REVIEW_MESSAGES.notAllowed(from, to) };
}
