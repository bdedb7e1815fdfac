import {
  identifyTapTest,
  impactFrf,
  nearestMode,
  verificationVerdict,
  type ImpactFrf,
  type MeasuredFrf,
  type PredictedMode,
  type TapTestIdentification,
  type VerificationVerdict,
} from '@tacet/vibration';
import type { Design } from '../designs/design.entity.js';
import type { FrfQuantity, TapTestFileData } from './tap-test-file.js';

/** The design's damping as the catalog gave it (the chosen mounts' data frozen at the choice). */
export interface PredictedDamping {
  model: 'viscous' | 'hysteretic';
  /** ζ (viscous) or η (hysteretic) [–] */
  value: number;
}

/** What the released design predicts, read from its snapshot. */
export interface DesignPrediction {
  modes: Array<PredictedMode & { coupled: boolean }>;
  /** `rigid-body modes` (the six coupled modes) or `bounce estimate` (uncoupled vertical). */
  source: 'rigid-body modes' | 'bounce estimate';
  massKg: number;
  damping: PredictedDamping | null;
}

/** The measured FRF kept for the overlay: magnitude and phase in the quantity measured. */
export interface MeasuredCurve {
  quantity: FrfQuantity;
  frequencyHz: number[];
  magnitude: number[];
  phaseDeg: number[];
  coherence: number[] | null;
}

/** How a raw record was turned into an FRF (null for an FRF file). */
export interface ImpactProcessing {
  sampleRateHz: number;
  hitsFound: number;
  hitsAveraged: number;
  hitTimesS: number[];
  blockDurationS: number;
  resolutionHz: number;
  preTriggerS: number;
  forceWindowS: number;
  exponentialTimeConstantS: number | null;
  usableBandHz: { min: number; max: number };
}

/** Everything a verification records besides who, when and which file. */
export interface TapTestOutcome {
  identified: {
    naturalFrequencyHz: number;
    dampingRatio: number | null;
    stiffnessNPerM: number;
    peakFrequencyHz: number;
    measuredDampingRatio: number | null;
    windowDampingCorrection: number;
    halfPowerHz: { lower: number; upper: number } | null;
    meanCoherence: number | null;
    quality: 'good' | 'fair';
  };
  predicted: {
    naturalFrequencyHz: number;
    mode: string;
    coupled: boolean;
    source: DesignPrediction['source'];
    massKg: number;
    stiffnessNPerM: number;
    damping: PredictedDamping | null;
  };
  deviationPct: number;
  stiffnessDeviationPct: number;
  verdict: VerificationVerdict;
  notes: string[];
  warnings: string[];
  processing: ImpactProcessing | null;
  measured: MeasuredCurve;
}

/** The measurement shows no resonance that can be compared (422, nothing stored). */
export class NoResonanceError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'NoResonanceError';
  }
}

/** Points kept for the overlay at most. */
export const MAX_CURVE_POINTS = 1500;

const isObject = (value: unknown): value is Record<string, unknown> => typeof value === 'object' && value !== null;
const positive = (value: unknown): value is number => typeof value === 'number' && Number.isFinite(value) && value > 0;

/**
 * The predicted natural frequencies of a design, read defensively from its frozen snapshot
 * (the selection may add figures over time): the six coupled rigid-body modes when the chosen
 * candidate has them, otherwise the uncoupled bounce estimate. Null when the design predicts none.
 */
export function predictionOf(design: Pick<Design, 'snapshot' | 'chosen'>): DesignPrediction | null {
  const snapshot: unknown = design.snapshot;
  const candidate: unknown = isObject(snapshot) && isObject(snapshot.candidate) ? snapshot.candidate : design.chosen;
  const mass = isObject(snapshot) && isObject(snapshot.massProperties) ? snapshot.massProperties.massKg : undefined;
  if (!isObject(candidate) || !positive(mass)) return null;
  const damping = dampingOf(isObject(snapshot) ? snapshot.mounts : undefined);
  const rawModes = Array.isArray(candidate.modes) ? candidate.modes : [];
  const modes = rawModes
    .filter((m): m is Record<string, unknown> => isObject(m) && positive(m.frequencyHz))
    .map((m) => ({
      frequencyHz: m.frequencyHz as number,
      mode: typeof m.dominant === 'string' && m.dominant.length <= 40 ? m.dominant : 'rigid-body mode',
      coupled: m.coupled === true,
    }));
  if (modes.length > 0) return { modes, source: 'rigid-body modes', massKg: mass, damping };
  if (positive(candidate.verticalNaturalFrequencyHz)) {
    return {
      modes: [{ frequencyHz: candidate.verticalNaturalFrequencyHz, mode: 'bounce', coupled: false }],
      source: 'bounce estimate',
      massKg: mass,
      damping,
    };
  }
  return null;
}

function dampingOf(mounts: unknown): PredictedDamping | null {
  if (!Array.isArray(mounts) || !isObject(mounts[0])) return null;
  const mount = mounts[0];
  if (mount.dampingModel === 'hysteretic' && positive(mount.lossFactor)) return { model: 'hysteretic', value: mount.lossFactor };
  if (positive(mount.dampingRatio)) return { model: 'viscous', value: mount.dampingRatio };
  return null;
}

/** Indices of at most `max` points, evenly spread on a log-frequency scale, always with the lines around the peak. */
function thin(frequencyHz: number[], max: number, keepNear: number): number[] {
  if (frequencyHz.length <= max) return frequencyHz.map((_, i) => i);
  const first = Math.log(frequencyHz[0] > 0 ? frequencyHz[0] : frequencyHz[1]);
  const last = Math.log(frequencyHz[frequencyHz.length - 1]);
  const keep = new Set<number>();
  let next = -Infinity;
  const step = (last - first) / max;
  frequencyHz.forEach((f, i) => {
    const x = f > 0 ? Math.log(f) : first;
    if (x >= next) {
      keep.add(i);
      next = x + step;
    }
    if (f >= keepNear * 0.8 && f <= keepNear * 1.25) keep.add(i);
  });
  keep.add(frequencyHz.length - 1);
  return [...keep].sort((a, b) => a - b);
}

function curveOf(quantity: FrfQuantity, frf: MeasuredFrf, coherence: number[] | null, fn: number): MeasuredCurve {
  const f = Array.from(frf.frequencyHz);
  const magnitude = frf.re ? Array.from(frf.re, (r, i) => Math.hypot(r, frf.im![i])) : Array.from(frf.magnitude!);
  const phase = frf.re ? Array.from(frf.re, (r, i) => (Math.atan2(frf.im![i], r) * 180) / Math.PI + 0) : Array.from(frf.phaseDeg!);
  const keep = thin(f, MAX_CURVE_POINTS, fn);
  return {
    quantity,
    frequencyHz: keep.map((i) => f[i]),
    magnitude: keep.map((i) => magnitude[i]),
    phaseDeg: keep.map((i) => phase[i]),
    coherence: coherence ? keep.map((i) => coherence[i]) : null,
  };
}

/** Words for a verdict: what the comparison says and, when it deviates, what usually causes it. */
export function verdictNotes(verdict: VerificationVerdict, mode: string, tolerancePct: number): string[] {
  if (verdict === 'agrees') return [`The measured natural frequency agrees with the predicted ${mode} mode within ±${tolerancePct} %.`];
  if (verdict === 'stiffer') {
    return [
      `The installation is stiffer than predicted (the natural frequency is more than ${tolerancePct} % above the ${mode} mode).`,
      'Look for a short-circuit across the mounts: a rigid pipe, conduit or duct connection, a snubber or restraint touching (grounded), debris or grout under the frame, or a levelling bolt carrying load.',
      'Or stiffer mounts than designed: another part number or spring fitted, or mounts loaded below their design load.',
    ];
  }
  return [
    `The installation is softer than predicted (the natural frequency is more than ${tolerancePct} % below the ${mode} mode).`,
    'Look for a flexible support: a floor, steel frame or housekeeping pad that gives under the mounts.',
    'Or a heavier machine than designed (added equipment, fluid, a larger motor), or softer mounts than designed.',
  ];
}

export interface AnalysisRequest {
  data: TapTestFileData;
  quantity: FrfQuantity;
  prediction: DesignPrediction;
  tolerancePct: number;
}

/**
 * Turns a parsed tap-test file into the recorded outcome (docs/engineering/tap-test.md): H1 from
 * a raw record, identification, the predicted mode nearest the measured one, deviation, verdict
 * and notes. Throws NoResonanceError when no natural frequency can be identified, and
 * VibrationInputError for data the signal processing refuses.
 */
export function analyseTapTest({ data, quantity, prediction, tolerancePct }: AnalysisRequest): TapTestOutcome {
  let frf: MeasuredFrf;
  let impact: ImpactFrf | null = null;
  if (data.kind === 'impact') {
    impact = impactFrf({ sampleRateHz: data.sampleRateHz, forceN: data.forceN, accelerationMS2: data.accelerationMS2 });
    frf = { kind: 'accelerance', frequencyHz: impact.frequencyHz, re: impact.re, im: impact.im };
  } else {
    frf = { kind: quantity, frequencyHz: data.frequencyHz, re: data.re, im: data.im, magnitude: data.magnitude, phaseDeg: data.phaseDeg };
  }
  const id: TapTestIdentification = identifyTapTest(frf, {
    massKg: prediction.massKg,
    exponentialTimeConstantS: impact?.exponentialTimeConstantS ?? null,
    recordDurationS: impact?.blockDurationS,
    coherence: impact?.coherence ?? null,
  });
  if (id.quality === 'poor' || id.naturalFrequencyHz === undefined) {
    const why = id.reasons.map((r) => r.message).join(' ');
    throw new NoResonanceError(`No natural frequency could be identified from this measurement. ${why}`.trim());
  }
  const fn = id.naturalFrequencyHz;
  const nearest = nearestMode(fn, prediction.modes);
  const mode = prediction.modes.find((m) => m === nearest) ?? { ...nearest, coupled: false };
  const comparison = verificationVerdict(fn, mode.frequencyHz, tolerancePct);
  const notes = verdictNotes(comparison.verdict, mode.mode, tolerancePct);
  if (prediction.source === 'bounce estimate') {
    notes.push(
      'The design predicts only the uncoupled bounce (vertical) estimate: compare a vertical measurement near the centre of gravity.',
    );
  } else if (mode.mode !== 'bounce') {
    notes.push(
      `The nearest predicted mode is ${mode.mode}${mode.coupled ? ' (coupled)' : ''}: check that the hit and the accelerometer were in that direction.`,
    );
  }
  if (id.dampingRatio !== undefined && prediction.damping) {
    const predictedZeta = prediction.damping.model === 'viscous' ? prediction.damping.value : prediction.damping.value / 2;
    notes.push(
      `Damping ratio measured ${id.dampingRatio.toFixed(3)} against ${predictedZeta.toFixed(3)} from the catalog data` +
        `${prediction.damping.model === 'hysteretic' ? ' (half the loss factor)' : ''}.`,
    );
  }
  notes.push(
    'The identified stiffness is an apparent stiffness at the point and in the direction of the test, with the floor and every connection in it; it is not a property of the mounts alone.',
  );
  const warnings = [...(impact?.warnings ?? []), ...id.warnings].map((w) => w.message);
  for (const reason of id.reasons) warnings.push(reason.message);
  const measured = curveOf(data.kind === 'impact' ? 'accelerance' : quantity, frf, impact?.coherence ?? null, fn);
  return {
    identified: {
      naturalFrequencyHz: fn,
      dampingRatio: id.dampingRatio ?? null,
      stiffnessNPerM: id.stiffnessNPerM!,
      peakFrequencyHz: id.peakFrequencyHz!,
      measuredDampingRatio: id.measuredDampingRatio ?? null,
      windowDampingCorrection: id.windowDampingCorrection ?? 0,
      halfPowerHz: id.halfPowerHz ?? null,
      meanCoherence: id.meanCoherence ?? null,
      quality: id.quality === 'good' ? 'good' : 'fair',
    },
    predicted: {
      naturalFrequencyHz: mode.frequencyHz,
      mode: mode.mode,
      coupled: mode.coupled,
      source: prediction.source,
      massKg: prediction.massKg,
      stiffnessNPerM: prediction.massKg * (2 * Math.PI * mode.frequencyHz) ** 2,
      damping: prediction.damping,
    },
    deviationPct: comparison.deviationPct,
    stiffnessDeviationPct: comparison.stiffnessDeviationPct,
    verdict: comparison.verdict,
    notes,
    warnings,
    processing: impact
      ? {
          sampleRateHz: impact.sampleRateHz,
          hitsFound: impact.hits.length,
          hitsAveraged: impact.hitsAveraged,
          hitTimesS: impact.hits.map((h) => h.timeS),
          blockDurationS: impact.blockDurationS,
          resolutionHz: impact.resolutionHz,
          preTriggerS: impact.preTriggerS,
          forceWindowS: impact.forceWindowS,
          exponentialTimeConstantS: impact.exponentialTimeConstantS,
          usableBandHz: impact.usableBandHz,
        }
      : null,
    measured,
  };
}
