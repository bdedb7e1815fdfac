import { KNOWN_COLUMN_NAMES } from './catalog-columns.js';
import { MAX_HEADER_COLUMNS, mapHeader } from './header-mapper.js';

const REQUIRED_SI = ['supplier', 'part_number', 'mount_type', 'rated_load_n', 'vertical_stiffness_n_per_mm', 'damping_ratio'];

describe('mapHeader', () => {
  it('maps names case-insensitively, in any order, with surrounding spaces', () => {
    const { header, problems } = mapHeader([
      ' Part_Number',
      'SUPPLIER',
      'damping_ratio',
      'Rated_Load_LBF',
      'mount_type',
      'vertical_stiffness_n_per_mm ',
    ]);
    expect(problems).toEqual([]);
    expect(header?.columns.map((c) => c?.variant.name)).toEqual([
      'part_number',
      'supplier',
      'damping_ratio',
      'rated_load_lbf',
      'mount_type',
      'vertical_stiffness_n_per_mm',
    ]);
    expect(header?.nameOf).toMatchObject({ ratedLoadN: 'rated_load_lbf', supplierName: 'supplier' });
  });

  it('accepts every known column at once except the second unit of each pair', () => {
    const names = KNOWN_COLUMN_NAMES.filter((name) => !/_(lbf|lbf_per_in|in)$/.test(name));
    expect(mapHeader(names).problems).toEqual([]);
  });

  it('names every missing required column, offering both units', () => {
    const { header, problems } = mapHeader(['supplier', 'series']);
    expect(header).toBeNull();
    expect(problems).toEqual([
      { column: 'part_number', message: 'missing column' },
      { column: 'mount_type', message: 'missing column' },
      { column: 'rated_load_n', message: 'missing column: give rated_load_n or rated_load_lbf' },
      {
        column: 'vertical_stiffness_n_per_mm',
        message: 'missing column: give vertical_stiffness_n_per_mm or vertical_stiffness_lbf_per_in',
      },
      { column: 'damping_ratio', message: 'missing column: give damping_ratio or loss_factor' },
    ]);
  });

  it('is satisfied by loss_factor alone for the damping columns', () => {
    const names = REQUIRED_SI.map((name) => (name === 'damping_ratio' ? 'loss_factor' : name));
    expect(mapHeader(names).problems).toEqual([]);
  });

  it('accepts both units of one quantity (the rows must then agree), naming the first', () => {
    const { header, problems } = mapHeader([...REQUIRED_SI, 'rated_load_lbf', 'temp_min_f', 'temp_min_c', 'height_in']);
    expect(problems).toEqual([]);
    expect(header?.nameOf.ratedLoadN).toBe('rated_load_n');
    expect(header?.nameOf.tempMinC).toBe('temp_min_f');
    expect(header?.nameOf.heightMm).toBe('height_in');
  });

  it('reports unknown and repeated columns by name and position', () => {
    const { problems } = mapHeader([...REQUIRED_SI, 'colour', 'Supplier']);
    expect(problems).toEqual([
      { column: 'colour', message: expect.stringMatching(/^unknown column; the known columns are supplier, part_number, /) },
      { column: 'Supplier', message: 'appears twice in the header (columns 1 and 8)' },
    ]);
  });

  it('ignores columns without a name (their cells must stay empty; see validateRow)', () => {
    const { header, problems } = mapHeader([...REQUIRED_SI, '', ' ']);
    expect(problems).toEqual([]);
    expect(header?.columns.slice(-2)).toEqual([null, null]);
  });

  it('refuses a header with far too many columns in one problem', () => {
    const { problems } = mapHeader(Array.from({ length: 10_000 }, (_, i) => `c${i}`));
    expect(problems).toEqual([
      {
        column: '',
        message: `the header has 10000 columns; a catalog file has at most ${MAX_HEADER_COLUMNS} (see the format description)`,
      },
    ]);
  });

  it('recognises a semicolon-separated file', () => {
    expect(mapHeader(['supplier;part_number;mount_type']).problems).toEqual([
      { column: '', message: 'the columns seem to be separated by semicolons; separate them with commas' },
    ]);
  });
});
