import { catalogRow } from '../../../test/factories/catalog-row.factory.js';
import { wordsInReaderUnits } from '../../common/units/reader-words.js';
import { prepareProblem, type SelectionInput } from '../selection-problem.js';
import { toCatalogTuple, type CatalogRow } from './catalog-tuple.js';
import { SelectionEvaluation } from './selection-evaluation.js';

/**
 * The second mass case (docs/engineering/selection.md §18) against hand calculations: mass, CG,
 * rigid-frame loads on four corners (docs/engineering/mount-loads.md §2) and the bounce estimate
 * fn = √(Σk/m)/2π (docs/engineering/sdof.md §2) [CF].
 */
const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
const G = 9.80665;
const elastomer: CatalogRow = catalogRow({ id: 1, partNumber: 'E-1', ratedLoadN: 4000 });
const names = new Map([[1, 'Invented Rubber']]);

function judged(input: Partial<SelectionInput>, row: CatalogRow = elastomer) {
  const problem = prepareProblem({
    components: [],
    mountPoints: CORNERS,
    frequencies: [{ frequencyHz: 12 }],
    criteria: { minIsolationPct: 90, minUtilization: 0.3, maxUtilization: 1.0 },
    ...input,
  });
  const evaluation = new SelectionEvaluation(problem, [toCatalogTuple(row, true)]);
  evaluation.checkFinalist(0);
  return wordsInReaderUnits(evaluation.describe(0, names), 'SI');
}

describe('second mass case (selection.md §18)', () => {
  // 600 kg of machine at the centre and 400 kg of liquid at x = 0.4 m that drains to 40 kg:
  // operating 1000 kg, CG x = 0.16 m; drained 640 kg, CG x = 0.4·40/640 = 0.025 m.
  const drained = [
    { name: 'Machine', massKg: 600, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } },
    { name: 'Liquid', massKg: 400, altMassKg: 40, cg: { x: 0.4, y: 0, z: 0.4 }, box: { lx: 0.5, ly: 0.5, lz: 0.4 } },
  ];

  it('CV-55 [CF]: mass, CG and loads of the drained case; fn rises by √(1000/640) = 1.25 to 3.979 Hz and the whole machine fails at 12 Hz there only', () => {
    const c = judged({ components: drained });
    const alt = c.altMassCase!;
    expect(alt.massKg).toBeCloseTo(640, 12);
    expect(alt.cg.x).toBeCloseTo(0.025, 12);
    // rigid frame on equal corners: F = W/4·(1 ± x_cg·0.8/0.64)
    const w4 = (640 * G) / 4;
    expect(alt.perPoint.map((p) => p.loadN)).toEqual([1.03125, 1.03125, 0.96875, 0.96875].map((f) => expect.closeTo(w4 * f, 9)));
    expect(c.verticalNaturalFrequencyHz.toFixed(4)).toBe('3.1831');
    expect(alt.verticalNaturalFrequencyHz.toFixed(4)).toBe('3.9789');
    // hysteretic η = 0.1 at 12 Hz: operating r = 3.770, T = 0.0761; drained r = 3.016, T = 1.00499/8.0965 = 0.1241 > 0.1
    expect(c.isolation[0].transmissibility.toFixed(4)).toBe('0.0761');
    expect(alt.isolation[0].transmissibility.toFixed(4)).toBe('0.1241');
    expect(alt.passes).toBe(false);
    expect(c.passes).toBe(false);
    // the verdict is the whole machine's (selection.md §18–§19), over the ±15 % band of an elastomer
    // mount: its worst is at the stiff end, a little above the one-mass figure there (the CG is 25 mm
    // off centre, so the force also drives pitch): fn = 3.9789·√1.15 = 4.2669 Hz, r = 2.8123,
    // T = 1.00499/√((1 − r²)² + 0.01) = 0.1455 [CF]
    expect(c.wholeMachine!.worst.transmissibility).toBeLessThan(0.1);
    expect(alt.wholeMachineWorst!.stiffnessFactor).toBe(1.15);
    expect(alt.wholeMachineWorst!.transmissibility).toBeGreaterThanOrEqual(0.1455);
    expect(alt.wholeMachineWorst!.transmissibility).toBeLessThan(0.1455 * 1.05);
    expect(c.reasons).toEqual([
      expect.stringMatching(
        /^In the second mass case \(640 kg, CG x 0\.025 m, y 0 m\), whole machine, .*: isolation 8\d\.\d % at 12 Hz \(stiffness 15 % above nominal\), below the 90 % required\.$/,
      ),
    ]);
  });

  it('without a second mass there is no second case, and the same machine passes', () => {
    const c = judged({ components: drained.map(({ altMassKg: _alt, ...rest }) => rest) });
    expect(c.altMassCase).toBeUndefined();
    expect(c.passes).toBe(true);
  });

  it('a light second case below the minimum utilisation fails with the points named', () => {
    const centred = [
      { name: 'Machine', massKg: 600, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } },
      { name: 'Liquid', massKg: 400, altMassKg: 1, cg: { x: 0, y: 0, z: 0.4 } },
    ];
    // 601 kg over four corners: 1473.4 N on 3000 N = 49 % < 50 %
    const c = judged(
      {
        components: centred,
        frequencies: [{ frequencyHz: 25 }],
        criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1 },
      },
      { ...elastomer, ratedLoadN: 3000 },
    );
    expect(c.altMassCase!.perPoint[0].utilization).toBeCloseTo((601 * G) / 4 / 3000, 12);
    expect(c.reasons).toEqual([expect.stringMatching(/^In the second mass case \(601 kg.*point A \(49 %/)]);
  });
});
