import { springRow } from '../../../test/factories/catalog-row.factory.js';
import { prepareProblem, type SelectionInput } from '../selection-problem.js';
import {
  CATALOG_COLUMN_INDEX,
  CATALOG_COLUMNS,
  toCatalogTuple,
  type CatalogRow,
  type DetailsLoader,
  type MountDetails,
} from './catalog-tuple.js';
import { SelectionEvaluation } from './selection-evaluation.js';
import { wordsInReaderUnits } from '../../common/units/reader-words.js';

/** A candidate's words as a metric reader reads them. */
const metric = <T>(value: T): T => wordsInReaderUnits(value, 'SI');

/**
 * Engine tests over invented rows (no database). Closed forms: docs/engineering/transmissibility.md
 * §2–§4 and docs/engineering/static-deflection.md §1–§4 [CF]; the checks: docs/engineering/selection.md
 * §5–§11; check values (CV ids): docs/engineering/check-values.md.
 */
const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
const W4 = (1000 * 9.80665) / 4;

function row(fields: Partial<CatalogRow>): CatalogRow {
  const created = springRow(fields);
  allRows.push(created);
  return created;
}

function problem(overrides: Partial<SelectionInput> = {}) {
  return prepareProblem({
    components: [{ name: 'Machine', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } }],
    mountPoints: CORNERS,
    frequencies: [{ frequencyHz: 25, label: '1× shaft' }],
    criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0 },
    ...overrides,
  });
}

const allRows: CatalogRow[] = [];
const names = new Map([
  [1, 'Invented Springs'],
  [2, 'Invented Rubber'],
]);
/** The rows below carry their details already; nothing is left to load. */
const noLoader: DetailsLoader = async () => new Map();

/** An evaluation over rows as the reader delivers them (tuples, with the mount type). */
const evaluate = (p: ReturnType<typeof problem>, rows: CatalogRow[], options?: { everySeries?: boolean }): SelectionEvaluation =>
  new SelectionEvaluation(
    p,
    rows.map((r) => toCatalogTuple(r, true)),
    options,
  );

describe('SelectionEvaluation', () => {
  it('CV-12 [CF]: an elastomer with δ_st = 5 mm and n_d = 1.4 has fn = 8.340 Hz; T is hysteretic with η', () => {
    const elastomer = row({
      verticalStiffnessNPerM: W4 / 0.005,
      dynamicStiffnessRatio: 1.4,
      dampingRatio: null,
      lossFactor: 0.1,
      mountType: 'elastomer_mount',
    });
    const evaluation = evaluate(problem({ frequencies: [{ frequencyHz: 30 }] }), [elastomer]);
    const c = metric(evaluation.describe(evaluation.findUniform(elastomer.id), names));
    expect(c.verticalNaturalFrequencyHz.toFixed(3)).toBe('8.340');
    expect(c.perPoint[0].staticDeflectionMm).toBeCloseTo(5, 10);
    const r = 30 / c.verticalNaturalFrequencyHz;
    const hysteretic = Math.sqrt(1 + 0.01) / Math.sqrt((1 - r * r) ** 2 + 0.01);
    expect(c.isolation[0].transmissibility).toBeCloseTo(hysteretic, 12);
    // resonance amplification √(1 + η²)/η (CV-10: η = 0.1 → 10.05)
    expect(c.resonanceAmplification.toFixed(2)).toBe('10.05');
  });

  it('ranks passing candidates first (at most limit), then the best failing ones', async () => {
    const rows = [
      row({ verticalStiffnessNPerM: 1e5, unitPrice: 60 }), // passes
      row({ verticalStiffnessNPerM: 1.1e5, unitPrice: 50 }), // passes, cheaper
      row({ verticalStiffnessNPerM: 3e6, unitPrice: 1 }), // far too stiff: fails isolation
      row({ ratedLoadN: 2000 }), // overloaded: fails utilisation
    ];
    const evaluation = evaluate(problem(), rows);
    expect(evaluation.considered).toBe(4);
    const ranked = (await evaluation.rank(1, noLoader)).map((c) => metric(evaluation.describe(c, names)));
    expect(ranked.map((c) => [c.mountId, c.passes])).toEqual([
      [rows[1].id, true],
      [expect.any(Number), false],
    ]);
    const all = (await evaluation.rank(10, noLoader)).map((c) => metric(evaluation.describe(c, names)));
    expect(all.map((c) => c.passes)).toEqual([true, true, false, false]);
    // the price reference is the cheapest passing candidate, not the failing 1-unit one
    expect(all[0].scoreTerms.price).toBeCloseTo(0.15, 15);
    expect(all[1].scoreTerms.price).toBeCloseTo(0.15 * (200 / 240), 15);
    const overloaded = all.find((c) => c.mountId === rows[3].id)!;
    expect(overloaded.reasons).toEqual([
      'Load outside the allowed 50 %–100 % of the rated load with the 10 % weight margin at point A (135 %), point B (135 %), point C (135 %), point D (135 %).',
    ]);
  });

  it('keeps a series only when its per-point sizes level the skid better than one size would', () => {
    const skid = problem({
      components: [
        { name: 'Pump', massKg: 300, cg: { x: 0.65, y: 0.05, z: 0.5 } },
        { name: 'Motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 } },
        { name: 'Frame', massKg: 250, cg: { x: 0, y: 0, z: 0.1 } },
      ],
    });
    const fine = [2700, 2950, 3200, 3450].map((p) => row({ series: 'F', ratedLoadN: p, verticalStiffnessNPerM: p / 0.03 }));
    // a coarse ladder: only one size fits, so the series would duplicate a uniform candidate
    const coarse = [1500, 3300, 7000].map((p) => row({ series: 'C', supplierId: 2, ratedLoadN: p, verticalStiffnessNPerM: p / 0.03 }));
    const evaluation = evaluate(skid, [...fine, ...coarse]);
    expect(evaluation.findSeries('1:F')).toBeGreaterThanOrEqual(0);
    expect(evaluation.findSeries('2:C')).toBe(-1);
    expect(evaluation.considered).toBe(fine.length + coarse.length + 1);
    const series = metric(evaluation.describe(evaluation.findSeries('1:F'), names));
    expect(series.kind).toBe('series');
    expect(series.seriesId).toBe('1:F');
    expect(series.levelErrorMm).toBeLessThan(1);
    // evaluated anyway when asked for (a choice made outside the list)
    const direct = evaluate(skid, coarse, { everySeries: true });
    expect(direct.findSeries('2:C')).toBeGreaterThanOrEqual(0);
  });

  it('explains temperature, deflection, type and supplier failures in words', () => {
    const p = problem({
      criteria: {
        minIsolationPct: 90,
        minUtilization: 0.5,
        maxUtilization: 1.0,
        ambientTempC: 90,
        mountTypes: ['housed_spring'],
        supplierIds: [2],
      },
    });
    const mount = row({ partNumber: 'HOT-1', tempMinC: -20, tempMaxC: 70, maxDeflectionMm: 20 });
    const evaluation = evaluate(p, [mount]);
    const c = metric(evaluation.describe(0, names));
    expect(c.passes).toBe(false);
    // the default 10 % weight margin (selection.md §17): 24.5 mm × 1.1 = 27 mm
    expect(c.reasons).toEqual([
      'Static deflection at point A (27 mm with the 10 % weight margin) exceeds the 20 mm the mount HOT-1 allows.',
      'Static deflection at point B (27 mm with the 10 % weight margin) exceeds the 20 mm the mount HOT-1 allows.',
      'Static deflection at point C (27 mm with the 10 % weight margin) exceeds the 20 mm the mount HOT-1 allows.',
      'Static deflection at point D (27 mm with the 10 % weight margin) exceeds the 20 mm the mount HOT-1 allows.',
      'The ambient temperature 90 °C is outside the range of HOT-1 (-20 °C to 70 °C).',
      'The mount type open spring is not among the allowed types.',
      'Invented Springs is not among the allowed suppliers.',
    ]);
  });

  it('words the same failures in inches and °F for a US customary reader (1 in = 25.4 mm; °F = 1.8 °C + 32)', () => {
    const p = problem({ criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, ambientTempC: 90 } });
    const evaluation = evaluate(p, [row({ partNumber: 'HOT-1', tempMinC: -20, tempMaxC: 70, maxDeflectionMm: 20 })]);
    const c = wordsInReaderUnits(evaluation.describe(0, names), 'US');
    // 24.52 mm × 1.1 (the default 10 % weight margin) = 26.97 mm = 1.062 in, 20 mm = 0.787 in; 90 °C = 194 °F, −20 °C = −4 °F, 70 °C = 158 °F
    expect(c.reasons).toContain(
      'Static deflection at point A (1.06 in with the 10 % weight margin) exceeds the 0.79 in the mount HOT-1 allows.',
    );
    expect(c.reasons).toContain('The ambient temperature 194 °F is outside the range of HOT-1 (-4 °F to 158 °F).');
    expect(c.reasons.join(' ')).not.toMatch(/mm|°C/);
    expect(c.perPoint[0].staticDeflectionMm).toBe(metric(evaluation.describe(0, names)).perPoint[0].staticDeflectionMm); // figures stay SI
  });

  it('states utilisation on the check’s basis: utilizationWithMargin is what the upper check compares (docs/engineering/selection.md)', () => {
    // W/4 = 2451.66 N on a 2600 N rating: 0.943 bare, × 1.1 = 1.037 > 1.0 with a 10 % margin (fails); 0.943 alone would pass
    const p = problem({ criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, weightMarginPct: 10 } });
    const c = metric(evaluate(p, [row({ ratedLoadN: 2600 })]).describe(0, names));
    expect(c.perPoint[0].utilization).toBeCloseTo(W4 / 2600, 12);
    expect(c.perPoint[0].utilizationWithMargin).toBeCloseTo((W4 * 1.1) / 2600, 12);
    expect(c.passes).toBe(false);
    expect(c.reasons[0]).toContain('with the 10 % weight margin at point A (104 %)');
    const none = metric(
      evaluate(problem({ criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, weightMarginPct: 0 } }), [
        row({ ratedLoadN: 2600 }),
      ]).describe(0, names),
    );
    expect(none.perPoint[0].utilizationWithMargin).toBe(none.perPoint[0].utilization);
    expect(none.passes).toBe(true);
  });

  it('a machine of one point mass: no modes, and the candidate says so among its assumptions (selection.md §14)', () => {
    const pointMass = evaluate(problem({ components: [{ name: 'M', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 } }] }), [row({})]);
    pointMass.checkFinalist(0);
    const c = metric(pointMass.describe(0, names));
    expect(c.modes).toBeUndefined();
    expect(c.passes).toBe(true);
    expect(c.notes.some((n) => /^Rigid-body modes not computed/.test(n))).toBe(true);
    expect(c.notes.some((n) => /^Whole-machine verdict not computed/.test(n))).toBe(true);
    expect(c.assumptions).toContain(
      'The machine has no usable inertia (point masses, or all on one line): its rigid-body modes were not checked; ' +
        'only the vertical bounce is judged. Give the components box dimensions or their inertia.',
    );
    expect(c.assumptions?.[0]).toMatch(/^Taken as point masses \(no box or inertia given\): M\./);
  });
});

describe('SelectionEvaluation with rows as the prefilter reads them (no details)', () => {
  it('loads the details of the candidates it ranks only, and applies the checks that need them', async () => {
    const cool = row({ partNumber: 'COOL-1', tempMinC: -10, tempMaxC: 40 });
    const hot = row({ partNumber: 'HOT-2', tempMinC: -10, tempMaxC: 90, verticalStiffnessNPerM: 1.05e5 });
    const unused = row({ partNumber: 'FAR-3', ratedLoadN: 1000 });
    const byId = new Map<number, MountDetails>(
      [cool, hot, unused].map((r) => [
        r.id,
        { partNumber: r.partNumber, mountType: r.mountType, tempMinC: r.tempMinC, tempMaxC: r.tempMaxC },
      ]),
    );
    const asked: number[][] = [];
    const loader: DetailsLoader = async (ids) => {
      asked.push([...ids].sort());
      return new Map(ids.map((id) => [id, byId.get(id)!]));
    };
    const p = problem({ criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0, ambientTempC: 60 } });
    const evaluation = new SelectionEvaluation(
      p,
      [cool, hot, unused].map((r) => toCatalogTuple(r)),
    );
    const ranked = (await evaluation.rank(1, loader)).map((c) => metric(evaluation.describe(c, names)));
    // COOL-1 scored best, but its range stops at 40 °C: it fails once its details are known
    expect(ranked.map((c) => [c.label, c.passes])).toEqual([
      ['HOT-2', true],
      ['COOL-1', false],
    ]);
    expect(ranked[1].reasons).toEqual(['The ambient temperature 60 °C is outside the range of COOL-1 (-10 °C to 40 °C).']);
    expect(asked.flat()).not.toContain(unused.id);
  });
});

describe('CATALOG_COLUMN_INDEX', () => {
  it('matches the order of CATALOG_COLUMNS (the reader selects them in that order)', () => {
    CATALOG_COLUMNS.forEach((name, i) => expect(CATALOG_COLUMN_INDEX[name]).toBe(i));
    expect(Object.keys(CATALOG_COLUMN_INDEX)).toHaveLength(CATALOG_COLUMNS.length);
  });
});
