import { requireNonNegative, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/** One half-sine hammer pulse F(t) = F₀·sin(π·(t − t₀)/T) for t₀ ≤ t ≤ t₀ + T. */
export interface HalfSinePulse {
  /** t₀ [s] */
  timeS: number;
  /** F₀ [N] */
  peakForceN: number;
  /** T [s], > 0 */
  durationS: number;
}

/** A synthetic tap test: a viscous one-mass system struck by half-sine pulses. */
export interface ImpactSimulation {
  /** m [kg] */
  massKg: number;
  /** k [N/m] */
  stiffnessNPerM: number;
  /** ζ [–] (viscous) */
  dampingRatio: number;
  /** fs [Hz] */
  sampleRateHz: number;
  /** Record length [s] */
  durationS: number;
  pulses: HalfSinePulse[];
  /** Gaussian noise added to each sample (standard deviations [N], [m/s²]) with a seeded generator. */
  noise?: { forceN?: number; accelerationMS2?: number; seed?: number };
  /** RK4 steps per sample (default 32). */
  stepsPerSample?: number;
  /** Values at or beyond these are held (clipping), [N] and [m/s²]. */
  clipAt?: { forceN?: number; accelerationMS2?: number };
}

/** A sampled record: time, force and acceleration per sample. */
export interface SimulatedImpactRecord {
  sampleRateHz: number;
  timeS: number[];
  forceN: number[];
  accelerationMS2: number[];
}

/** Mulberry32 (a small, well-known seeded generator) with Box–Muller for unit normal values. */
export function seededNormal(seed: number): () => number {
  let a = seed >>> 0;
  const uniform = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return () => {
    const u = 1 - uniform();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniform());
  };
}

/**
 * Samples the response of m·ẍ + c·ẋ + k·x = F(t) (c = 2ζ√(km), at rest at t = 0) to half-sine
 * hammer pulses, integrated with the classical fourth-order Runge–Kutta method at
 * `stepsPerSample` steps per sample; the acceleration is ẍ = (F − c·ẋ − k·x)/m at each sample.
 * For synthetic test records and demo files; real records come from a measurement.
 * @param simulation system [kg, N/m, –], sampling [Hz, s], pulses, noise
 * @returns time [s], force [N] and acceleration [m/s²] per sample
 */
export function simulateImpactRecord(simulation: ImpactSimulation): SimulatedImpactRecord {
  const m = requirePositive('massKg', simulation.massKg);
  const k = requirePositive('stiffnessNPerM', simulation.stiffnessNPerM);
  const c = 2 * requireNonNegative('dampingRatio', simulation.dampingRatio) * Math.sqrt(k * m);
  const fs = requirePositive('sampleRateHz', simulation.sampleRateHz);
  const samples = Math.floor(requirePositive('durationS', simulation.durationS) * fs);
  if (samples < 2 || samples > 10_000_000) throw new VibrationInputError('durationS', 'must give 2 to 10,000,000 samples');
  const steps = simulation.stepsPerSample ?? 32;
  if (!Number.isInteger(steps) || steps < 1) throw new VibrationInputError('stepsPerSample', 'must be a whole number ≥ 1');
  simulation.pulses.forEach((p, i) => {
    requireNonNegative(`pulses[${i}].timeS`, p.timeS);
    requirePositive(`pulses[${i}].durationS`, p.durationS);
  });
  const force = (t: number): number => {
    let f = 0;
    for (const p of simulation.pulses) {
      const s = t - p.timeS;
      if (s >= 0 && s <= p.durationS) f += p.peakForceN * Math.sin((Math.PI * s) / p.durationS);
    }
    return f;
  };
  const h = 1 / fs / steps;
  const accel = (t: number, x: number, v: number) => (force(t) - c * v - k * x) / m;
  const out: SimulatedImpactRecord = { sampleRateHz: fs, timeS: [], forceN: [], accelerationMS2: [] };
  const normal = seededNormal(simulation.noise?.seed ?? 1);
  const noiseF = simulation.noise?.forceN ?? 0;
  const noiseA = simulation.noise?.accelerationMS2 ?? 0;
  const clipF = simulation.clipAt?.forceN ?? Infinity;
  const clipA = simulation.clipAt?.accelerationMS2 ?? Infinity;
  const clip = (v: number, limit: number) => Math.max(-limit, Math.min(limit, v));
  let x = 0;
  let v = 0;
  for (let i = 0; i < samples; i++) {
    const t = i / fs;
    out.timeS.push(t);
    out.forceN.push(clip(force(t) + noiseF * normal(), clipF));
    out.accelerationMS2.push(clip(accel(t, x, v) + noiseA * normal(), clipA));
    for (let s = 0; s < steps; s++) {
      const t0 = t + s * h;
      const k1x = v;
      const k1v = accel(t0, x, v);
      const k2x = v + (h / 2) * k1v;
      const k2v = accel(t0 + h / 2, x + (h / 2) * k1x, v + (h / 2) * k1v);
      const k3x = v + (h / 2) * k2v;
      const k3v = accel(t0 + h / 2, x + (h / 2) * k2x, v + (h / 2) * k2v);
      const k4x = v + h * k3v;
      const k4v = accel(t0 + h, x + h * k3x, v + h * k3v);
      x += (h / 6) * (k1x + 2 * k2x + 2 * k3x + k4x);
      v += (h / 6) * (k1v + 2 * k2v + 2 * k3v + k4v);
    }
  }
  return out;
}
