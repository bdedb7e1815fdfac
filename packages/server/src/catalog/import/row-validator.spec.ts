import { mapHeader, type HeaderMap } from './header-mapper.js';
import { isEmptyRow, rowKeyParts, validateRow } from './row-validator.js';

const SI_HEADER = [
  'supplier',
  'part_number',
  'series',
  'mount_type',
  'rated_load_n',
  'vertical_stiffness_n_per_mm',
  'horizontal_stiffness_n_per_mm',
  'dynamic_stiffness_ratio',
  'damping_ratio',
  'loss_factor',
  'max_deflection_mm',
  'temp_min_c',
  'temp_max_c',
  'height_mm',
  'restraint_capacity_n',
  'uplift_capacity_n',
  'unit_price',
  'currency',
  'lead_time_days',
];

function headerOf(names: string[]): HeaderMap {
  const { header, problems } = mapHeader(names);
  if (!header) throw new Error(JSON.stringify(problems));
  return header;
}

const si = headerOf(SI_HEADER);

/** A valid SI row with some cells replaced. */
function row(overrides: Record<string, string> = {}): string[] {
  const base: Record<string, string> = {
    supplier: 'Wrenfield Example Mounts',
    part_number: 'WX-S1-01200',
    series: 'S1',
    mount_type: 'open_spring',
    rated_load_n: '1200',
    vertical_stiffness_n_per_mm: '40',
    horizontal_stiffness_n_per_mm: '36',
    dynamic_stiffness_ratio: '1',
    damping_ratio: '0.008',
    loss_factor: '',
    max_deflection_mm: '45',
    temp_min_c: '-40',
    temp_max_c: '120',
    height_mm: '110',
    restraint_capacity_n: '',
    uplift_capacity_n: '',
    unit_price: '42.5',
    currency: 'USD',
    lead_time_days: '21',
  };
  return SI_HEADER.map((name) => overrides[name] ?? base[name]);
}

const problemsOf = (fields: string[], header = si) => validateRow(fields, header).problems;

describe('validateRow', () => {
  it('converts a valid SI row to stored units (stiffness N/mm → N/m)', () => {
    expect(validateRow(row(), si)).toEqual({
      problems: [],
      values: {
        supplierName: 'Wrenfield Example Mounts',
        partNumber: 'WX-S1-01200',
        series: 'S1',
        mountType: 'open_spring',
        ratedLoadN: 1200,
        verticalStiffnessNPerM: 40_000,
        horizontalStiffnessNPerM: 36_000,
        dynamicStiffnessRatio: 1,
        dampingRatio: 0.008,
        lossFactor: null,
        maxDeflectionMm: 45,
        tempMinC: -40,
        tempMaxC: 120,
        heightMm: 110,
        restraintCapacityN: null,
        upliftCapacityN: null,
        unitPrice: 42.5,
        currency: 'USD',
        leadTimeDays: 21,
      },
    });
  });

  it('converts US customary columns exactly (NIST SP 811: 1 lbf = 4.4482216152605 N, 1 in = 0.0254 m)', () => {
    const us = headerOf([
      'supplier',
      'part_number',
      'mount_type',
      'rated_load_lbf',
      'vertical_stiffness_lbf_per_in',
      'horizontal_stiffness_lbf_per_in',
      'loss_factor',
      'max_deflection_in',
      'restraint_capacity_lbf',
      'uplift_capacity_lbf',
    ]);
    const { values, problems } = validateRow(['S', 'P', 'wire_rope', '1', '1', '2', '0.2', '1', '1000', '0.5'], us);
    expect(problems).toEqual([]);
    expect(values?.ratedLoadN).toBe(4.4482216152605);
    // stored to 15 significant digits, without the binary noise of the division (4.4482216152605 / 0.0254 = 175.12683524647637…)
    expect(values?.verticalStiffnessNPerM).toBe(175.126835246476);
    expect(values?.verticalStiffnessNPerM).toBeCloseTo(175.126835246476, 9);
    expect(values?.horizontalStiffnessNPerM).toBeCloseTo(350.253670492952, 9);
    expect(values?.maxDeflectionMm).toBe(25.4);
    expect(values?.restraintCapacityN).toBe(1000 * 4.4482216152605);
    expect(values?.upliftCapacityN).toBe(0.5 * 4.4482216152605);
  });

  it('reads temperatures in °F and heights in inches (°C = (°F − 32)/1.8; 1 in = 25.4 mm, NIST SP 811)', () => {
    const us = headerOf([
      'supplier',
      'part_number',
      'mount_type',
      'rated_load_lbf',
      'vertical_stiffness_lbf_per_in',
      'loss_factor',
      'temp_min_f',
      'temp_max_f',
      'height_in',
    ]);
    const { values, problems } = validateRow(['S', 'P', 'wire_rope', '1', '1', '0.2', '-40', '212', '4.33'], us);
    expect(problems).toEqual([]);
    expect(values?.tempMinC).toBe(-40);
    expect(values?.tempMaxC).toBe(100);
    expect(values?.heightMm).toBe(109.982); // 4.33 × 25.4, without binary noise
    // the limits −80…250 °C are named in °F for a °F column
    expect(validateRow(['S', 'P', 'wire_rope', '1', '1', '0.2', '-120', '212', ''], us).problems).toEqual([
      { column: 'temp_min_f', message: 'must be a number from -112 to 482 (got "-120")' },
    ]);
  });

  it('accepts both units of a quantity when they agree to the digits written, keeping the SI figure', () => {
    const both = headerOf([...SI_HEADER, 'rated_load_lbf', 'temp_max_f', 'height_in']);
    // 1200 N = 269.77 lbf; 120 °C = 248 °F; 110 mm = 4.331 in
    const agree = validateRow([...row(), '269.8', '248', '4.33'], both);
    expect(agree.problems).toEqual([]);
    expect(agree.values).toMatchObject({ ratedLoadN: 1200, tempMaxC: 120, heightMm: 110 });
    // one of the pair left empty: the other is read
    expect(validateRow([...row({ rated_load_n: '' }), '269.8', '', ''], both).values?.ratedLoadN).toBeCloseTo(269.8 * 4.4482216152605, 9);
  });

  it('reports both units of a quantity that disagree, in words, and a required pair left empty', () => {
    const both = headerOf([...SI_HEADER, 'rated_load_lbf', 'temp_max_f']);
    expect(validateRow([...row(), '300', '248'], both).problems).toEqual([
      {
        column: 'rated_load_lbf',
        message:
          'disagrees with rated_load_n: 300 is 1334.47 in the unit of rated_load_n, which says 1200; give one of them, or make them agree',
      },
    ]);
    expect(validateRow([...row(), '269.8', '250'], both).problems[0]?.column).toBe('temp_max_f');
    expect(validateRow([...row({ rated_load_n: '' }), '', ''], both).problems).toEqual([
      { column: 'rated_load_n', message: 'is required' },
    ]);
  });

  it('applies the defaults: currency USD, optional fields (the dynamic stiffness ratio among them) null', () => {
    const minimal = headerOf(['supplier', 'part_number', 'mount_type', 'rated_load_n', 'vertical_stiffness_n_per_mm', 'loss_factor']);
    expect(validateRow(['S', 'P', 'elastomer_pad', '300', '150', '0.2'], minimal).values).toMatchObject({
      series: null,
      dynamicStiffnessRatio: null, // not 1.0: the selection assumes one and says so (docs/engineering/selection.md §14)
      currency: 'USD',
      dampingRatio: null,
      lossFactor: 0.2,
      unitPrice: null,
      leadTimeDays: null,
    });
  });

  it('trims cells, reads the mount type and currency in any case, accepts exponents', () => {
    const { values } = validateRow(
      row({ supplier: '  Wrenfield Example Mounts ', mount_type: ' Open_Spring', currency: 'eur', rated_load_n: '1.2e3' }),
      si,
    );
    expect(values).toMatchObject({ supplierName: 'Wrenfield Example Mounts', mountType: 'open_spring', currency: 'EUR', ratedLoadN: 1200 });
  });

  it.each<[string, Record<string, string>, Array<{ column: string; message: string }>]>([
    ['a missing required text', { supplier: '' }, [{ column: 'supplier', message: 'is required' }]],
    ['a missing required number', { rated_load_n: ' ' }, [{ column: 'rated_load_n', message: 'is required' }]],
    ['a negative load', { rated_load_n: '-3' }, [{ column: 'rated_load_n', message: 'must be a positive number (got "-3")' }]],
    [
      'a zero stiffness',
      { vertical_stiffness_n_per_mm: '0' },
      [{ column: 'vertical_stiffness_n_per_mm', message: 'must be a positive number (got "0")' }],
    ],
    ['text for a number', { height_mm: 'tall' }, [{ column: 'height_mm', message: 'must be a plain number (got "tall")' }]],
    [
      'a decimal comma',
      { unit_price: '12,5' },
      [{ column: 'unit_price', message: 'must be a plain number with "." as the decimal point and no thousands separators (got "12,5")' }],
    ],
    ['infinity', { rated_load_n: 'Infinity' }, [{ column: 'rated_load_n', message: 'must be a plain number (got "Infinity")' }]],
    ['an overflowing number', { rated_load_n: '1e999' }, [{ column: 'rated_load_n', message: 'is too large (got "1e999")' }]],
    [
      'a damping ratio of 1',
      { damping_ratio: '1' },
      [{ column: 'damping_ratio', message: 'must be a number greater than 0 and less than 1 (got "1")' }],
    ],
    [
      'a loss factor above 2',
      { damping_ratio: '', loss_factor: '2.5' },
      [{ column: 'loss_factor', message: 'must be a number greater than 0 and at most 2 (got "2.5")' }],
    ],
    [
      'a dynamic ratio below 1',
      { dynamic_stiffness_ratio: '0.9' },
      [{ column: 'dynamic_stiffness_ratio', message: 'must be a number from 1 to 5 (got "0.9")' }],
    ],
    [
      'a dynamic ratio above 5',
      { dynamic_stiffness_ratio: '5.01' },
      [{ column: 'dynamic_stiffness_ratio', message: 'must be a number from 1 to 5 (got "5.01")' }],
    ],
    [
      'a temperature below −80 °C',
      { temp_min_c: '-81' },
      [{ column: 'temp_min_c', message: 'must be a number from -80 to 250 (got "-81")' }],
    ],
    [
      'min not below max temperature',
      { temp_min_c: '120', temp_max_c: '120' },
      [{ column: 'temp_min_c', message: 'must be below temp_max_c' }],
    ],
    [
      'a fractional lead time',
      { lead_time_days: '3.5' },
      [{ column: 'lead_time_days', message: 'must be a whole number from 0 to 730 (got "3.5")' }],
    ],
    [
      'a lead time over two years',
      { lead_time_days: '731' },
      [{ column: 'lead_time_days', message: 'must be a whole number from 0 to 730 (got "731")' }],
    ],
    [
      'a zero restraint rating',
      { restraint_capacity_n: '0' },
      [{ column: 'restraint_capacity_n', message: 'must be a positive number (got "0")' }],
    ],
    [
      'a negative uplift rating',
      { uplift_capacity_n: '-5' },
      [{ column: 'uplift_capacity_n', message: 'must be a positive number (got "-5")' }],
    ],
    ['a negative price', { unit_price: '-1' }, [{ column: 'unit_price', message: 'must be zero or a positive number (got "-1")' }]],
    [
      'a bad currency',
      { currency: 'US$' },
      [{ column: 'currency', message: 'must be a three-letter currency code such as USD (got "US$")' }],
    ],
    [
      'an unknown mount type',
      { mount_type: 'spring' },
      [
        {
          column: 'mount_type',
          message:
            'must be one of elastomer_pad, elastomer_mount, open_spring, housed_spring, restrained_spring, air_spring, wire_rope (got "spring")',
        },
      ],
    ],
    ['no damping figure', { damping_ratio: '' }, [{ column: 'damping_ratio', message: 'give damping_ratio or loss_factor' }]],
    ['both damping figures', { loss_factor: '0.1' }, [{ column: 'loss_factor', message: 'give damping_ratio or loss_factor, not both' }]],
    ['an over-long part number', { part_number: 'P'.repeat(81) }, [{ column: 'part_number', message: 'is longer than 80 characters' }]],
    ['an over-long supplier', { supplier: 'S'.repeat(121) }, [{ column: 'supplier', message: 'is longer than 120 characters' }]],
    [
      'a line break in a text',
      { series: 'S1\nS2' },
      [{ column: 'series', message: 'must be one line of text without control characters' }],
    ],
  ])('reports %s', (_case, overrides, expected) => {
    expect(problemsOf(row(overrides))).toEqual(expected);
  });

  it('collects every problem of a row, not only the first', () => {
    const problems = problemsOf(row({ rated_load_n: '-3', damping_ratio: '1.5', currency: 'dollars', lead_time_days: 'soon' }));
    expect(problems.map((p) => p.column)).toEqual(['rated_load_n', 'damping_ratio', 'currency', 'lead_time_days']);
  });

  it('does not add "give a damping figure" when the damping cell failed its own rule', () => {
    expect(problemsOf(row({ damping_ratio: '-0.1' })).map((p) => p.column)).toEqual(['damping_ratio']);
  });

  it('keeps formula-like text as text, removing only the export guard', () => {
    const { values } = validateRow(row({ part_number: "=cmd|' /C calc'!A0", series: "'+SUM(A1:A2)", supplier: "'Plain" }), si);
    expect(values).toMatchObject({ partNumber: "=cmd|' /C calc'!A0", series: '+SUM(A1:A2)', supplierName: "'Plain" });
  });

  it('refuses a row whose field count differs from the header, with one row problem', () => {
    expect(problemsOf(['Wrenfield Example Mounts', 'WX-1'])).toEqual([{ column: '', message: 'the row has 2 fields; the header has 19' }]);
    const wide = [...row(), ...Array.from({ length: 10_000 - SI_HEADER.length }, () => 'x')];
    expect(problemsOf(wide)).toEqual([{ column: '', message: 'the row has 10000 fields; the header has 19' }]);
  });

  it('tolerates extra empty fields after the last column (trailing separators)', () => {
    expect(problemsOf([...row(), '', ' '])).toEqual([]);
  });

  it('refuses a value under a column without a name', () => {
    const header = headerOf([...SI_HEADER, '']);
    expect(problemsOf([...row(), ''], header)).toEqual([]);
    expect(problemsOf([...row(), 'stray'], header)).toEqual([
      { column: 'column 20', message: 'has a value but the header gives this column no name' },
    ]);
  });
});

describe('rowKeyParts and isEmptyRow', () => {
  it('gives the supplier and part number of a row, even an invalid one', () => {
    expect(rowKeyParts(row({ rated_load_n: 'x', part_number: ' P-1 ' }), si)).toEqual({
      supplierName: 'Wrenfield Example Mounts',
      partNumber: 'P-1',
    });
    expect(rowKeyParts(row({ supplier: '' }), si)).toBeNull();
  });

  it('sees blank lines and separator-only rows as empty', () => {
    expect(isEmptyRow([''])).toBe(true);
    expect(isEmptyRow([' ', '', '\t'])).toBe(true);
    expect(isEmptyRow(['', 'x'])).toBe(false);
  });
});
