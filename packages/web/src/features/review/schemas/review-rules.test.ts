import { TEST_USERS } from '@/testing/factories';
import { demoCandidates, makeDesign } from '@/testing/design-fakes';

import {
  AUTHOR_CANNOT_RELEASE,
  NEEDS_CHOSEN_MOUNTS,
  NOT_A_DESIGNER,
  ONLY_AUTHOR_SENDS,
  returnCommentProblem,
  reviewActions,
} from './review-rules';

const checker = { ...TEST_USERS.engineer, id: 4, email: 'checker@tacet.test', name: 'Chris Checker' };
const chosen = demoCandidates()[0]!;

describe('reviewActions', () => {
  it('lets the author send a draft with chosen mounts for check, and says why not without them', () => {
    expect(reviewActions(makeDesign({ chosen }), TEST_USERS.engineer).sendForCheck).toEqual({ visible: true, blockedBy: null });
    expect(reviewActions(makeDesign({ chosen: null }), TEST_USERS.engineer).sendForCheck).toEqual({
      visible: true,
      blockedBy: NEEDS_CHOSEN_MOUNTS,
    });
    expect(reviewActions(makeDesign({ chosen }), checker).sendForCheck.blockedBy).toBe(ONLY_AUTHOR_SENDS);
    expect(reviewActions(makeDesign({ chosen }), TEST_USERS.admin).sendForCheck.blockedBy).toBeNull();
  });

  it('never lets the author release; another engineer or an admin may', () => {
    const design = makeDesign({ status: 'in_review', chosen });
    expect(reviewActions(design, TEST_USERS.engineer).release).toEqual({ visible: true, blockedBy: AUTHOR_CANNOT_RELEASE });
    expect(reviewActions(design, checker).release).toEqual({ visible: true, blockedBy: null });
    expect(reviewActions(design, TEST_USERS.admin).release.blockedBy).toBeNull();
    expect(reviewActions(design, TEST_USERS.engineer).returnToDraft.blockedBy).toBeNull();
  });

  it('offers a new revision only from released or superseded designs', () => {
    for (const status of ['released', 'superseded'] as const) {
      expect(reviewActions(makeDesign({ status, chosen }), checker).newRevision.visible).toBe(true);
    }
    for (const status of ['draft', 'in_review'] as const) {
      expect(reviewActions(makeDesign({ status, chosen }), checker).newRevision.visible).toBe(false);
    }
  });

  it('shows nothing to roles that do not design, with a line saying so', () => {
    for (const role of ['purchaser', 'viewer', 'catalog_manager'] as const) {
      const actions = reviewActions(makeDesign({ status: 'in_review', chosen }), TEST_USERS[role]);
      expect([actions.sendForCheck, actions.returnToDraft, actions.release, actions.newRevision].some((a) => a.visible)).toBe(false);
      expect(actions.readOnlyNote).toBe(NOT_A_DESIGNER);
    }
  });
});

describe('returnCommentProblem', () => {
  it('requires some words', () => {
    expect(returnCommentProblem('   ')).toMatch(/Say what needs to change/);
    expect(returnCommentProblem('Mount C is over its rating')).toBeNull();
    expect(returnCommentProblem('x'.repeat(2001))).toMatch(/2000/);
  });
});
