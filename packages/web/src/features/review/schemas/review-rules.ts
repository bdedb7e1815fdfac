import type { SessionUser } from '@/lib/auth';
import type { Design, DesignStatus } from '@/types/design-api';

/**
 * What the signed-in user may do with a design in check and release. It mirrors the server's
 * rules (the server has the final say) so that the screen offers only what will be accepted
 * and says why something is not offered.
 */
export interface ActionRule {
  /** The button is shown at all. */
  visible: boolean;
  /** Why the shown button cannot be used now; null when it can. */
  blockedBy: string | null;
}

export interface ReviewActions {
  sendForCheck: ActionRule;
  returnToDraft: ActionRule;
  release: ActionRule;
  newRevision: ActionRule;
  /** A line for users who may not move designs at all (purchaser, viewer...). */
  readOnlyNote: string | null;
}

const HIDDEN: ActionRule = { visible: false, blockedBy: null };
const OPEN: ActionRule = { visible: true, blockedBy: null };

export const NEEDS_CHOSEN_MOUNTS = 'Choose mounts before sending the design for check.';
export const AUTHOR_CANNOT_RELEASE = 'You wrote this design, so another engineer releases it.';
export const ONLY_AUTHOR_SENDS = 'Only the author or an administrator sends this draft for check.';
export const NOT_A_DESIGNER = 'Engineers and administrators move designs through check and release.';

function isDesigner(user: SessionUser): boolean {
  return user.role === 'engineer' || user.role === 'admin';
}

export function reviewActions(design: Design, user: SessionUser): ReviewActions {
  const status: DesignStatus = design.status;
  if (!isDesigner(user)) {
    return { sendForCheck: HIDDEN, returnToDraft: HIDDEN, release: HIDDEN, newRevision: HIDDEN, readOnlyNote: NOT_A_DESIGNER };
  }
  const isAuthor = design.author.id === user.id;
  const actions: ReviewActions = {
    sendForCheck: HIDDEN,
    returnToDraft: HIDDEN,
    release: HIDDEN,
    newRevision: HIDDEN,
    readOnlyNote: null,
  };
  if (status === 'draft') {
    if (!isAuthor && user.role !== 'admin') {
      actions.sendForCheck = { visible: true, blockedBy: ONLY_AUTHOR_SENDS };
    } else {
      actions.sendForCheck = design.chosen ? OPEN : { visible: true, blockedBy: NEEDS_CHOSEN_MOUNTS };
    }
  }
  if (status === 'in_review') {
    actions.returnToDraft = OPEN;
    actions.release = isAuthor ? { visible: true, blockedBy: AUTHOR_CANNOT_RELEASE } : OPEN;
  }
  if (status === 'released' || status === 'superseded') {
    actions.newRevision = OPEN;
  }
  return actions;
}

/** The comment sent with a return to draft: required, at most 2000 characters. */
export function returnCommentProblem(comment: string): string | null {
  const text = comment.trim();
  if (!text) return 'Say what needs to change, so the author knows what to fix.';
  if (text.length > 2000) return 'Keep the comment under 2000 characters.';
  return null;
}
