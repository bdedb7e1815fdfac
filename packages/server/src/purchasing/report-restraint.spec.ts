import { describe, expect, it } from '@jest/globals';
import type { Design } from '../designs/design.entity.js';
import { pdfHasText, pdfPageCount } from '../../test/utils/pdf-text.js';
import { restraintFigures } from '../selection/restraint-figures.js';
import { prepareProblem } from '../selection/selection-problem.js';
import { designReportPdf } from './design-report.js';
import { restraintReportLines } from './report-restraint.js';

/** An invented offset machine on four rated restrained springs (docs/engineering/seismic-restraint.md). */
const points = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
const components = [{ name: 'Machine', massKg: 1000, cg: { x: 0.25, y: 0.12, z: 0.4 } }];
const criteria = { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1 };
const restraint = { sdsG: 0.6, importanceFactor: 1.5, zOverH: 0.5, snubberGapMm: 5 };
const problem = prepareProblem({ components, mountPoints: points, frequencies: [{ frequencyHz: 24.67 }], criteria, restraint });
const figures = restraintFigures(
  problem,
  restraint,
  points.map(() => ({
    partNumber: 'IR-330',
    verticalStiffnessNPerM: 1e5,
    horizontalStiffnessNPerM: 1e5,
    restraintCapacityN: 6210,
    upliftCapacityN: 2960,
  })),
);

describe('restraint section of the report', () => {
  it('names the code edition, the input, the force and how it was found, the assumptions, each point, the governing check and the caution', () => {
    const { heading, paragraphs } = restraintReportLines(restraint, figures);
    const text = paragraphs.join('\n');
    expect(heading).toBe('Seismic restraint (ASCE 7-16)');
    expect(text).toContain('Checked to ASCE 7-16 §13.3.1');
    expect(text).toContain('S_DS = 0.600 g, I_p = 1.5, z/h = 0.50, a_p = 2.50, R_p = 2.00, gap to the restraints 5 mm');
    // F_p = 0.4·2.5·0.6·9806.65·2/(2/1.5) = 8826 N (hand calculation, ASCE 7-16 Eq. 13.3-1)
    expect(text).toContain('the formula governs: F_p = 8,826 N');
    expect(text).toContain('at most 0.25 in (6.35 mm): the design force is F_p = 8,826 N');
    expect(text).toContain('Assumptions:');
    expect(paragraphs.filter((p) => / \(IR-330\): shear /.test(p))).toHaveLength(4);
    expect(text).toMatch(/Governing: (horizontal restraint|uplift) at point [ABCD]/);
    expect(text).toContain('Result: every restraint is within its ratings.');
    expect(text).toContain('does not size anchorage');
    expect(text).not.toMatch(/[≤≥√ζη]/); // the report fonts lack them
  });

  it('says so when the chosen mounts were evaluated without restraint, and doubles for a missing gap', () => {
    const text = restraintReportLines({ ...restraint, snubberGapMm: undefined }, undefined).paragraphs.join('\n');
    expect(text).toContain('gap to the restraints not specified');
    expect(text).toContain('run the selection again');
    expect(text).toContain('structural engineer');
  });

  it('keeps a draft report’s paragraphs whole across pages (the DRAFT mark is drawn at the end)', async () => {
    const design = {
      id: 1,
      name: 'Invented skid',
      revision: 1,
      status: 'draft',
      project: { name: 'Invented plant' },
      author: { name: 'Author' },
      checker: null,
      input: { components, mountPoints: points, criteria, restraint },
      chosen: {
        label: 'IR-330',
        supplier: { id: 1, name: 'Invented Springs' },
        verticalNaturalFrequencyHz: 2.2,
        resonanceAmplification: 40,
        levelErrorMm: 1,
        perPoint: [],
        isolation: [],
        reasons: [],
        restraint: figures,
      },
      bom: [],
      snapshot: null,
    } as unknown as Design;
    const pdf = await designReportPdf(design, { disturbingFrequencies: [], releasedAt: null, compress: false });
    // a paragraph broken over a page boundary used to continue as a sliver, one word a page
    expect(pdfPageCount(pdf)).toBeLessThanOrEqual(4);
    expect(pdfHasText(pdf, 'Seismic restraint (ASCE 7-16)')).toBe(true);
    expect(pdfHasText(pdf, 'DRAFT')).toBe(true);
  }, 20000);
});
