import { springRow } from '../../../test/factories/catalog-row.factory.js';
import { seismicRestraintDemand } from '@tacet/vibration';
import { prepareProblem } from '../selection-problem.js';
import { toCatalogTuple, type CatalogRow, type DetailsLoader } from './catalog-tuple.js';
import { FAIL } from './checks.js';
import { SelectionEvaluation } from './selection-evaluation.js';
import { wordsInReaderUnits } from '../../common/units/reader-words.js';

/** A candidate's words as a metric reader reads them. */
const metric = <T>(value: T): T => wordsInReaderUnits(value, 'SI');

/**
 * The restraint check in the engine (docs/engineering/seismic-restraint.md §9) over invented rows:
 * screening before the ranking, the exact figures of series sizes, and the words.
 */
const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
/** docs/engineering/check-values.md CV-14: 1000 kg, CG (0.0600, 0.0150, 0.3775) m. */
const SKID = [
  { name: 'Pump', massKg: 300, cg: { x: 0.65, y: 0.05, z: 0.5 } },
  { name: 'Motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 } },
  { name: 'Base frame', massKg: 250, cg: { x: 0, y: 0, z: 0.1 } },
];
const RESTRAINT = { sdsG: 1.0, importanceFactor: 1, zOverH: 0.5, snubberGapMm: 5 };

const row = (fields: Partial<CatalogRow>): CatalogRow => springRow({ restraintCapacityN: null, upliftCapacityN: null, ...fields });

const problem = (restraint: typeof RESTRAINT | null = RESTRAINT) =>
  prepareProblem({
    components: SKID,
    mountPoints: CORNERS,
    frequencies: [{ frequencyHz: 24.67, label: '1× shaft' }],
    criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0 },
    restraint: restraint ?? undefined,
  });
const noLoader: DetailsLoader = async () => new Map();
const evaluate = (rows: CatalogRow[], restraint: typeof RESTRAINT | null = RESTRAINT) =>
  new SelectionEvaluation(
    problem(restraint),
    rows.map((r) => toCatalogTuple(r, true)),
  );
const names = new Map([[1, 'Invented Springs']]);

describe('restraint check in the engine', () => {
  it('ranks a rated mount first even when many cheaper unrated ones would score higher (screened before the ranking)', async () => {
    const rated = row({ mountType: 'restrained_spring', unitPrice: 500, restraintCapacityN: 20_000, upliftCapacityN: 10_000 });
    const cheap = Array.from({ length: 30 }, () => row({ unitPrice: 10 }));
    const evaluation = evaluate([...cheap, rated]);
    const ranked = await evaluation.rank(1, noLoader);
    const best = metric(evaluation.describe(ranked[0]!, names));
    expect(best.mountId).toBe(rated.id);
    expect(best.passes).toBe(true);
    expect(best.restraint?.passes).toBe(true);
    const unrated = metric(evaluation.describe(ranked[1]!, names));
    expect(unrated.passes).toBe(false);
    expect(unrated.reasons).toContain(
      `Seismic restraint: ${unrated.perPoint[0]!.partNumber} has no horizontal restraint rating (points A, B, C, D); ` +
        `the design force puts up to ${Math.round(Math.max(...unrated.restraint!.perPoint.map((p) => p.shearN)))} N on a mount.`,
    );
  });

  it('a series uses each size’s own stiffness: its figures equal the library’s with those stiffnesses', async () => {
    const sizes = [
      row({
        series: 'R',
        mountType: 'restrained_spring',
        ratedLoadN: 2600,
        verticalStiffnessNPerM: 0.9e5,
        horizontalStiffnessNPerM: 0.7e5,
        restraintCapacityN: 20_000,
        upliftCapacityN: 10_000,
      }),
      row({
        series: 'R',
        mountType: 'restrained_spring',
        ratedLoadN: 3000,
        verticalStiffnessNPerM: 1.1e5,
        horizontalStiffnessNPerM: 1.3e5,
        restraintCapacityN: 20_000,
        upliftCapacityN: 10_000,
      }),
    ];
    const evaluation = evaluate(sizes);
    const c = evaluation.findSeries('1:R');
    expect(c).toBeGreaterThanOrEqual(0);
    await evaluation.ensureDetails([c], noLoader);
    evaluation.checkFinalist(c);
    const candidate = metric(evaluation.describe(c, names));
    const kv = candidate.perPoint.map((p) => sizes.find((s) => s.id === p.mountId)!.verticalStiffnessNPerM);
    const kh = candidate.perPoint.map((p) => sizes.find((s) => s.id === p.mountId)!.horizontalStiffnessNPerM!);
    expect(new Set(kv).size).toBe(2); // sizes differ between points
    const p = problem();
    const expected = seismicRestraintDemand({
      ...RESTRAINT,
      snubberGapM: 0.005,
      points: CORNERS,
      verticalStiffnessNPerM: kv,
      horizontalStiffnessNPerM: kh,
      weightN: p.weightN,
      cg: { x: p.cg.x, y: p.cg.y },
      cgHeightM: p.cg.z,
    });
    candidate.restraint!.perPoint.forEach((q, i) => {
      expect(q.shearN).toBeCloseTo(expected.perPoint[i]!.shearN, 9);
      expect(q.tensionN).toBeCloseTo(expected.perPoint[i]!.tensionN, 9);
      expect(q.compressionN).toBeCloseTo(expected.perPoint[i]!.compressionN, 9);
    });
  });

  it('fails a series with an unrated size, an uplift over its rating, and says which', async () => {
    const series = [
      row({ series: 'S', ratedLoadN: 2600, verticalStiffnessNPerM: 0.9e5, restraintCapacityN: 20_000, upliftCapacityN: 10_000 }),
      row({ series: 'S', ratedLoadN: 3000, verticalStiffnessNPerM: 1.1e5 }),
    ];
    const weakUplift = row({ mountType: 'restrained_spring', restraintCapacityN: 20_000, upliftCapacityN: 1 });
    const evaluation = evaluate([...series, weakUplift]);
    const s = evaluation.findSeries('1:S');
    await evaluation.ensureDetails([s], noLoader);
    const described = metric(evaluation.describe(s, names));
    expect(described.passes).toBe(false);
    expect(described.reasons.some((r) => /has no horizontal restraint rating/.test(r))).toBe(true);
    const u = evaluation.findUniform(weakUplift.id);
    const uplift = metric(evaluation.describe(u, names));
    expect(uplift.passes).toBe(false);
    expect(uplift.reasons.some((r) => /Seismic restraint at point [ABCD]: the uplift \d+ N exceeds the uplift rating 1 N/.test(r))).toBe(
      true,
    );
    expect(uplift.restraint!.governing.kind).toBe('tension');
  });

  it('without restraint nothing changes: no figures, no restraint bit', async () => {
    const plain = row({});
    const evaluation = evaluate([plain], null);
    const ranked = await evaluation.rank(5, noLoader);
    const candidate = metric(evaluation.describe(ranked[0]!, names));
    expect(candidate.restraint).toBeUndefined();
    expect(candidate.passes).toBe(true);
    expect(FAIL.restraint).toBeGreaterThan(0);
  });
});
