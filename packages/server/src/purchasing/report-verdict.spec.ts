import type { Candidate } from '../selection/selection.types.js';
import { reportSafe, verdictReportLines } from './report-verdict.js';

const base = { passes: true, reasons: [], notes: [], assumptions: [] } as unknown as Candidate;

describe('verdict section of the report (docs/engineering/selection.md §14)', () => {
  it('prints the verdict, every reason, the notes and the assumptions of the chosen candidate', () => {
    const { heading, paragraphs } = verdictReportLines({
      ...base,
      passes: false,
      reasons: ['Isolation at 25 Hz is 85 %.', 'At 5 Hz the mounts amplify: 5 Hz is below √2 × the natural frequency.'],
      notes: ['Warning: the support at point A is less than 10× as stiff as the mount on it.'],
      assumptions: ['R-1: the catalog gives no maximum deflection; 30 mm is taken.'],
    });
    expect(heading).toBe('Verdict, notes and assumptions');
    expect(paragraphs).toEqual([
      'Verdict: the chosen mounts do NOT meet 2 checks of the selection:',
      '• Isolation at 25 Hz is 85 %.',
      '• At 5 Hz the mounts amplify: 5 Hz is below sqrt 2 × the natural frequency.',
      'Notes:',
      '• Warning: the support at point A is less than 10× as stiff as the mount on it.',
      'Assumptions (values not given by the catalog or the input, taken on the unfavourable side):',
      '• R-1: the catalog gives no maximum deflection; 30 mm is taken.',
    ]);
  });

  it('says when nothing was assumed, and when a candidate chosen earlier has no record of it', () => {
    expect(verdictReportLines(base).paragraphs).toEqual([
      'Verdict: the chosen mounts meet every check of the selection.',
      'Assumptions: none; every figure comes from the catalog and the design input.',
    ]);
    expect(verdictReportLines({ ...base, assumptions: undefined }).paragraphs[1]).toMatch(/^Assumptions: not recorded/);
  });

  it('spells out the signs the report fonts lack', () => {
    expect(reportSafe('k ≥ 0.8, u ≤ 1, √2, ζ, η')).not.toMatch(/[≤≥√ζη]/);
  });
});
