import { designStateWords } from '@tacet/vibration';
import type { DesignStatus } from '../designs/design-status.js';
import type { User } from '../users/user.entity.js';

/** The messages of the review rules (the API returns them as they are). */
export const REVIEW_MESSAGES = {
  chooseFirst: 'Choose mounts before sending the design for check',
  authorSubmits: 'Only the author of this design or an admin sends it for check',
  commentRequired: 'Say why the design goes back to draft (comment)',
  otherReleases: 'A design is released by an engineer other than its author',
  revisionFrom: 'A new revision starts from a released or superseded design',
  notAllowed: (from: DesignStatus, to: DesignStatus) => `A design cannot go from ${STATE_WORDS[from]} to ${STATE_WORDS[to]}`,
  noteWhenSending: 'A note goes with sending for check; the checker writes a comment instead',
  checkerWhenSending: 'A checker is named only when the design is sent for check',
  checkerNotAllowed: 'Ask an active engineer other than the author of this design to check it',
} as const;

/** The states in words, from the glossary (messages never show `in_review`). */
export const STATE_WORDS: Record<DesignStatus, string> = {
  draft: designStateWords('draft'),
  in_review: designStateWords('in_review'),
  released: designStateWords('released'),
  superseded: designStateWords('superseded'),
};

/** Fields of a transition that belong to another move: a note and a named checker go only with sending for check. */
export function misplacedFields(to: DesignStatus, sent: { note?: string; checkerId?: number }): { field: string; message: string }[] {
  const problems: { field: string; message: string }[] = [];
  if (to !== 'in_review' && sent.note !== undefined) problems.push({ field: 'note', message: REVIEW_MESSAGES.noteWhenSending });
  if (to !== 'in_review' && sent.checkerId !== undefined)
    problems.push({ field: 'checkerId', message: REVIEW_MESSAGES.checkerWhenSending });
  return problems;
}

/** Who may be named to check: an active engineer or admin who is not the author. */
export function canBeNamedChecker(candidate: Pick<User, 'id' | 'role' | 'active'> | null, authorId: number): boolean {
  return !!candidate && candidate.active && (candidate.role === 'engineer' || candidate.role === 'admin') && candidate.id !== authorId;
}

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
