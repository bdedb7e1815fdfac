import { catalogRow } from '../../../test/factories/catalog-row.factory.js';
import { describe, expect, it } from '@jest/globals';
import { massProperties, prepareWholeMachine, speedSweep, type SpeedSource } from '@tacet/vibration';
import { prepareProblem } from '../selection-problem.js';
import { toCatalogTuple, type CatalogRow } from './catalog-tuple.js';
import { SelectionEvaluation } from './selection-evaluation.js';
import { bandFactors, governingFactor } from './stiffness-band.js';

/**
 * The whole-machine verdict over the stiffness band (docs/engineering/selection.md §20): one sweep
 * of the nominal system over the stretched range against a brute-force search over the band with
 * the kernel (401 factors, each swept over the running range with its skip band).
 */
const POINTS = [1.0, 0, -1.0].flatMap((x, i) => [0.45, -0.45].map((y, j) => ({ label: `P${2 * i + j + 1}`, x, y, z: 0 })));
const COMPONENTS = [
  { name: 'Pump', massKg: 500, cg: { x: 0.6, y: 0.05, z: 0.55 }, box: { lx: 0.8, ly: 0.5, lz: 0.6 } },
  { name: 'Motor', massKg: 700, cg: { x: -0.4, y: 0, z: 0.5 }, box: { lx: 1.0, ly: 0.5, lz: 0.5 } },
];
const ROW: CatalogRow = catalogRow({
  id: 1,
  partNumber: 'BAND-1',
  ratedLoadN: 2600,
  verticalStiffnessNPerM: 6e5,
  horizontalStiffnessNPerM: 4.5e5,
  dynamicStiffnessRatio: 1.2,
  lossFactor: 0.12,
  maxDeflectionMm: null,
  unitPrice: 10,
  leadTimeDays: 5,
});
const OPERATING = {
  speedRangeRpm: { min: 700, max: 1500 },
  orders: [1],
  skipBandsRpm: [{ min: 1000, max: 1080 }],
  sources: [
    { label: 'Impeller', kind: 'unbalance' as const, at: { x: 0.6, y: 0, z: 0.6 }, axis: 'x' as const, rotorMassKg: 30 },
    { label: 'Hum', kind: 'force' as const, at: { x: -0.4, y: 0.2, z: 0.5 }, axis: 'y' as const, amplitudeN: 50, frequencyHz: 19 },
  ],
};

describe('WholeMachineCheck over the stiffness band', () => {
  it('equals a brute-force search over the band (401 factors) to within its step, and names a factor inside the band', async () => {
    const problem = prepareProblem({
      components: COMPONENTS,
      mountPoints: POINTS,
      frequencies: [{ frequencyHz: 700 / 60 }],
      operating: { ...OPERATING },
      criteria: { minIsolationPct: 80, minUtilization: 0.3, maxUtilization: 1.0 },
    });
    const evaluation = new SelectionEvaluation(problem, [toCatalogTuple(ROW, true)]);
    const c = evaluation.describe(0, new Map([[1, 'Invented Rubber']]));
    const verdict = c.wholeMachine!.worst;
    expect(c.wholeMachine!.stiffnessTolerancePct).toBe(15);

    const mass = massProperties(
      COMPONENTS.map((k) => ({
        name: k.name,
        massKg: k.massKg,
        cg: k.cg,
        shape: 'box' as const,
        dimensions: { x: k.box.lx, y: k.box.ly, z: k.box.lz },
      })),
    );
    const mounts = POINTS.map((p) => ({
      position: p,
      stiffness: { x: 4.5e5 * 1.2, y: 4.5e5 * 1.2, z: 6e5 * 1.2 },
      damping: { model: 'hysteretic' as const, lossFactor: 0.12 },
    }));
    const sources: SpeedSource[] = [
      { at: { x: 0.6, y: 0, z: 0.6 }, kind: 'rotating', axis: 'x', order: 1, unbalance: { rotorMassKg: 30, balanceGradeMmPerS: 6.3 } },
      { at: { x: -0.4, y: 0.2, z: 0.5 }, kind: 'directional', axis: 'y', frequencyHz: 19, amplitudeN: 50 },
    ];
    let brute = 0;
    for (let k = 0; k <= 400; k++) {
      const phi = 0.85 + (0.3 * k) / 400;
      const system = prepareWholeMachine(
        { body: { massKg: mass.massKg, cg: mass.cg, inertia: mass.inertia }, mounts },
        { stiffnessFactor: phi },
      );
      for (const source of sources) {
        brute = Math.max(
          brute,
          speedSweep(system, { source, minRpm: 700, maxRpm: 1500, skipBandsRpm: OPERATING.skipBandsRpm }).worst.transmissibility,
        );
      }
    }
    expect(verdict.transmissibility).toBeGreaterThanOrEqual(brute * (1 - 1e-9));
    expect(verdict.transmissibility).toBeLessThanOrEqual(brute * 1.01);
    expect(verdict.stiffnessFactor).toBeGreaterThanOrEqual(0.85);
    expect(verdict.stiffnessFactor).toBeLessThanOrEqual(1.15);
    // the reported point is the verdict: the system at that factor gives that T at that frequency
    const at = prepareWholeMachine(
      { body: { massKg: mass.massKg, cg: mass.cg, inertia: mass.inertia }, mounts },
      { stiffnessFactor: verdict.stiffnessFactor },
    );
    const source = sources[OPERATING.sources.findIndex((s) => s.label === verdict.source)];
    const fixed = source.frequencyHz !== undefined;
    const speed = fixed ? 700 : verdict.speedRpm!;
    const one = speedSweep(at, { source, minRpm: speed, maxRpm: speed });
    expect(one.worst.transmissibility).toBeCloseTo(verdict.transmissibility, 9);
  });

  it('governingFactor: the factor nearest 1 that brings the speed back into the running range and out of the skip bands', () => {
    expect(governingFactor(1000, 800, 1200, [], 0.85, 1.15)).toBe(1);
    // 750 rpm nominal-equivalent, below the 800 rpm minimum: the least stiffening that reaches it, φ = (800/750)²
    expect(governingFactor(750, 800, 1200, [], 0.85, 1.25)).toBeCloseTo((800 / 750) ** 2, 12);
    // inside a skip band 950–1050: the nearer edge
    expect(governingFactor(1040, 800, 1200, [{ min: 950, max: 1050 }], 0.85, 1.15)).toBeCloseTo((1050 / 1040) ** 2, 12);
    expect(bandFactors(0)).toEqual([1]);
    expect(bandFactors(10)).toEqual([0.9, 1, 1.1]);
  });
});
