import { catalogRow } from '../../../test/factories/catalog-row.factory.js';
import { describe, expect, it } from '@jest/globals';
import { prepareWholeMachine, resonancePassage, wholeMachineModes, type WholeMachineModel } from '@tacet/vibration';
import { prepareProblem, type SelectionInput } from '../selection-problem.js';
import { toCatalogTuple, type CatalogRow } from './catalog-tuple.js';
import { inReaderUnits } from '../../common/units/reader-words.js';
import { motionMeasure } from '../selection-format.js';
import { DEFAULT_MAX_RESONANT_MOTION_MM } from './passage-check.js';
import { SelectionEvaluation } from './selection-evaluation.js';

/**
 * Start-up and coast-down passage (docs/engineering/start-up-passage.md §1–§4,
 * docs/engineering/check-values.md CV-60, CV-61) against a closed form computed here, independently
 * of the kernel: a symmetric box on four identical mounts level with its CG, horizontal stiffness
 * equal to the vertical, an unbalance turning about y at the CG. The translations then decouple
 * from the rotations and the translational block of the dynamic stiffness is the scalar
 * D(ω) = Σk·(1 + i·d) − m·ω², so the rotating force m_r·e·ω² drives a circle of radius
 * m_r·e·ω²/|D(ω)| at every mount point — at the bounce mode (D = i·η·Σk) the one-mass resonant
 * response F/(η·Σk) (closed form; the one-mass system at resonance, e.g. Harris' Shock and
 * Vibration Handbook, the chapter on the theory of vibration isolation). e = G/Ω_max per ISO
 * 21940-11's definition of the grade (G = e·Ω). Catalog rows are invented.
 */
const M = 1000;
const K = 2.5e5; // per mount, vertical = horizontal; Σk = 1e6 N/m
const SUM_K = 4 * K;
const ROTOR = 200;
const G = 6.3e-3;
const RANGE = { min: 1200, max: 1500 };
const E = G / ((2 * Math.PI * RANGE.max) / 60);

const ROW: CatalogRow = catalogRow({
  id: 1,
  partNumber: 'PASS-1',
  verticalStiffnessNPerM: K,
  horizontalStiffnessNPerM: K,
  maxDeflectionMm: 30,
  unitPrice: 10,
  leadTimeDays: 5,
});
const FAN = {
  label: 'Fan',
  kind: 'unbalance' as const,
  at: { x: 0, y: 0, z: 0 },
  axis: 'y' as const,
  rotorMassKg: ROTOR,
  balanceGradeMmPerS: 6.3,
};

function input(operating: SelectionInput['operating'], criteria: Partial<SelectionInput['criteria']> = {}): SelectionInput {
  return {
    components: [{ name: 'Box', massKg: M, cg: { x: 0, y: 0, z: 0 }, box: { lx: 1.2, ly: 1.0, lz: 0.6 } }],
    mountPoints: [
      { label: 'A', x: 0.5, y: 0.4, z: 0 },
      { label: 'B', x: 0.5, y: -0.4, z: 0 },
      { label: 'C', x: -0.5, y: 0.4, z: 0 },
      { label: 'D', x: -0.5, y: -0.4, z: 0 },
    ],
    frequencies: [{ frequencyHz: RANGE.min / 60 }],
    operating,
    criteria: { minIsolationPct: 85, minUtilization: 0.3, maxUtilization: 1.0, ...criteria },
  };
}

function judge(operating: SelectionInput['operating'], row: CatalogRow = ROW, criteria: Partial<SelectionInput['criteria']> = {}) {
  const evaluation = new SelectionEvaluation(prepareProblem(input(operating, criteria)), [toCatalogTuple(row, true)]);
  return evaluation.describe(0, new Map([[1, 'Invented Rubber']]));
}

/** |D(ω)| = |Σk·(1 + i·d(ω)) − m·ω²| of the translational block [N/m]. */
const dynamicStiffness = (omega: number, d: number) => Math.hypot(SUM_K - M * omega * omega, SUM_K * d);

describe('start-up passage (docs/engineering/start-up-passage.md)', () => {
  it('CV-60 [CF]: hysteretic rows — every mode below the running range with the closed-form circle m_r·e·ω²/|D(ω)|; at the translational modes F/(η·Σk)', () => {
    const c = judge({ speedRangeRpm: RANGE, orders: [1], sources: [FAN] });
    const passage = c.passage!;
    expect(passage).toHaveLength(6); // all six modes lie below 1200 rpm
    expect(passage.map((p) => p.speedRpm)).toEqual([...passage.map((p) => p.speedRpm)].sort((a, b) => a - b));
    const f0 = Math.sqrt(SUM_K / M) / (2 * Math.PI);
    for (const p of passage) {
      const omega = 2 * Math.PI * p.modeFrequencyHz;
      expect(p.speedRpm).toBeCloseTo(60 * p.modeFrequencyHz, 9);
      const expected = ((ROTOR * E * omega * omega) / dynamicStiffness(omega, 0.1)) * 1000;
      expect(Math.abs(p.motionMm / expected - 1)).toBeLessThan(1e-9);
    }
    // the three translational modes sit at √(Σk/m): the one-mass resonant amplitude F/(η·Σk) = m_r·e/(η·m)
    const translational = passage.filter((p) => Math.abs(p.modeFrequencyHz / f0 - 1) < 1e-9);
    expect(translational).toHaveLength(3);
    for (const p of translational) expect(p.motionMm).toBeCloseTo(((ROTOR * E) / (0.1 * M)) * 1000, 12);
    expect(translational[0].motionMm).toBeCloseTo(0.080214, 6); // CV-60
    expect(new Set(passage.filter((p) => !translational.includes(p)).map((p) => p.mode))).toEqual(new Set(['roll', 'pitch', 'yaw']));
    // within the default limit: passes, and a note says so
    expect(c.passageLimitMm).toBe(DEFAULT_MAX_RESONANT_MOTION_MM);
    expect(c.passes).toBe(true);
    expect(c.notes.some((n) => n.startsWith('Start-up and coast-down: 6 modes are passed below the running range'))).toBe(true);
  });

  it('CV-60 [CF]: viscous rows — at the translational modes F/(2ζ·Σk), elsewhere m_r·e·ω²/|Σk(1 + 2iζω/ω_v) − m·ω²|', () => {
    const c = judge({ speedRangeRpm: RANGE, orders: [1], sources: [FAN] }, { ...ROW, dampingRatio: 0.04, lossFactor: null });
    const omegaV = Math.sqrt(SUM_K / M);
    for (const p of c.passage!) {
      const omega = 2 * Math.PI * p.modeFrequencyHz;
      const expected = ((ROTOR * E * omega * omega) / dynamicStiffness(omega, (2 * 0.04 * omega) / omegaV)) * 1000;
      expect(Math.abs(p.motionMm / expected - 1)).toBeLessThan(1e-9);
    }
    expect(Math.max(...c.passage!.map((p) => p.motionMm))).toBeCloseTo(((ROTOR * E) / (2 * 0.04 * M)) * 1000, 12);
  });

  it('fails the candidate with a reason in words when a motion exceeds the limit', () => {
    const c = judge({ speedRangeRpm: RANGE, orders: [1], sources: [FAN] }, ROW, { maxResonantMotionMm: 0.05 });
    expect(c.passes).toBe(false);
    expect(c.passageLimitMm).toBe(0.05);
    expect(c.reasons).toHaveLength(3); // the three translational modes at 0.080 mm
    expect(inReaderUnits(c.reasons[0], 'SI')).toMatch(
      /^Start-up and coast-down: passing the .+ mode at 5\.03 Hz \(302 rpm\), Fan moves the mounts 0\.08 mm \(steady peak\), more than the 0\.05 mm allowed\./,
    );
    // a US reader: 0.080214 mm / 25.4 mm/in (exact, NIST SP 811 App. B) = 0.003158 in; 0.05 mm = 0.001969 in
    expect(inReaderUnits(c.reasons[0], 'US')).toMatch(/moves the mounts 0\.0032 in \(steady peak\), more than the 0\.002 in allowed\./);
    // the same candidate passes with the limit just above its largest motion
    expect(judge({ speedRangeRpm: RANGE, orders: [1], sources: [FAN] }, ROW, { maxResonantMotionMm: 0.0803 }).passes).toBe(true);
  });

  it('one entry per mode and speed: the larger of two unbalances of the same order; another order crosses at its own speed', () => {
    const one = judge({ speedRangeRpm: RANGE, orders: [1], sources: [FAN] }).passage!;
    const small = { ...FAN, label: 'Pulley', rotorMassKg: 50 };
    const two = judge({ speedRangeRpm: RANGE, orders: [1], sources: [small, FAN] }).passage!;
    expect(two).toEqual(one);
    const second = { ...FAN, label: 'Gear', order: 2, rotorMassKg: 20 };
    const three = judge({ speedRangeRpm: RANGE, orders: [1], sources: [FAN, second] }).passage!;
    expect(three).toHaveLength(12);
    for (const p of three.filter((x) => !one.some((y) => y.speedRpm === x.speedRpm))) {
      expect(p.speedRpm).toBeCloseTo((60 * p.modeFrequencyHz) / 2, 9);
    }
  });

  it('nothing to check without an unbalance or without a speed: [] and a note', () => {
    const force = { label: 'Hum', kind: 'force' as const, at: { x: 0, y: 0, z: 0 }, axis: 'z' as const, amplitudeN: 10, frequencyHz: 100 };
    const noUnbalance = judge({ speedRangeRpm: RANGE, orders: [1], sources: [force] });
    expect(noUnbalance.passage).toEqual([]);
    expect(noUnbalance.notes).toContain(
      'Start-up and coast-down: nothing to check (no unbalance source is given; the passage through the modes follows unbalance only).',
    );
    const noSpeed = judge({ orders: [], sources: [force] });
    expect(noSpeed.passage).toEqual([]);
    expect(noSpeed.notes.some((n) => n.startsWith('Start-up and coast-down: nothing to check (no shaft speed'))).toBe(true);
    // a running range below every mode passes none
    const slow = judge({ speedRangeRpm: { min: 100, max: 200 }, orders: [1], sources: [FAN] });
    expect(slow.passage).toEqual([]);
  });

  it('the gap to the restraints, when smaller, is the default limit', () => {
    const evaluation = new SelectionEvaluation(
      prepareProblem({
        ...input({ speedRangeRpm: RANGE, orders: [1], sources: [FAN] }),
        restraint: { sdsG: 0.5, importanceFactor: 1, zOverH: 0, snubberGapMm: 3 },
      }),
      [toCatalogTuple(ROW, true)],
    );
    expect(evaluation.describe(0, new Map()).passageLimitMm).toBe(3);
  });

  it('CV-61 [CF]: the motion at a crossing does not depend on the stiffness factor (K → φK moves ω_j to ω_j·√φ and F to φ·F)', () => {
    const model: WholeMachineModel = {
      body: { massKg: 1850, cg: { x: 0.18, y: -0.07, z: 0.62 }, inertia: { xx: 420, yy: 610, zz: 700, xy: 12, xz: -20, yz: 8 } },
      mounts: [
        [0.9, 0.5, 0],
        [0.9, -0.5, 0.1],
        [-0.8, 0.55, 0],
        [-0.8, -0.5, 0.05],
      ].map(([x, y, z], i) => ({
        position: { x, y, z },
        stiffness: { x: 3e5 + 2e4 * i, y: 2.6e5, z: 6e5 - 3e4 * i },
        damping: i % 2 ? { model: 'viscous' as const, dampingRatio: 0.05 } : { model: 'hysteretic' as const, lossFactor: 0.12 },
      })),
    };
    const source = {
      at: { x: 0.3, y: 0.1, z: 0.9 },
      kind: 'rotating' as const,
      axis: 'x' as const,
      unbalance: { rotorMassKg: 90, balanceGradeMmPerS: 6.3 },
    };
    const passage = (phi: number) => {
      const system = prepareWholeMachine(model, { stiffnessFactor: phi });
      const modeFrequenciesHz = wholeMachineModes(system).modes.map((m) => m.frequencyHz);
      return resonancePassage(system, { sources: [source], minRpm: 2000, maxRpm: 3000, modeFrequenciesHz });
    };
    const nominal = passage(1);
    expect(nominal).toHaveLength(6);
    for (const phi of [0.8, 1.15]) {
      const scaled = passage(phi);
      scaled.forEach((p, j) => {
        expect(p.modeFrequencyHz / nominal[j].modeFrequencyHz).toBeCloseTo(Math.sqrt(phi), 9);
        expect(Math.abs(p.motionM / nominal[j].motionM - 1)).toBeLessThan(1e-7);
      });
    }
  });

  it("motions read with two significant digits (at least one decimal) in the reader's units", () => {
    const si = (mm: number) => inReaderUnits(motionMeasure(mm), 'SI');
    const us = (mm: number) => inReaderUnits(motionMeasure(mm), 'US');
    expect(si(0.080214)).toBe('0.08 mm');
    expect(si(0.0123)).toBe('0.012 mm');
    expect(si(7.44)).toBe('7.4 mm');
    expect(si(12.3)).toBe('12.3 mm');
    // 1 in = 25.4 mm exactly (NIST SP 811, Appendix B): 0.0123 mm = 0.000484 in, 7.44 mm = 0.2929 in, 12.3 mm = 0.4843 in
    expect(us(0.0123)).toBe('0.00048 in');
    expect(us(7.44)).toBe('0.29 in');
    expect(us(12.3)).toBe('0.48 in');
  });
});
