import { designFiles } from './design-files-panel';

const AUTHOR = { id: 3, name: 'Erin Engineer' };
const design = (status: 'draft' | 'in_review' | 'released' | 'superseded') => ({ status, author: AUTHOR, bom: [{}] as never[] });
const as = (role: 'admin' | 'engineer' | 'purchaser' | 'viewer' | 'catalog_manager', id = 9) => ({ id, role });

describe('designFiles (README "Who sees what")', () => {
  it('released: the report for everyone, the BOM for purchasers, engineers and admins', () => {
    expect(designFiles(design('released'), as('viewer'))).toEqual(['report-pdf']);
    expect(designFiles(design('superseded'), as('catalog_manager'))).toEqual(['report-pdf']);
    expect(designFiles(design('released'), as('purchaser'))).toEqual(['bom-csv', 'bom-xlsx', 'report-pdf']);
    expect(designFiles(design('released'), as('engineer'))).toEqual(['bom-csv', 'bom-xlsx', 'report-pdf']);
  });

  it('unreleased: the report for engineers and admins; the BOM for the author, an admin, and engineers while it is in check', () => {
    expect(designFiles(design('draft'), as('viewer'))).toEqual([]);
    expect(designFiles(design('draft'), as('engineer'))).toEqual(['report-pdf']);
    expect(designFiles(design('draft'), as('engineer', AUTHOR.id))).toEqual(['bom-csv', 'bom-xlsx', 'report-pdf']);
    expect(designFiles(design('in_review'), as('engineer'))).toEqual(['bom-csv', 'bom-xlsx', 'report-pdf']);
    expect(designFiles(design('draft'), as('admin'))).toEqual(['bom-csv', 'bom-xlsx', 'report-pdf']);
  });

  it('no BOM before mounts are chosen', () => {
    expect(designFiles({ ...design('released'), bom: [] }, as('purchaser'))).toEqual(['report-pdf']);
  });
});
