import { catalogRow } from '../../../test/factories/catalog-row.factory.js';
import { wordsInReaderUnits } from '../../common/units/reader-words.js';
import { massProperties, rigidBodyModes } from '@tacet/vibration';
import { prepareProblem, type SelectionInput } from '../selection-problem.js';
import { toCatalogTuple, type CatalogRow, type DetailsLoader } from './catalog-tuple.js';
import { SelectionEvaluation } from './selection-evaluation.js';

/**
 * Honest under uncertainty (docs/engineering/selection.md §14–§17): assumed catalog values, the
 * springs' checks, the flexible support and the load margins, each against a hand calculation
 * (check values: docs/engineering/check-values.md CV-50 … CV-55). For every missing field: the
 * assumption is listed and the figure it feeds moves in the unfavourable direction.
 */
const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
const G = 9.80665;
/** Load per point of 1000 kg over four symmetric corners, N. */
const W4 = (1000 * G) / 4;
const MACHINE = { name: 'Machine', massKg: 1000, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } };

const row = catalogRow;

function problem(overrides: Partial<SelectionInput> = {}) {
  return prepareProblem({
    components: [MACHINE],
    mountPoints: CORNERS,
    frequencies: [{ frequencyHz: 25, label: '1× shaft' }],
    criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0 },
    ...overrides,
  });
}

const names = new Map([[1, 'Invented Rubber']]);
const noLoader: DetailsLoader = async () => new Map();
const evaluate = (p: ReturnType<typeof problem>, rows: CatalogRow[]) =>
  new SelectionEvaluation(
    p,
    rows.map((r) => toCatalogTuple(r, true)),
  );
/** The uniform candidate of one row, judged by the finalist checks and described. */
function judged(p: ReturnType<typeof problem>, r: CatalogRow) {
  const evaluation = evaluate(p, [r]);
  evaluation.checkFinalist(0);
  return wordsInReaderUnits(evaluation.describe(0, names), 'SI');
}

describe('assumed catalog values (selection.md §14)', () => {
  it('full data: no assumption listed', () => {
    expect(judged(problem(), row({})).assumptions).toEqual([]);
  });

  it('CV-54 [CF]: no dynamic ratio on an elastomer → 2.0 assumed; δ_st = 5 mm gives fn = √(2·g/δ)/2π = 9.968 Hz, above the 8.340 Hz of n_d = 1.4', () => {
    const kv = W4 / 0.005;
    const missing = judged(
      problem({ frequencies: [{ frequencyHz: 30 }] }),
      row({ verticalStiffnessNPerM: kv, dynamicStiffnessRatio: null }),
    );
    const given = judged(problem({ frequencies: [{ frequencyHz: 30 }] }), row({ verticalStiffnessNPerM: kv, dynamicStiffnessRatio: 1.4 }));
    expect(missing.verticalNaturalFrequencyHz.toFixed(3)).toBe('9.968');
    expect(given.verticalNaturalFrequencyHz.toFixed(3)).toBe('8.340');
    // unfavourable: less isolation at 30 Hz than with the ratio the catalog would have given
    expect(missing.isolation[0].transmissibility).toBeGreaterThan(given.isolation[0].transmissibility);
    expect(missing.assumptions).toEqual([
      expect.stringMatching(/gives no dynamic-to-static stiffness ratio; 2 is assumed \(the high end for elastomer mounts/),
    ]);
    expect(given.assumptions).toEqual([]);
  });

  it('a steel spring without a dynamic ratio is computed with 1.0 (rate-independent steel), and says so', () => {
    const spring = judged(problem(), row({ mountType: 'open_spring', dampingRatio: 0.005, lossFactor: null, dynamicStiffnessRatio: null }));
    expect(spring.verticalNaturalFrequencyHz).toBeCloseTo(Math.sqrt((4 * 1e5) / 1000) / (2 * Math.PI), 12);
    expect(spring.assumptions?.[0]).toMatch(/no dynamic-to-static stiffness ratio; 1 is assumed/);
  });

  it('no maximum deflection → the deflection at the rated load is the travel: a spring then lacks its reserve (CV-52)', () => {
    const spring = { mountType: 'open_spring', dampingRatio: 0.005, lossFactor: null } as const;
    // travel 3000 N / 1e5 N/m = 30 mm; 24.517 mm × 1.1 × 1.5 = 40.45 mm > 30 mm
    const missing = judged(problem(), row({ ...spring, maxDeflectionMm: null }));
    expect(missing.passes).toBe(false);
    expect(missing.reasons).toEqual([
      expect.stringMatching(/^Spring R-\d+ at point A: 3 mm of travel left beyond the static deflection of 27 mm/),
      ...Array(3).fill(expect.any(String)),
    ]);
    expect(missing.assumptions).toContainEqual(
      expect.stringMatching(/no maximum deflection; the deflection at the rated load \(30 mm\) is taken as the travel/),
    );
    // the same spring with the travel given passes
    expect(judged(problem(), row({ ...spring, maxDeflectionMm: 50 })).passes).toBe(true);
  });

  it('no horizontal stiffness → the whole machine is judged at 0.2× and 1.0× the vertical, the worse decides; a mode near a disturbing frequency at the soft end is a note', () => {
    const mass = massProperties([{ ...MACHINE, shape: 'box', dimensions: { x: 1.6, y: 0.9, z: 0.6 } }]);
    const modesAt = (ratio: number) =>
      rigidBodyModes({
        massKg: mass.massKg,
        inertia: mass.inertia,
        cg: mass.cg,
        mounts: CORNERS.map((p) => ({ position: p, stiffness: { x: ratio * 1e5, y: ratio * 1e5, z: 1e5 } })),
      }).modes.map((m) => m.frequencyHz);
    const soft = modesAt(0.2);
    const stiff = modesAt(1);
    const fd = soft[0];
    // precondition: at the stiff end no mode lies within ±20 % of fd
    expect(stiff.every((f) => Math.abs(f - fd) > 0.2 * fd)).toBe(true);
    // a horizontal force at the CG at fd: it drives the lowest (sway/roll) mode of the soft end
    const p = problem({
      frequencies: [{ frequencyHz: fd, label: 'test' }],
      criteria: { minIsolationPct: 0, minUtilization: 0.5, maxUtilization: 1.0, stiffnessTolerancePct: 0 },
      operating: {
        orders: [],
        sources: [{ label: 'side force', kind: 'force', axis: 'y', frequencyHz: fd, amplitudeN: 100, at: { x: 0, y: 0, z: 0.3 } }],
      },
    });
    const full = judged(p, row({ horizontalStiffnessNPerM: 1e5 }));
    const missing = judged(p, row({ horizontalStiffnessNPerM: null }));
    expect(full.reasons.some((r) => r.includes('mode at'))).toBe(false);
    expect(missing.notes).toContainEqual(
      expect.stringMatching(
        /mode at .* \(with the horizontal stiffness the catalog does not give taken as 0\.2× the vertical\).*The whole-machine verdict judges it\./,
      ),
    );
    // the soft end puts a mode on the force's frequency: the worse end governs and amplifies
    expect(missing.wholeMachine!.worst.transmissibility).toBeGreaterThan(full.wholeMachine!.worst.transmissibility);
    expect(missing.wholeMachine!.worst.transmissibility).toBeGreaterThan(1);
    expect(missing.passes).toBe(false);
    expect(missing.reasons[0]).toMatch(
      /amplify .*\(the horizontal stiffness the catalog does not give taken as 0\.2× the vertical\)|taken as 0\.2× the vertical\).* amplify/,
    );
    // the modes shown are those at the stiff end
    expect(missing.modes!.map((m) => m.frequencyHz)).toEqual(stiff.map((f) => expect.closeTo(f, 9)));
    expect(missing.assumptions).toEqual([
      expect.stringMatching(/no horizontal stiffness; the whole machine is judged with 0\.2× and 1× the vertical/),
    ]);
  });

  it('a candidate with assumptions ranks below an otherwise equal one with full data', async () => {
    const assumed = row({ id: 9001, horizontalStiffnessNPerM: null }); // the lower id would win the last tie-break
    const full = row({ id: 9002 });
    const evaluation = evaluate(problem(), [assumed, full]);
    const ranked = (await evaluation.rank(2, noLoader)).map((c) => evaluation.describe(c, names));
    expect(ranked.map((c) => [c.mountId, c.passes, c.score])).toEqual([
      [9002, true, ranked[0].score],
      [9001, true, ranked[0].score],
    ]);
  });
});

describe('coil springs (selection.md §16)', () => {
  const spring = { mountType: 'open_spring', dampingRatio: 0.005, lossFactor: null } as const;

  it('CV-51 [hand calculation]: lateral stability k_h/k_v = 0.79 fails, 0.80 passes; no k_h cannot be shown', () => {
    const unstable = judged(problem(), row({ ...spring, horizontalStiffnessNPerM: 0.79e5 }));
    expect(unstable.passes).toBe(false);
    expect(unstable.reasons).toEqual([
      expect.stringMatching(/^R-\d+ is laterally unstable: its horizontal stiffness is 0\.79× the vertical, below the 0\.8×/),
    ]);
    expect(judged(problem(), row({ ...spring, horizontalStiffnessNPerM: 0.8e5 })).passes).toBe(true);
    const unknown = judged(problem(), row({ ...spring, horizontalStiffnessNPerM: null }));
    expect(unknown.reasons).toContainEqual(expect.stringMatching(/^Lateral stability of R-\d+ cannot be shown/));
    // an elastomer is not held to the springs' rule
    expect(judged(problem(), row({ horizontalStiffnessNPerM: 0.3e5 })).passes).toBe(true);
  });

  it('CV-52 [hand calculation]: reserve travel δ_max ≥ 1.5 × 1.1 × 24.517 mm = 40.45 mm', () => {
    expect(judged(problem(), row({ ...spring, maxDeflectionMm: 40.4 })).passes).toBe(false);
    expect(judged(problem(), row({ ...spring, maxDeflectionMm: 40.5 })).passes).toBe(true);
    expect(judged(problem(), row({ maxDeflectionMm: 40.4 })).passes).toBe(true); // an elastomer: the plain travel check
  });

  it('CV-53 [hand calculation]: light case u·(1 − 10 %) — a spring at u = 0.53 falls to 0.477 < 0.5 and fails; with no margin it passes', () => {
    const rated = W4 / 0.53;
    const light = judged(problem(), row({ ...spring, ratedLoadN: rated }));
    expect(light.passes).toBe(false);
    expect(light.reasons).toEqual([
      expect.stringMatching(/^In the light case \(weight less the 10 % margin\) the springs are below the minimum 50 %.*point A \(48 %\)/),
    ]);
    const exact = problem({ criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1, weightMarginPct: 0 } });
    expect(judged(exact, row({ ...spring, ratedLoadN: rated })).passes).toBe(true);
    expect(judged(problem(), row({ ratedLoadN: rated })).passes).toBe(true); // elastomer: no light-case rule
  });

  it('lists that coil surge is not checked (the catalog gives no coil data)', () => {
    expect(judged(problem(), row({ ...spring })).assumptions).toEqual([expect.stringMatching(/^Coil surge not checked/)]);
  });
});

describe('flexible support (selection.md §15)', () => {
  const withSupport = (kNPerMm: (label: string) => number | undefined) =>
    problem({ mountPoints: CORNERS.map((p) => ({ ...p, supportStiffnessNPerMm: kNPerMm(p.label) })) });

  it('CV-50 [CF]: a support 10× the mount in series: fn = √(4·90 909.09/1000)/2π = 3.0350 Hz (3.1831 Hz rigid); no warning at exactly 10×', () => {
    const c = judged(
      withSupport(() => 1000),
      row({}),
    );
    expect(c.verticalNaturalFrequencyHz.toFixed(4)).toBe('3.0350');
    expect(judged(problem(), row({})).verticalNaturalFrequencyHz.toFixed(4)).toBe('3.1831');
    // the bounce mode of the symmetric machine is the series frequency too
    expect(c.modes!.find((m) => m.dominant === 'bounce')!.frequencyHz.toFixed(4)).toBe('3.0350');
    expect(c.notes.some((n) => n.startsWith('Warning: the support'))).toBe(false);
    expect(c.perPoint[0].supportDeflectionMm).toBeCloseTo(W4 / 1000, 9);
  });

  it('a softer support at one point: its deflection adds to the level error, and the rule-of-thumb warning names it', () => {
    const c = judged(
      withSupport((label) => (label === 'A' ? 500 : undefined)),
      row({}),
    );
    // equal mounts, equal loads: only A's support deflects, W4/500 N/mm = 4.903 mm
    expect(c.levelErrorMm).toBeCloseTo(W4 / 500, 9);
    expect(c.perPoint.map((p) => p.supportDeflectionMm)).toEqual([expect.closeTo(W4 / 500, 9), undefined, undefined, undefined]);
    expect(c.notes).toContainEqual(
      expect.stringMatching(
        /^Warning: the support at point A is less than 10× as stiff as the mount on it \(a rule of thumb, no published source\)/,
      ),
    );
  });
});
