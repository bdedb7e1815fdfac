import type { Crossing, Model2Candidate, SkipBand, SpeedCurve } from '@/types/model2-api';

/** Plotting range for T (log axis). */
const T_FLOOR = 1e-3;
const T_CEILING = 1e3;

export interface ChartPoint {
  x: number;
  y: number;
}

export interface BandPoint {
  x: number;
  /** The unfavourable end of the stiffness band at this speed. */
  y: number;
  /** The favourable end. */
  y0: number;
}

export interface CrossingMark {
  speedRpm: number;
  /** "mode 2 · 1×" */
  label: string;
}

/** What one source's chart draws, in rpm and T. */
export interface SourceSpeedChart {
  source: string;
  /** T against speed at the nominal stiffness: the full curve, or the points the server computed. */
  line: ChartPoint[];
  /** The stiffness band (both ends), or null when the server sent no band. */
  band: BandPoint[] | null;
  /** The line is the server's sweep (true) or only its computed points joined (false). */
  fromCurve: boolean;
  /** The points the server reported (range ends, worst point, crossings), as dots. */
  computed: ChartPoint[];
  /** The worst point of the whole machine, when it belongs to this source. */
  worst: ChartPoint | null;
  crossings: CrossingMark[];
}

export interface SpeedChartData {
  /** Running range [rpm]. */
  xDomain: [number, number];
  /** T range of the plot (log axis). */
  yDomain: [number, number];
  /** Skip bands clipped to the range [rpm]. */
  skipBands: SkipBand[];
  /** T at the required isolation, or null. */
  requirement: number | null;
  sources: SourceSpeedChart[];
}

export interface SpeedChartInput {
  candidate: Model2Candidate;
  rangeRpm: { min: number; max: number };
  skipBandsRpm?: readonly SkipBand[];
  targetTransmissibility: number | null;
  /** The server's sweep per source, when it sent one. */
  curves?: readonly SpeedCurve[] | null;
}

/** "mode 2" for a mode number, the name as given otherwise. */
export function modeText(mode: number | string): string {
  return typeof mode === 'number' ? `mode ${mode}` : mode;
}

export function crossingLabel(crossing: Pick<Crossing, 'mode' | 'order'>): string {
  return `${modeText(crossing.mode)} · ${Number(crossing.order.toPrecision(6))}×`;
}

const pow10 = (e: number): number => Number(`1e${e}`);
const clampT = (t: number) => Math.min(Math.max(t, T_FLOOR), T_CEILING);

/** The sources in the order they first appear in the result. */
function sourceNames(input: SpeedChartInput): string[] {
  const names: string[] = [];
  const add = (name: string) => {
    if (!names.includes(name)) names.push(name);
  };
  for (const point of input.candidate.wholeMachine?.perFrequency ?? []) add(point.source);
  for (const curve of input.curves ?? []) add(curve.source);
  for (const crossing of input.candidate.crossings ?? []) add(crossing.source);
  return names;
}

/**
 * Shapes a candidate's whole-machine result into what the speed charts draw, one chart per
 * source: T against speed over the running range (the server's sweep when it sent one, else its
 * computed points joined in speed order), the stiffness band as a filled area between its two
 * ends, the crossings, the skip bands, the worst point and the requirement. Points outside the
 * running range or without a speed are left out; T is clamped to the plot's range.
 */
export function speedChartData(input: SpeedChartInput): SpeedChartData {
  const { min, max } = input.rangeRpm;
  const inRange = (rpm: number | null | undefined): rpm is number =>
    typeof rpm === 'number' && Number.isFinite(rpm) && rpm >= min && rpm <= max;
  const worst = input.candidate.wholeMachine?.worst ?? null;

  const sources = sourceNames(input).map<SourceSpeedChart>((source) => {
    const computed = (input.candidate.wholeMachine?.perFrequency ?? [])
      .filter((p) => p.source === source && inRange(p.speedRpm))
      .map((p) => ({ x: p.speedRpm!, y: clampT(p.transmissibility) }))
      .sort((a, b) => a.x - b.x);
    const curve = input.curves?.find((c) => c.source === source);
    const curvePoints = (curve?.points ?? []).filter((p) => inRange(p.speedRpm)).sort((a, b) => a.speedRpm - b.speedRpm);
    const fromCurve = curvePoints.length >= 2;
    const line = fromCurve ? curvePoints.map((p) => ({ x: p.speedRpm, y: clampT(p.transmissibility) })) : dedupe(computed);
    const withBand = fromCurve && curvePoints.every((p) => p.low !== undefined && p.high !== undefined);
    const band = withBand
      ? curvePoints.map((p) => {
          const a = clampT(p.low!);
          const b = clampT(p.high!);
          return { x: p.speedRpm, y: Math.max(a, b), y0: Math.min(a, b) };
        })
      : null;
    const crossings = (input.candidate.crossings ?? [])
      .filter((c) => c.source === source && inRange(c.speedRpm))
      .sort((a, b) => a.speedRpm - b.speedRpm)
      .map((c) => ({ speedRpm: c.speedRpm, label: crossingLabel(c) }));
    const worstHere =
      worst && worst.source === source && inRange(worst.speedRpm) ? { x: worst.speedRpm!, y: clampT(worst.transmissibility) } : null;
    return { source, line, band, fromCurve, computed, worst: worstHere, crossings };
  });

  let low = Infinity;
  let high = 0;
  for (const s of sources) {
    for (const p of [...s.line, ...s.computed, ...(s.worst ? [s.worst] : [])]) {
      low = Math.min(low, p.y);
      high = Math.max(high, p.y);
    }
    for (const p of s.band ?? []) {
      low = Math.min(low, p.y0);
      high = Math.max(high, p.y);
    }
  }
  if (input.targetTransmissibility) {
    low = Math.min(low, input.targetTransmissibility);
    high = Math.max(high, input.targetTransmissibility);
  }
  if (!Number.isFinite(low) || high <= 0) {
    low = 0.01;
    high = 1;
  }
  // At least up to T = 1, so that amplification and isolation read at a glance.
  high = Math.max(high * 1.2, 1);
  const yDomain: [number, number] = [
    Math.max(pow10(Math.floor(Math.log10(low))), T_FLOOR),
    Math.min(pow10(Math.ceil(Math.log10(high))), T_CEILING),
  ];

  const skipBands = (input.skipBandsRpm ?? [])
    .filter((b) => b.max > min && b.min < max)
    .map((b) => ({ min: Math.max(b.min, min), max: Math.min(b.max, max) }));

  return { xDomain: [min, max], yDomain, skipBands, requirement: input.targetTransmissibility, sources };
}

/** One point per speed (the first kept). */
function dedupe(points: ChartPoint[]): ChartPoint[] {
  const out: ChartPoint[] = [];
  for (const p of points) if (!out.some((q) => Math.abs(q.x - p.x) <= 1e-9 * Math.max(1, p.x))) out.push(p);
  return out;
}

/** The whole-machine figures at the worst point: the peak force per mount there, largest first kept in point order. */
export function worstPointForces(candidate: Model2Candidate): { label: string; forceN: number }[] | null {
  const wm = candidate.wholeMachine;
  if (!wm) return null;
  const { worst } = wm;
  const match =
    wm.perFrequency.find(
      (p) => p.source === worst.source && Math.abs(p.frequencyHz - worst.frequencyHz) <= 1e-9 * Math.max(1, worst.frequencyHz),
    ) ?? null;
  return match ? match.perPoint : null;
}
