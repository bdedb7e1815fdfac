import { describe, expect, it } from '@jest/globals';
import type { Design } from '../designs/design.entity.js';
import { pdfHasText, pdfPageCount } from '../../test/utils/pdf-text.js';
import { designReportPdf } from './design-report.js';

const design = (status: Design['status']) =>
  ({
    id: 1,
    name: 'Invented skid',
    revision: 1,
    status,
    project: { name: 'Invented plant' },
    author: { name: 'Author' },
    checker: null,
    input: { components: [{ name: 'Machine', massKg: 100, cg: { x: 0, y: 0, z: 0.2 } }] },
    chosen: null,
    bom: [],
    snapshot: null,
  }) as unknown as Design;

describe('designReportPdf', () => {
  it('writes a PDF of at least two pages', async () => {
    const pdf = await designReportPdf(design('draft'), { disturbingFrequencies: [], releasedAt: null, compress: false });
    expect(pdf.subarray(0, 4).toString()).toBe('%PDF');
    expect(pdfPageCount(pdf)).toBe(2);
    expect(pdfHasText(pdf, 'Invented skid')).toBe(true);
    expect(pdfHasText(pdf, 'licensed engineer')).toBe(true);
    expect(pdfHasText(pdf, 'not in this report')).toBe(false);
  }, 20000);
});
