/**
 * The stiffness band of the whole-machine verdict (docs/engineering/selection.md §20): the default
 * tolerance by mount type, the band's factors, and the factor that governs a worst point found by
 * the one-sweep scaling T(φ, f) = T(1, f/√φ).
 */
import type { MountType } from '../../catalog/mount-rules.js';

/**
 * Stiffness tolerance of the catalog figures by mount type, ± % (common practice, no published
 * source: moulded elastomers are held to about ±15 %, pads cut from sheet and wire ropes vary more,
 * steel springs are wound to about ±10 %, air springs are set by their pressure).
 */
export const DEFAULT_STIFFNESS_TOLERANCE_PCT: Readonly<Record<MountType, number>> = {
  elastomer_pad: 20,
  elastomer_mount: 15,
  open_spring: 10,
  housed_spring: 10,
  restrained_spring: 10,
  air_spring: 10,
  wire_rope: 20,
};

/** Tolerance for a type the table does not know, ± % (the widest above). */
export const FALLBACK_TOLERANCE_PCT = 20;

/** A factor within rounding of 1 or a band end is that value (so that the answer says 1.15, not 1.1500000000000001). */
export function snapFactor(factor: number, lo: number, hi: number): number {
  for (const exact of [1, lo, hi]) if (Math.abs(factor - exact) <= 1e-9 * exact) return exact;
  return Math.min(hi, Math.max(lo, factor));
}

/**
 * The stiffness factor φ ∈ [lo, hi] nearest 1 that brings the nominal-equivalent speed n′ back to
 * a running speed n = n′·√φ (inside [min, max], not strictly inside a skip band).
 */
export function governingFactor(
  nominalRpm: number,
  min: number,
  max: number,
  bands: readonly { min: number; max: number }[],
  lo: number,
  hi: number,
): number {
  const candidates = [
    1,
    lo,
    hi,
    (min / nominalRpm) ** 2,
    (max / nominalRpm) ** 2,
    ...bands.flatMap((b) => [(b.min / nominalRpm) ** 2, (b.max / nominalRpm) ** 2]),
  ];
  const allowed = (phi: number) => {
    if (phi < lo * (1 - 1e-12) || phi > hi * (1 + 1e-12)) return false;
    const n = nominalRpm * Math.sqrt(phi);
    if (n < min * (1 - 1e-12) || n > max * (1 + 1e-12)) return false;
    return !bands.some((b) => n > b.min * (1 + 1e-12) && n < b.max * (1 - 1e-12));
  };
  let best = Number.NaN;
  for (const phi of candidates) if (allowed(phi) && !(Math.abs(phi - 1) >= Math.abs(best - 1))) best = phi;
  return Number.isNaN(best) ? snapFactor((min / nominalRpm) ** 2, lo, hi) : snapFactor(best, lo, hi);
}

/** Stiffness factors of a band of ± pct: the soft end, the nominal and the stiff end (the nominal alone without a band). */
export function bandFactors(pct: number): number[] {
  return pct > 0 ? [1 - pct / 100, 1, 1 + pct / 100] : [1];
}

/**
 * The running speed n = n′·√φ of a worst point found at the nominal-equivalent speed n′, exactly a
 * range end or skip-band edge when it is one but for rounding (1480/√1.1·√1.1 is not 1480 in
 * floating point), so that the answer and the points listed at those speeds name it once.
 */
export function runningSpeed(
  nominalRpm: number,
  factor: number,
  min: number,
  max: number,
  bands: readonly { min: number; max: number }[],
): number {
  const n = nominalRpm * Math.sqrt(factor);
  for (const exact of [min, max, ...bands.flatMap((b) => [b.min, b.max])]) if (Math.abs(n - exact) <= 1e-9 * exact) return exact;
  return n;
}
