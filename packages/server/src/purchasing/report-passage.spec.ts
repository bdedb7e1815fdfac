import { describe, expect, it } from '@jest/globals';
import type { Design } from '../designs/design.entity.js';
import { pdfHasText } from '../../test/utils/pdf-text.js';
import { designReportPdf } from './design-report.js';
import { inReaderUnits } from '../common/units/reader-words.js';
import { passageReportLines } from './report-passage.js';

/** The start-up passage in the calculation report (docs/engineering/start-up-passage.md §4). */
const passage = [
  { mode: 'sway', modeFrequencyHz: 3.2, speedRpm: 192, motionMm: 0.41 },
  { mode: 'roll + sway (mixed)', modeFrequencyHz: 9.87, speedRpm: 592.2, motionMm: 7.44 },
];

describe('passageReportLines', () => {
  it('one line per mode passed, the one above the limit marked, then the limit and what the figures mean', () => {
    const lines = passageReportLines(undefined, { passage, passageLimitMm: 6 } as never).map((line) => inReaderUnits(line, 'SI'));
    expect(lines).toEqual([
      'Start-up and coast-down: the modes passed below the lowest running speed, with the unbalance at that speed.',
      'Passage: the sway mode at 3.20 Hz, passed at 192 rpm: steady peak motion at the mounts 0.41 mm.',
      'Passage: the roll + sway (mixed) mode at 9.87 Hz, passed at 592 rpm: steady peak motion at the mounts 7.4 mm - above the limit.',
      expect.stringMatching(/^Largest motion allowed: 6 mm\. The figures are steady motions at each mode/),
    ]);
  });

  it("the motions in a US reader's units (1 in = 25.4 mm exactly, NIST SP 811 Appendix B)", () => {
    const lines = passageReportLines(undefined, { passage, passageLimitMm: 6 } as never).map((line) => inReaderUnits(line, 'US'));
    // 0.41 mm = 0.0161 in; 7.44 mm = 0.2929 in; 6 mm = 0.2362 in
    expect(lines[1]).toMatch(/steady peak motion at the mounts 0\.016 in\.$/);
    expect(lines[2]).toMatch(/steady peak motion at the mounts 0\.29 in - above the limit\.$/);
    expect(lines[3]).toMatch(/^Largest motion allowed: 0\.24 in\./);
  });

  it('the frozen figures win over the candidate; nothing passed says so; a candidate without passage prints nothing', () => {
    const frozen = { passage: [], passageLimitMm: 2 } as never;
    expect(passageReportLines(frozen, { passage, passageLimitMm: 6 } as never)[1]).toMatch(/^No mode is passed through/);
    expect(passageReportLines(undefined, { passes: true } as never)).toEqual([]);
  });
});

describe('designReportPdf: the passage under the whole machine', () => {
  it('prints the passage and the limit of the criteria', async () => {
    const candidate = {
      label: 'FAN-1',
      supplier: { id: 1, name: 'Invented Rubber' },
      verticalNaturalFrequencyHz: 5.03,
      resonanceAmplification: 10,
      levelErrorMm: 0,
      perPoint: [],
      isolation: [],
      passes: false,
      reasons: [],
      passage,
      passageLimitMm: 6,
    };
    const design = {
      id: 1,
      name: 'Invented fan set',
      revision: 1,
      status: 'draft',
      project: { name: 'Invented plant' },
      author: { name: 'Author' },
      checker: null,
      input: {
        components: [{ name: 'Fan', massKg: 600, cg: { x: 0, y: 0, z: 0.4 } }],
        mountPoints: [],
        criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1, maxResonantMotionMm: 6 },
      },
      chosen: candidate,
      bom: [],
      snapshot: null,
    } as unknown as Design;
    const pdf = await designReportPdf(design, { disturbingFrequencies: [], releasedAt: null, compress: false });
    const wanted = [
      'Largest motion passing a mode on start-up 6 mm',
      'Start-up and coast-down: the modes passed below the lowest running speed',
      'Passage: the sway mode at 3.20 Hz, passed at 192 rpm',
      // the line may break across a page: its two halves
      'Passage: the roll + sway (mixed) mode at 9.87 Hz, passed at 592 rpm',
      '7.4 mm - above the limit',
      'Largest motion allowed: 6 mm.',
    ];
    expect(wanted.filter((text) => !pdfHasText(pdf, text))).toEqual([]);
  }, 20000);
});
