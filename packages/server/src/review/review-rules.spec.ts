import { describe, expect, it } from '@jest/globals';
import { DESIGN_STATUSES } from '../designs/design-status.js';
import { canBeNamedChecker, checkTransition, misplacedFields } from './review-rules.js';

const author = { id: 1, role: 'engineer' as const };
const other = { id: 2, role: 'engineer' as const };
const admin = { id: 3, role: 'admin' as const };
const design = (status: (typeof DESIGN_STATUSES)[number], hasChosen = true) => ({ status, authorId: 1, hasChosen });

describe('checkTransition (the review state machine)', () => {
  it('admits exactly the three moves of the workflow', () => {
    const allowed: string[] = [];
    for (const from of DESIGN_STATUSES) {
      for (const to of DESIGN_STATUSES) {
        const who = to === 'released' ? other : author;
        if (checkTransition(who, design(from), to, 'why').ok) allowed.push(`${from}→${to}`);
      }
    }
    expect(allowed).toEqual(['draft→in_review', 'in_review→draft', 'in_review→released']);
  });

  it('submitting: author or admin, with mounts chosen', () => {
    expect(checkTransition(author, design('draft'), 'in_review', undefined)).toEqual({ ok: true });
    expect(checkTransition(admin, design('draft'), 'in_review', undefined)).toEqual({ ok: true });
    expect(checkTransition(other, design('draft'), 'in_review', undefined)).toMatchObject({ ok: false, kind: 'forbidden' });
    expect(checkTransition(author, design('draft', false), 'in_review', undefined)).toMatchObject({ ok: false, kind: 'conflict' });
  });

  it('releasing: anyone but the author (an admin author included)', () => {
    expect(checkTransition(other, design('in_review'), 'released', undefined)).toEqual({ ok: true });
    expect(checkTransition(admin, design('in_review'), 'released', undefined)).toEqual({ ok: true });
    expect(checkTransition(author, design('in_review'), 'released', undefined)).toMatchObject({ ok: false, kind: 'forbidden' });
    expect(checkTransition({ id: 1, role: 'admin' }, design('in_review'), 'released', undefined)).toMatchObject({ kind: 'forbidden' });
  });

  it('back to draft needs a comment that is not blank', () => {
    expect(checkTransition(other, design('in_review'), 'draft', ' \n ')).toMatchObject({ ok: false, kind: 'bad-request' });
    expect(checkTransition(other, design('in_review'), 'draft', 'Too soft at B')).toEqual({ ok: true });
  });

  it('other roles change nothing', () => {
    for (const role of ['viewer', 'purchaser', 'catalog_manager'] as const) {
      expect(checkTransition({ id: 1, role }, design('draft'), 'in_review', undefined)).toMatchObject({ kind: 'forbidden' });
    }
  });

  it('a note and a named checker go with sending for check only; messages use words, not state codes', () => {
    expect(misplacedFields('in_review', { note: 'Ready', checkerId: 2 })).toEqual([]);
    expect(misplacedFields('draft', { note: 'x' }).map((p) => p.field)).toEqual(['note']);
    expect(misplacedFields('released', { checkerId: 2 }).map((p) => p.field)).toEqual(['checkerId']);
    expect(checkTransition(author, design('released'), 'in_review', undefined)).toMatchObject({
      message: 'A design cannot go from released to in check',
    });
  });

  it('the named checker is an active engineer or admin other than the author', () => {
    expect(canBeNamedChecker({ id: 2, role: 'engineer', active: true }, 1)).toBe(true);
    expect(canBeNamedChecker({ id: 3, role: 'admin', active: true }, 1)).toBe(true);
    expect(canBeNamedChecker({ id: 1, role: 'engineer', active: true }, 1)).toBe(false);
    expect(canBeNamedChecker({ id: 2, role: 'engineer', active: false }, 1)).toBe(false);
    expect(canBeNamedChecker({ id: 4, role: 'purchaser', active: true }, 1)).toBe(false);
    expect(canBeNamedChecker(null, 1)).toBe(false);
  });
});
