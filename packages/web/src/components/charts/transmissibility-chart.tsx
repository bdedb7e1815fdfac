import { logSpace, requiredFrequencyRatio, transmissibilityAt, transmissibilityPeak, type Damping } from '@tacet/vibration';
import { memo, useMemo } from 'react';
import { VictoryArea, VictoryAxis, VictoryChart, VictoryLabel, VictoryLine } from 'victory';

import {
  AXIS_STYLE,
  ceilDecade,
  CHART_COLORS,
  CURVE_STYLE,
  decades,
  floorDecade,
  formatTick,
  GOVERNING_MARKER_STYLE,
  ISOLATION_STYLE,
  MARKER_LABEL_CHAR_WIDTH,
  MARKER_LABEL_FONT,
  MARKER_STYLE,
  NATURAL_FREQUENCY_STYLE,
  oneTwoFive,
  REGION_LABEL_STYLE,
  TARGET_STYLE,
  UNITY_STYLE,
  Y_AXIS_STYLE,
} from './chart-style';
import { layoutMarkerLabels, logAxisX, type MarkerLabelLayout } from './marker-labels';

/** A disturbing frequency drawn as a vertical line. */
export interface FrequencyMarker {
  frequencyHz: number;
  label: string;
  governing?: boolean;
}

/** One mounted machine's curve when several are drawn together. */
export interface TransmissibilityCurve {
  key: string;
  /** Natural frequency of the mounted machine fn [Hz]. */
  naturalFrequencyHz: number;
  /** Damping of the mounts; omitted = undamped. */
  damping?: Damping;
  color: string;
}

export interface TransmissibilityChartProps {
  /** Natural frequency of the mounted machine fn [Hz] (one curve). */
  naturalFrequencyHz?: number;
  /** Damping of the mounts; omitted = undamped (one curve). */
  damping?: Damping;
  /** Several curves drawn together (instead of naturalFrequencyHz and damping), e.g. to compare candidates. */
  curves?: readonly TransmissibilityCurve[];
  markers: readonly FrequencyMarker[];
  /** Transmissibility the criteria allow (dashed line), if any. */
  targetTransmissibility?: number | null;
  /** Samples along each curve (default 1,000). */
  samples?: number;
  width?: number;
  height?: number;
}

const WIDTH = 680;
const HEIGHT = 340;
const PADDING = { top: 24, right: 24, bottom: 50, left: 64 };
/** Height of one row of marker labels above the plot [px]. */
const LABEL_ROW = 15;
const MAX_LABEL_ROWS = 3;
const CURVE_SAMPLES = 1000;
/** Plotting range for T: an undamped curve is infinite at resonance. */
const T_CEILING = 1000;
const T_FLOOR = 1e-4;

interface Point {
  x: number;
  y: number;
}

/** Height of the resonance peak; an undamped one is unbounded (drawn at the ceiling). */
function resonancePeak(damping: Damping | undefined): number {
  if (!damping) return T_CEILING;
  try {
    return transmissibilityPeak(damping).transmissibility;
  } catch {
    return T_CEILING;
  }
}

/** Frequency span of the plot: from well below fn to well above the highest disturbing frequency. */
export function frequencySpan(naturalFrequencyHz: number, markers: readonly FrequencyMarker[]): [number, number] {
  const frequencies = markers.map((m) => m.frequencyHz).filter((f) => f > 0);
  const low = Math.min(naturalFrequencyHz / 3, ...frequencies.map((f) => f / 2));
  const high = Math.max(naturalFrequencyHz * 10, ...frequencies.map((f) => f * 1.5));
  return [floorDecade(low), ceilDecade(high)];
}

/**
 * Where the disturbing-frequency labels go: in rows above the plot, none overlapping
 * (marker-labels.ts); the governing frequency is placed first.
 */
export function markerLabelLayout(
  markers: readonly FrequencyMarker[],
  span: readonly [number, number],
  width = WIDTH,
  padding: { left: number; right: number } = PADDING,
): MarkerLabelLayout {
  const left = padding.left;
  const right = width - padding.right;
  return layoutMarkerLabels(
    markers
      .filter((m) => m.frequencyHz > span[0] && m.frequencyHz < span[1])
      .map((m) => ({ key: markerKey(m), x: logAxisX(m.frequencyHz, span, left, right), text: m.label, priority: m.governing })),
    { left, right, charWidth: MARKER_LABEL_CHAR_WIDTH + 0.3, maxRows: MAX_LABEL_ROWS },
  );
}

const markerKey = (m: FrequencyMarker) => `${m.label}-${m.frequencyHz}`;

interface MarkerLabelsProps {
  layout: MarkerLabelLayout;
  governing: ReadonlySet<string>;
  /** y of the plot's top edge [px]. */
  plotTop: number;
}

/**
 * The marker labels above the plot with a thin leader down to each line. Drawn as plain SVG
 * inside the chart (Victory passes its own props to every child; they are ignored here).
 */
function MarkerLabels({ layout, governing, plotTop }: MarkerLabelsProps) {
  return (
    <g className="tc-marker-labels">
      {layout.placed.map((label) => {
        const isGoverning = governing.has(label.key);
        const color = isGoverning ? CHART_COLORS.markerGoverning : CHART_COLORS.marker;
        const baseline = plotTop - 6 - label.row * LABEL_ROW;
        return (
          <g key={label.key}>
            <line
              x1={label.lineX}
              x2={label.lineX}
              y1={plotTop}
              y2={baseline + 2}
              stroke={color}
              strokeWidth={0.75}
              strokeDasharray="1,2"
            />
            <rect x={label.x - label.width / 2} y={baseline - 10} width={label.width} height={13} fill="#fff" />
            <text
              x={label.x}
              y={baseline}
              textAnchor="middle"
              fontFamily={MARKER_LABEL_FONT.fontFamily}
              fontSize={MARKER_LABEL_FONT.fontSize}
              fontWeight={isGoverning ? 600 : 400}
              fill={color}
            >
              {label.text}
            </text>
          </g>
        );
      })}
    </g>
  );
}

function curvePoints(fMin: number, fMax: number, samples: number, naturalFrequencyHz: number, damping: Damping | undefined): Point[] {
  const frequencies = logSpace(fMin, fMax, samples);
  const out = new Array<Point>(frequencies.length);
  for (let i = 0; i < frequencies.length; i++) {
    const t = transmissibilityAt(frequencies[i], naturalFrequencyHz, damping);
    out[i] = { x: frequencies[i], y: Math.min(Math.max(t, T_FLOOR), T_CEILING) };
  }
  return out;
}

/**
 * Transmissibility T against frequency (log–log) for one mounted machine — or several drawn
 * together — computed in the browser with `@tacet/vibration`: for one curve the isolation region
 * (T < 1, f > √2·fn) shaded and fn marked; for several, each in its colour with its fn and the
 * line T = 1. The disturbing frequencies are vertical lines labelled above the plot without
 * overlapping (labels with no room are listed under the chart), the target T a dashed line.
 */
export const TransmissibilityChart = memo(function TransmissibilityChart({
  naturalFrequencyHz,
  damping,
  curves,
  markers,
  targetTransmissibility,
  samples = CURVE_SAMPLES,
  width = WIDTH,
  height = HEIGHT,
}: TransmissibilityChartProps) {
  const series = useMemo<readonly TransmissibilityCurve[]>(
    () => curves ?? [{ key: 'curve', naturalFrequencyHz: naturalFrequencyHz ?? NaN, damping, color: CHART_COLORS.curve }],
    [curves, naturalFrequencyHz, damping],
  );
  const single = series.length === 1;

  const [fMin, fMax] = useMemo(() => {
    const spans = series.filter((c) => c.naturalFrequencyHz > 0).map((c) => frequencySpan(c.naturalFrequencyHz, markers));
    if (spans.length === 0) return frequencySpan(1, markers);
    return [Math.min(...spans.map((s) => s[0])), Math.max(...spans.map((s) => s[1]))];
  }, [series, markers]);

  const lines = useMemo(
    () =>
      series
        .filter((c) => c.naturalFrequencyHz > 0)
        .map((c) => ({ ...c, data: curvePoints(fMin, fMax, samples, c.naturalFrequencyHz, c.damping) })),
    [series, fMin, fMax, samples],
  );

  const [tMin, tMax] = useMemo(() => {
    let low = Infinity;
    for (const line of lines) for (const p of line.data) low = Math.min(low, p.y);
    if (targetTransmissibility) low = Math.min(low, targetTransmissibility);
    if (!Number.isFinite(low)) low = 0.01;
    const peak = Math.max(2, ...lines.map((line) => resonancePeak(line.damping)));
    return [Math.max(floorDecade(low), T_FLOOR), Math.min(ceilDecade(peak * 1.5), T_CEILING)];
  }, [lines, targetTransmissibility]);

  const labels = useMemo(() => markerLabelLayout(markers, [fMin, fMax], width), [markers, fMin, fMax, width]);
  const padding = useMemo(() => ({ ...PADDING, top: Math.max(PADDING.top, 10 + labels.rows * LABEL_ROW) }), [labels.rows]);
  const governing = useMemo(() => new Set(markers.filter((m) => m.governing).map(markerKey)), [markers]);
  const unplaced = useMemo(() => markers.filter((m) => labels.unplaced.includes(markerKey(m))), [markers, labels]);

  // T = 1 at r = √2 for any damping: the ratio for 0 % isolation.
  const isolationStartHz = single && lines[0] ? lines[0].naturalFrequencyHz * requiredFrequencyRatio(0) : Infinity;
  const isolation = useMemo(
    () =>
      isolationStartHz < fMax
        ? [
            { x: Math.max(isolationStartHz, fMin), y: tMax, y0: tMin },
            { x: fMax, y: tMax, y0: tMin },
          ]
        : null,
    [isolationStartHz, fMin, fMax, tMin, tMax],
  );
  const target = useMemo(
    () =>
      targetTransmissibility && targetTransmissibility > tMin && targetTransmissibility < tMax
        ? [
            { x: fMin, y: targetTransmissibility },
            { x: fMax, y: targetTransmissibility, label: `target T ${formatTick(targetTransmissibility)}` },
          ]
        : null,
    [targetTransmissibility, fMin, fMax, tMin, tMax],
  );
  const unity = useMemo(
    () =>
      !single && tMin < 1 && tMax > 1
        ? [
            { x: fMin, y: 1, label: 'T = 1' },
            { x: fMax, y: 1 },
          ]
        : null,
    [single, fMin, fMax, tMin, tMax],
  );
  const markerLines = useMemo(
    () =>
      markers
        .filter((m) => m.frequencyHz > fMin && m.frequencyHz < fMax)
        .map((m) => ({
          key: markerKey(m),
          governing: m.governing ?? false,
          data: [
            { x: m.frequencyHz, y: tMin },
            { x: m.frequencyHz, y: tMax },
          ],
        })),
    [markers, fMin, fMax, tMin, tMax],
  );
  const naturalLines = useMemo(
    () =>
      lines.map((line) => ({
        key: line.key,
        style: single
          ? NATURAL_FREQUENCY_STYLE
          : { ...NATURAL_FREQUENCY_STYLE, data: { ...NATURAL_FREQUENCY_STYLE.data, stroke: line.color, opacity: 0.8 } },
        data: [
          { x: line.naturalFrequencyHz, y: tMin },
          { x: line.naturalFrequencyHz, y: tMax, label: single ? 'fn' : '' },
        ],
      })),
    [lines, single, tMin, tMax],
  );
  const curveStyles = useMemo(
    () => lines.map((line) => (single ? CURVE_STYLE : { data: { ...CURVE_STYLE.data, stroke: line.color } })),
    [lines, single],
  );
  const xTicks = useMemo(() => oneTwoFive(fMin, fMax), [fMin, fMax]);
  const yTicks = useMemo(() => decades(tMin, tMax, 8), [tMin, tMax]);
  const domain = useMemo(() => ({ x: [fMin, fMax] as [number, number], y: [tMin, tMax] as [number, number] }), [fMin, fMax, tMin, tMax]);
  const isolationLabelX = Math.max(isolationStartHz, fMin);

  return (
    <>
      <VictoryChart
        scale={{ x: 'log', y: 'log' }}
        domain={domain}
        width={width}
        height={height + padding.top - PADDING.top}
        padding={padding}
      >
        {isolation ? <VictoryArea data={isolation} style={ISOLATION_STYLE} /> : null}
        {isolation ? (
          <VictoryLabel
            text="isolation (T < 1)"
            x={Math.min(logAxisX(isolationLabelX, [fMin, fMax], padding.left, width - padding.right) + 8, width - padding.right - 90)}
            y={height + padding.top - PADDING.top - padding.bottom - 10}
            textAnchor="start"
            style={REGION_LABEL_STYLE}
          />
        ) : null}
        <VictoryAxis
          label="Frequency (Hz)"
          tickValues={xTicks}
          tickFormat={formatTick}
          style={AXIS_STYLE}
          axisLabelComponent={<VictoryLabel dy={4} />}
        />
        <VictoryAxis dependentAxis label="Transmissibility T" tickValues={yTicks} tickFormat={formatTick} style={Y_AXIS_STYLE} />
        {unity ? (
          <VictoryLine
            data={unity}
            style={UNITY_STYLE}
            labels={({ datum }: { datum: { label?: string } }) => datum.label ?? ''}
            labelComponent={<VictoryLabel textAnchor="start" dx={4} dy={-6} />}
          />
        ) : null}
        {naturalLines.map((line) => (
          <VictoryLine
            key={`fn-${line.key}`}
            data={line.data}
            style={line.style}
            labels={({ datum }: { datum: { label?: string } }) => datum.label ?? ''}
            labelComponent={<VictoryLabel textAnchor="start" dx={5} dy={12} />}
          />
        ))}
        {target ? (
          <VictoryLine
            data={target}
            style={TARGET_STYLE}
            labels={({ datum }: { datum: { label?: string } }) => datum.label ?? ''}
            labelComponent={<VictoryLabel textAnchor="end" dy={-6} dx={-4} />}
          />
        ) : null}
        {markerLines.map((line) => (
          <VictoryLine key={line.key} data={line.data} style={line.governing ? GOVERNING_MARKER_STYLE : MARKER_STYLE} />
        ))}
        {lines.map((line, index) => (
          <VictoryLine key={`curve-${line.key}`} data={line.data} style={curveStyles[index]} />
        ))}
        <MarkerLabels layout={labels} governing={governing} plotTop={padding.top} />
      </VictoryChart>
      {unplaced.length > 0 ? (
        <p className="tc-chart-overflow" data-testid="unlabelled-markers">
          Also marked, not labelled for want of room: {unplaced.map((m) => `${m.label} (${formatTick(m.frequencyHz)} Hz)`).join(', ')}.
        </p>
      ) : null}
    </>
  );
});
