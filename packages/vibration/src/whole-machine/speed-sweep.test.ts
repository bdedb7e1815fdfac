import { describe, expect, it } from 'vitest';
import { boxInertia } from '../assembly/mass-properties.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { hystereticDamping, viscousDamping } from '../sdof/damping.js';
import { transmissibilityHysteretic } from '../transmissibility/transmissibility.js';
import { crossingSpeeds } from './crossings.js';
import { wholeMachineResponse, wholeMachineTransmissibility } from './forced-response.js';
import { seriesStiffness } from './series-stiffness.js';
import { resonancePassage, sourceAmplitudeN, sourceFrequencyHz, speedSweep, sweepGrid } from './speed-sweep.js';
import { prepareWholeMachine, wholeMachineModes } from './system.js';
import { type SpeedSource, type WholeMachineModel } from './types.js';

// Model: docs/engineering/whole-machine.md §6–§9; check values: docs/engineering/check-values.md.

/** The CV-21 machine: box 1000 kg, 2.0 × 1.0 × 0.8 m, four mounts at (±0.9, ±0.4, −0.4 m), kh = 1e5, kv = 2.5e5 N/m. */
function cv21Machine(damping = hystereticDamping(0.1)): WholeMachineModel {
  return {
    body: { massKg: 1000, cg: { x: 0, y: 0, z: 0 }, inertia: boxInertia(1000, { x: 2, y: 1, z: 0.8 }) },
    mounts: [0.9, -0.9].flatMap((x) =>
      [0.4, -0.4].map((y) => ({ position: { x, y, z: -0.4 }, stiffness: { x: 1e5, y: 1e5, z: 2.5e5 }, damping })),
    ),
  };
}

const UNBALANCE: SpeedSource = {
  at: { x: 0.3, y: 0.1, z: 0.5 },
  kind: 'rotating',
  axis: 'x',
  unbalance: { rotorMassKg: 120, balanceGradeMmPerS: 6.3 },
};

describe('crossings (docs/engineering/whole-machine.md §6)', () => {
  it('CV-36 [CF]: n = 60·f_j/o exactly, inside the range and outside the skip bands', () => {
    const f = [2.585, 3.041, 4.857, 5.033, 6.706, 7.625, 0];
    const c = crossingSpeeds({ modeFrequenciesHz: f, order: 2, minRpm: 80, maxRpm: 200, skipBandsRpm: [{ min: 140, max: 160 }] });
    // 60·f/2 = 77.55, 91.23, 145.71, 150.99, 201.18, 228.75: 91.23 in; 145.7 and 151.0 skipped; the others outside
    expect(c).toHaveLength(1);
    expect(c[0].modeIndex).toBe(1);
    expect(Math.abs(c[0].speedRpm - (60 * 3.041) / 2)).toBeLessThanOrEqual(1e-12 * c[0].speedRpm);
    const all = crossingSpeeds({ modeFrequenciesHz: f, order: 1.5, minRpm: 1, maxRpm: 1000 });
    expect(all.map((x) => x.modeIndex)).toEqual([0, 1, 2, 3, 4, 5]);
    all.forEach((x) => expect(Math.abs(x.speedRpm - (60 * f[x.modeIndex]) / 1.5)).toBeLessThanOrEqual(1e-12 * x.speedRpm));
    // a crossing on a band edge or a range end is a running speed
    const edge = crossingSpeeds({ modeFrequenciesHz: [2.5], order: 1, minRpm: 150, maxRpm: 300, skipBandsRpm: [{ min: 100, max: 150 }] });
    expect(edge.map((x) => x.speedRpm)).toEqual([150]);
  });

  it('the crossings of the machine’s own modes are exact', () => {
    const sys = prepareWholeMachine(cv21Machine());
    const modes = wholeMachineModes(sys).modes;
    const r = speedSweep(sys, { source: UNBALANCE, minRpm: 120, maxRpm: 600 });
    expect(r.crossings).toHaveLength(6);
    r.crossings.forEach((c) => expect(Math.abs(c.speedRpm - 60 * modes[c.modeIndex].frequencyHz)).toBeLessThanOrEqual(1e-12 * c.speedRpm));
  });
});

describe('the sweep grid (docs/engineering/whole-machine.md §7)', () => {
  it('CV-37 [DES]: steps ≤ 0.5 % of speed, both ends, every skip-band edge, every crossing, nothing inside a band', () => {
    const bands = [
      { min: 300, max: 340 },
      { min: 900, max: 2000 },
      { min: 320, max: 360 },
    ];
    const extra = [250.123, 330, 500.5, 123];
    const g = Array.from(sweepGrid(200, 1000, bands, extra));
    expect(g[0]).toBe(200);
    expect(g[g.length - 1]).toBe(900); // the band [900, 2000] cuts the top: its lower edge is the last running speed
    for (const edge of [300, 360, 900]) expect(g).toContain(edge);
    expect(g).toContain(250.123);
    expect(g).toContain(500.5);
    expect(g).not.toContain(330);
    expect(g).not.toContain(123);
    for (const n of g) expect(bands.some((b) => n > b.min && n < b.max)).toBe(false);
    for (let i = 1; i < g.length; i++) {
      expect(g[i]).toBeGreaterThan(g[i - 1]);
      const bridgesBand = bands.some((b) => g[i - 1] <= b.min && g[i] >= b.max);
      if (!bridgesBand) expect((g[i] - g[i - 1]) / g[i - 1]).toBeLessThanOrEqual(0.005 * (1 + 1e-12));
    }
    expect(Array.from(sweepGrid(1450, 1450))).toEqual([1450]);
    expect(() => sweepGrid(400, 500, [{ min: 300, max: 600 }])).toThrow(VibrationInputError);
    expect(() => sweepGrid(500, 400)).toThrow(/maxRpm/);
  });
});

describe('the speed sweep (docs/engineering/whole-machine.md §7)', () => {
  for (const [name, damping] of [
    ['hysteretic η = 0.1', hystereticDamping(0.1)],
    ['viscous ζ = 0.03', viscousDamping(0.03)],
  ] as const) {
    it(`CV-37 [DES]: ${name}, modes inside 120–600 rpm: the worst T is within 0.5 % of a 0.01 % reference sweep`, () => {
      const sys = prepareWholeMachine(cv21Machine(damping));
      const r = speedSweep(sys, { source: UNBALANCE, minRpm: 120, maxRpm: 600, curve: true });
      let refMax = 0;
      let refSpeed = 0;
      for (let n = 120; n <= 600; n *= 1.0001) {
        const t = wholeMachineTransmissibility(sys, UNBALANCE, n / 60);
        if (t > refMax) [refMax, refSpeed] = [t, n];
      }
      expect(refMax).toBeGreaterThan(3); // a real resonance inside the range
      expect(Math.abs(r.worst.transmissibility / refMax - 1)).toBeLessThan(0.005);
      expect(r.worst.transmissibility).toBeGreaterThanOrEqual(refMax * (1 - 1e-6)); // the refinement finds the peak itself
      expect(Math.abs(r.worst.speedRpm / refSpeed - 1)).toBeLessThan(0.005);
      expect(r.worst.frequencyHz).toBeCloseTo(r.worst.speedRpm / 60, 12);
      expect(r.worst.amplitudeN).toBeCloseTo(sourceAmplitudeN(UNBALANCE, r.worst.speedRpm, 600), 9);
      // the curve is the grid
      expect(Array.from(r.curve!.speedRpm)).toEqual(
        Array.from(
          sweepGrid(
            120,
            600,
            [],
            r.crossings.map((c) => c.speedRpm),
          ),
        ),
      );
      expect(r.curve!.transmissibility[0]).toBeCloseTo(wholeMachineTransmissibility(sys, UNBALANCE, 2), 12);
    });
  }

  it('skips the bands: a peak inside a skip band is not the verdict, its edges are evaluated', () => {
    const sys = prepareWholeMachine(cv21Machine());
    const full = speedSweep(sys, { source: UNBALANCE, minRpm: 120, maxRpm: 600 });
    const band = { min: full.worst.speedRpm * 0.97, max: full.worst.speedRpm * 1.03 };
    const skipped = speedSweep(sys, { source: UNBALANCE, minRpm: 120, maxRpm: 600, skipBandsRpm: [band], curve: true });
    expect(skipped.worst.transmissibility).toBeLessThan(full.worst.transmissibility);
    for (const n of skipped.curve!.speedRpm) expect(n > band.min && n < band.max).toBe(false);
    expect(Array.from(skipped.curve!.speedRpm)).toContain(band.min);
    expect(Array.from(skipped.curve!.speedRpm)).toContain(band.max);
  });

  it('a fixed-frequency source: one solve, the same T at every speed', () => {
    const sys = prepareWholeMachine(cv21Machine());
    const src: SpeedSource = { at: { x: 0.5, y: 0, z: 0.3 }, kind: 'directional', axis: 'z', frequencyHz: 100, amplitudeN: 50 };
    const r = speedSweep(sys, { source: src, minRpm: 600, maxRpm: 1800 });
    expect(r.evaluations).toBe(1);
    expect(r.crossings).toEqual([]);
    expect(r.worst.frequencyHz).toBe(100);
    expect(r.worst.amplitudeN).toBe(50);
    expect(r.worst.transmissibility).toBeCloseTo(wholeMachineTransmissibility(sys, src, 100), 14);
  });

  it('a fixed speed: one point (with the refinement skipped)', () => {
    const sys = prepareWholeMachine(cv21Machine());
    const r = speedSweep(sys, { source: { ...UNBALANCE, order: 2 }, minRpm: 1450, maxRpm: 1450 });
    expect(r.worst.speedRpm).toBe(1450);
    expect(r.worst.frequencyHz).toBeCloseTo((2 * 1450) / 60, 12);
    expect(r.evaluations).toBe(1);
  });
});

describe('stiffness band (docs/engineering/whole-machine.md §10)', () => {
  it('symmetric machine above resonance: the stiff end governs and equals the one-mass T at r = f/(f_v·√1.15)', () => {
    const level = cv21Machine(hystereticDamping(0.1));
    const src: SpeedSource = { at: { x: 0, y: 0, z: 0.3 }, kind: 'directional', axis: 'z', order: 1, amplitudeN: 100 };
    const fv = Math.sqrt(1e6 / 1000) / (2 * Math.PI);
    const ends = [0.85, 1, 1.15].map((phi) =>
      speedSweep(prepareWholeMachine(level, { stiffnessFactor: phi }), { source: src, minRpm: 1450, maxRpm: 1450 }),
    );
    expect(ends[2].worst.transmissibility).toBeGreaterThan(ends[1].worst.transmissibility);
    expect(ends[1].worst.transmissibility).toBeGreaterThan(ends[0].worst.transmissibility);
    const r = 1450 / 60 / (fv * Math.sqrt(1.15));
    expect(Math.abs(ends[2].worst.transmissibility / transmissibilityHysteretic(r, 0.1) - 1)).toBeLessThan(1e-9);
  });
});

describe('source frequency and amplitude (docs/engineering/whole-machine.md §6, docs/engineering/forcing.md)', () => {
  it('CV-38 [CF]: unbalance m_r·(G/Ω_max)·ω²: 120 kg, G6.3, n_max 1800 rpm, at 1200 rpm → 63.33 N', () => {
    // e = 6.3e-3/(2π·30) = 3.342e-5 m; ω = 2π·20 = 125.66 rad/s; F = 120·3.342e-5·15791 = 63.34 N
    const f = sourceAmplitudeN(UNBALANCE, 1200, 1800);
    const e = 6.3e-3 / ((2 * Math.PI * 1800) / 60);
    expect(f).toBeCloseTo(120 * e * (2 * Math.PI * 20) ** 2, 9);
    expect(f).toBeCloseTo(63.33, 1);
    // at the top speed it is the familiar m_r·G·Ω_max
    expect(sourceAmplitudeN(UNBALANCE, 1800, 1800)).toBeCloseTo(120 * 6.3e-3 * ((2 * Math.PI * 1800) / 60), 9);
    expect(sourceAmplitudeN(UNBALANCE, 1800, 1800)).toBeCloseTo(142.5, 1);
    expect(sourceFrequencyHz({ order: 2 }, 1500)).toBe(50);
    expect(sourceFrequencyHz({ order: 2, frequencyHz: 100 }, 1500)).toBe(100);
    expect(() => sourceAmplitudeN({ at: { x: 0, y: 0, z: 0 }, kind: 'directional', axis: 'z' }, 1000, 1000)).toThrow(/amplitudeN/);
  });
});

describe('series support stiffness (docs/engineering/whole-machine.md §9)', () => {
  it('CV-39 [CF]: k_eff = k_m·k_s/(k_m + k_s): 1e6 on 9e6 → 9e5 N/m; a rigid support leaves k_m', () => {
    expect(seriesStiffness(1e6, 9e6)).toBeCloseTo(9e5, 6);
    expect(seriesStiffness(1e6, Infinity)).toBe(1e6);
    expect(seriesStiffness(0, 5e6)).toBe(0);
    expect(() => seriesStiffness(1e6, 0)).toThrow(VibrationInputError);
    expect(() => seriesStiffness(-1, 1e6)).toThrow(VibrationInputError);
  });
});

describe('passage through modes below the running range (docs/engineering/whole-machine.md §8)', () => {
  it('CV-40 [CF]: bounce of a symmetric machine, unbalance rotating about y at the CG → the peak motion of the CG at the bounce crossing, from the two uncoupled one-mass responses', () => {
    // mounts level with the CG: bounce (5.033 Hz) and surge (3.183 Hz) are uncoupled
    const model = cv21Machine(hystereticDamping(0.1));
    const level: WholeMachineModel = { ...model, mounts: model.mounts.map((m) => ({ ...m, position: { ...m.position, z: 0 } })) };
    const sys = prepareWholeMachine(level);
    const src: SpeedSource = {
      at: { x: 0, y: 0, z: 0 },
      kind: 'rotating',
      axis: 'y',
      unbalance: { rotorMassKg: 50, balanceGradeMmPerS: 2.5 },
    };
    const pts = resonancePassage(sys, { sources: [src, { ...src, unbalance: undefined, amplitudeN: 10 }], minRpm: 1000, maxRpm: 1500 });
    expect(pts.map((p) => p.sourceIndex)).toEqual([0, 0, 0, 0, 0, 0]); // only the unbalance; all six modes lie below 1000 rpm
    const modes = wholeMachineModes(sys).modes;
    const bounceIndex = modes.findIndex((m) => m.dominant === 'bounce');
    const p = pts.find((x) => x.modeIndex === bounceIndex)!;
    expect(p.modeFrequencyHz).toBeCloseTo(Math.sqrt(1e6 / 1000) / (2 * Math.PI), 9);
    expect(p.speedRpm).toBeCloseTo(60 * p.modeFrequencyHz, 9);
    const w = 2 * Math.PI * p.modeFrequencyHz;
    const F = 50 * (2.5e-3 / ((2 * Math.PI * 1500) / 60)) * w * w;
    // force (F_x, F_z) = F·(−i, 1) (rotating about +y); uncoupled: Z = F/(iη·Σkz) at ω = ω_z, X = −iF/(Σkx(1 + iη) − mω²)
    const Z = { re: 0, im: -F / (0.1 * 1e6) };
    const dx = { re: 4e5 - 1000 * w * w, im: 0.1 * 4e5 };
    const d2 = dx.re ** 2 + dx.im ** 2;
    const X = { re: (-F * dx.im) / d2, im: (-F * dx.re) / d2 };
    // the mount points move as the CG (no rotation): the largest |Re(u·e^{iφ})| over a cycle, by brute force
    let peak = 0;
    for (let i = 0; i < 100000; i++) {
      const phi = (2 * Math.PI * i) / 100000;
      peak = Math.max(peak, Math.hypot(X.re * Math.cos(phi) - X.im * Math.sin(phi), Z.re * Math.cos(phi) - Z.im * Math.sin(phi)));
    }
    expect(Math.abs(p.motionM / peak - 1)).toBeLessThan(1e-8);
    // X and Z are nearly in opposite phase here, so the path is nearly a line: the peak lies between max(|X|, |Z|) and √(|X|² + |Z|²)
    const [ax, az] = [Math.hypot(X.re, X.im), Math.hypot(Z.re, Z.im)];
    expect(p.motionM).toBeGreaterThan(Math.max(ax, az));
    expect(p.motionM).toBeLessThanOrEqual(Math.hypot(ax, az) * (1 + 1e-12));
    expect(p.motionM).toBeCloseTo(8.0666e-6, 9);
    const direct = wholeMachineResponse(sys, { at: src.at, kind: 'rotating', axis: 'y', amplitudeN: F }, p.modeFrequencyHz);
    expect(p.motionM).toBeCloseTo(Math.max(...direct.mountPeakMotionM), 14);
  });
});
