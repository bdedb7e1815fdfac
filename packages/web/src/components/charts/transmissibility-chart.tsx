import { logSpace, requiredFrequencyRatio, transmissibilityAt, transmissibilityPeak, type Damping } from '@tacet/vibration';
import { memo, useMemo } from 'react';
import { VictoryArea, VictoryAxis, VictoryChart, VictoryLabel, VictoryLine } from 'victory';

import {
  AXIS_STYLE,
  ceilDecade,
  CURVE_STYLE,
  decades,
  floorDecade,
  formatTick,
  GOVERNING_MARKER_STYLE,
  ISOLATION_STYLE,
  MARKER_STYLE,
  NATURAL_FREQUENCY_STYLE,
  oneTwoFive,
  REGION_LABEL_STYLE,
  TARGET_STYLE,
  Y_AXIS_STYLE,
} from './chart-style';

/** A disturbing frequency drawn as a vertical line. */
export interface FrequencyMarker {
  frequencyHz: number;
  label: string;
  governing?: boolean;
}

export interface TransmissibilityChartProps {
  /** Natural frequency of the mounted machine fn [Hz]. */
  naturalFrequencyHz: number;
  /** Damping of the mounts; omitted = undamped. */
  damping?: Damping;
  markers: readonly FrequencyMarker[];
  /** Transmissibility the criteria allow (dashed line), if any. */
  targetTransmissibility?: number | null;
  /** Samples along the curve (default 1,000). */
  samples?: number;
  width?: number;
  height?: number;
}

const WIDTH = 680;
const HEIGHT = 340;
const PADDING = { top: 24, right: 24, bottom: 50, left: 64 };
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
 * Transmissibility T against frequency (log–log) for one mounted machine, computed in the
 * browser with `@tacet/vibration`: the isolation region (T < 1, f > √2·fn) shaded, the
 * disturbing frequencies as vertical lines and the target T as a dashed line.
 */
export const TransmissibilityChart = memo(function TransmissibilityChart({
  naturalFrequencyHz,
  damping,
  markers,
  targetTransmissibility,
  samples = CURVE_SAMPLES,
  width = WIDTH,
  height = HEIGHT,
}: TransmissibilityChartProps) {
  const [fMin, fMax] = useMemo(() => frequencySpan(naturalFrequencyHz, markers), [naturalFrequencyHz, markers]);

  const curve = useMemo<Point[]>(() => {
    const frequencies = logSpace(fMin, fMax, samples);
    const out = new Array<Point>(frequencies.length);
    for (let i = 0; i < frequencies.length; i++) {
      const t = transmissibilityAt(frequencies[i], naturalFrequencyHz, damping);
      out[i] = { x: frequencies[i], y: Math.min(Math.max(t, T_FLOOR), T_CEILING) };
    }
    return out;
  }, [fMin, fMax, samples, naturalFrequencyHz, damping]);

  const [tMin, tMax] = useMemo(() => {
    let low = Infinity;
    for (const p of curve) low = Math.min(low, p.y);
    if (targetTransmissibility) low = Math.min(low, targetTransmissibility);
    const peak = resonancePeak(damping);
    return [Math.max(floorDecade(low), T_FLOOR), Math.min(ceilDecade(Math.max(peak * 1.5, 2)), T_CEILING)];
  }, [curve, targetTransmissibility, damping]);

  // T = 1 at r = √2 for any damping: the ratio for 0 % isolation.
  const isolationStartHz = naturalFrequencyHz * requiredFrequencyRatio(0);
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
  const markerLines = useMemo(
    () =>
      markers
        .filter((m) => m.frequencyHz > fMin && m.frequencyHz < fMax)
        .map((m) => ({
          key: `${m.label}-${m.frequencyHz}`,
          governing: m.governing ?? false,
          data: [
            { x: m.frequencyHz, y: tMin },
            { x: m.frequencyHz, y: tMax, label: m.label },
          ],
        })),
    [markers, fMin, fMax, tMin, tMax],
  );
  const naturalLine = useMemo(
    () => [
      { x: naturalFrequencyHz, y: tMin },
      { x: naturalFrequencyHz, y: tMax, label: 'fn' },
    ],
    [naturalFrequencyHz, tMin, tMax],
  );
  const xTicks = useMemo(() => oneTwoFive(fMin, fMax), [fMin, fMax]);
  const yTicks = useMemo(() => decades(tMin, tMax, 8), [tMin, tMax]);
  const domain = useMemo(() => ({ x: [fMin, fMax] as [number, number], y: [tMin, tMax] as [number, number] }), [fMin, fMax, tMin, tMax]);

  return (
    <VictoryChart scale={{ x: 'log', y: 'log' }} domain={domain} width={width} height={height} padding={PADDING}>
      {isolation ? <VictoryArea data={isolation} style={ISOLATION_STYLE} /> : null}
      {isolation ? (
        <VictoryLabel
          text="isolation (T < 1)"
          x={width - PADDING.right - 8}
          y={PADDING.top + 14}
          textAnchor="end"
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
      <VictoryLine
        data={naturalLine}
        style={NATURAL_FREQUENCY_STYLE}
        labels={({ datum }: { datum: { label?: string } }) => datum.label ?? ''}
        labelComponent={<VictoryLabel textAnchor="start" dx={5} dy={12} />}
      />
      {target ? (
        <VictoryLine
          data={target}
          style={TARGET_STYLE}
          labels={({ datum }: { datum: { label?: string } }) => datum.label ?? ''}
          labelComponent={<VictoryLabel textAnchor="end" dy={-6} dx={-4} />}
        />
      ) : null}
      {markerLines.map((line) => (
        <VictoryLine
          key={line.key}
          data={line.data}
          style={line.governing ? GOVERNING_MARKER_STYLE : MARKER_STYLE}
          labels={({ datum }: { datum: { label?: string } }) => datum.label ?? ''}
          labelComponent={<VictoryLabel angle={-90} textAnchor="end" dx={-4} dy={-10} />}
        />
      ))}
      <VictoryLine data={curve} style={CURVE_STYLE} />
    </VictoryChart>
  );
});
