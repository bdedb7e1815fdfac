/**
 * Tacet's chart look, shared by every chart. Module-level constants so that Victory receives
 * the same objects on every render (stable props keep redraws cheap).
 */
export const CHART_COLORS = {
  curve: '#2f5d62',
  curveSoft: '#6f9894',
  grid: '#e6e3da',
  axis: '#8a8f88',
  text: '#3b4244',
  muted: '#6b7274',
  isolation: '#dfeae7',
  marker: '#b0643a',
  markerGoverning: '#8c3d1f',
  target: '#7a6a2f',
  naturalFrequency: '#5b6f9a',
  unity: '#9aa09a',
} as const;

/**
 * Colours of the curves of several candidates drawn together (comparison), in order. Distinct in
 * hue and lightness so that they also part in grey and for the common colour-vision deficiencies.
 */
export const SERIES_COLORS = ['#2f5d62', '#b0643a', '#5b6f9a', '#8a7a2a'] as const;

const FONT = "'Noto Sans', system-ui, sans-serif";

export const AXIS_STYLE = {
  axis: { stroke: CHART_COLORS.axis, strokeWidth: 1 },
  grid: { stroke: CHART_COLORS.grid, strokeWidth: 1 },
  ticks: { stroke: CHART_COLORS.axis, size: 4 },
  tickLabels: { fontFamily: FONT, fontSize: 11, fill: CHART_COLORS.muted, padding: 4 },
  axisLabel: { fontFamily: FONT, fontSize: 12, fill: CHART_COLORS.text, padding: 32 },
} as const;

export const Y_AXIS_STYLE = {
  ...AXIS_STYLE,
  axisLabel: { ...AXIS_STYLE.axisLabel, padding: 44 },
} as const;

export const CURVE_STYLE = { data: { stroke: CHART_COLORS.curve, strokeWidth: 2 } } as const;
export const PHASE_STYLE = { data: { stroke: CHART_COLORS.curveSoft, strokeWidth: 2 } } as const;
export const ISOLATION_STYLE = { data: { fill: CHART_COLORS.isolation, stroke: 'none', opacity: 0.8 } } as const;
export const TARGET_STYLE = {
  data: { stroke: CHART_COLORS.target, strokeWidth: 1.5, strokeDasharray: '6,4' },
  labels: { fontFamily: FONT, fontSize: 11, fill: CHART_COLORS.target },
} as const;
export const MARKER_STYLE = {
  data: { stroke: CHART_COLORS.marker, strokeWidth: 1.25, strokeDasharray: '3,3' },
  labels: { fontFamily: FONT, fontSize: 10.5, fill: CHART_COLORS.marker },
} as const;
export const GOVERNING_MARKER_STYLE = {
  data: { stroke: CHART_COLORS.markerGoverning, strokeWidth: 2 },
  labels: { fontFamily: FONT, fontSize: 10.5, fontWeight: 600, fill: CHART_COLORS.markerGoverning },
} as const;
export const NATURAL_FREQUENCY_STYLE = {
  data: { stroke: CHART_COLORS.naturalFrequency, strokeWidth: 1, strokeDasharray: '2,3' },
  labels: { fontFamily: FONT, fontSize: 10.5, fill: CHART_COLORS.naturalFrequency },
} as const;
export const REGION_LABEL_STYLE = { fontFamily: FONT, fontSize: 11, fill: CHART_COLORS.curve } as const;
export const UNITY_STYLE = {
  data: { stroke: CHART_COLORS.unity, strokeWidth: 1 },
  labels: { fontFamily: FONT, fontSize: 10.5, fill: CHART_COLORS.muted },
} as const;
/** Marker labels above the plot (laid out by marker-labels.ts). */
export const MARKER_LABEL_FONT = { fontFamily: FONT, fontSize: 10.5 } as const;
/** Average advance of one character of MARKER_LABEL_FONT [px], for the label layout. */
export const MARKER_LABEL_CHAR_WIDTH = 5.9;

/** 10^e exactly as written (10 ** -4 is 0.00009999999999999999 in binary floating point). */
const pow10 = (e: number): number => Number(`1e${e}`);

/** Powers of ten covering [min, max]; every second (third…) one when there would be more than `maxTicks`. */
export function decades(min: number, max: number, maxTicks = 6): number[] {
  const first = Math.ceil(Math.log10(min) - 1e-9);
  const last = Math.floor(Math.log10(max) + 1e-9);
  const step = Math.max(1, Math.ceil((last - first + 1) / maxTicks));
  const out: number[] = [];
  for (let e = last; e >= first; e -= step) out.unshift(pow10(e));
  return out;
}

/** 1, 2, 5 × powers of ten covering [min, max] (frequency ticks). */
export function oneTwoFive(min: number, max: number): number[] {
  const out: number[] = [];
  for (let e = Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) {
    for (const m of [1, 2, 5]) {
      const v = m * pow10(e);
      if (v >= min * 0.999 && v <= max * 1.001) out.push(v);
    }
  }
  return out;
}

/** The decade below / above a value. */
export const floorDecade = (v: number): number => pow10(Math.floor(Math.log10(v)));
export const ceilDecade = (v: number): number => pow10(Math.ceil(Math.log10(v)));

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** -4 → "⁻⁴" */
function superscript(n: number): string {
  const digits = String(Math.abs(n))
    .split('')
    .map((d) => SUPERSCRIPT_DIGITS[Number(d)])
    .join('');
  return n < 0 ? `⁻${digits}` : digits;
}

const tick = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 3 });

/** Tick text: 10⁻⁴, 0.001, 0.1, 1, 10, 1k, 1M. */
export function formatTick(value: number): string {
  const a = Math.abs(value);
  if (a >= 1e6) return `${tick.format(value / 1e6)}M`;
  if (a >= 1e3) return `${tick.format(value / 1e3)}k`;
  if (a > 0 && a < 1e-3) return `10${superscript(Math.round(Math.log10(a)))}`;
  return tick.format(value);
}
