import { memo, useMemo } from 'react';
import { VictoryArea, VictoryAxis, VictoryChart, VictoryLabel, VictoryLine, VictoryScatter } from 'victory';

import {
  AXIS_STYLE,
  CHART_COLORS,
  CURVE_STYLE,
  decades,
  formatTick,
  GOVERNING_MARKER_STYLE,
  TARGET_STYLE,
  UNITY_STYLE,
  Y_AXIS_STYLE,
} from '@/components/charts/chart-style';

import type { SourceSpeedChart, SpeedChartData } from './speed-chart-data';

const WIDTH = 440;
const HEIGHT = 280;
const PADDING = { top: 40, right: 16, bottom: 48, left: 60 };

const BAND_STYLE = { data: { fill: CHART_COLORS.curveSoft, fillOpacity: 0.4, stroke: CHART_COLORS.curveSoft, strokeWidth: 1 } } as const;
const SKIP_STYLE = { data: { fill: '#d9d6cc', fillOpacity: 0.7, stroke: 'none' } } as const;
const POINT_STYLE = { data: { fill: CHART_COLORS.curve, stroke: '#fff', strokeWidth: 1 } } as const;
const WORST_STYLE = {
  data: { fill: CHART_COLORS.markerGoverning, stroke: '#fff', strokeWidth: 1.5 },
  labels: { fontFamily: "'Noto Sans', system-ui, sans-serif", fontSize: 11, fontWeight: 600, fill: CHART_COLORS.markerGoverning },
} as const;
const CROSSING_LABEL_STYLE = {
  fontFamily: "'Noto Sans', system-ui, sans-serif",
  fontSize: 10.5,
  fill: CHART_COLORS.markerGoverning,
} as const;
const SKIP_LABEL_STYLE = { fontFamily: "'Noto Sans', system-ui, sans-serif", fontSize: 10.5, fill: CHART_COLORS.muted } as const;

const rpm = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** Linear speed ticks at a round step, about six of them. */
function speedTicks([min, max]: [number, number]): number[] {
  const span = max - min;
  if (!(span > 0)) return [min];
  const raw = span / 5;
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * magnitude).find((s) => s >= raw) ?? raw;
  const out: number[] = [];
  for (let v = Math.ceil(min / step) * step; v <= max + 1e-9; v += step) out.push(Number(v.toPrecision(12)));
  return out;
}

export interface SpeedChartProps {
  data: SpeedChartData;
  chart: SourceSpeedChart;
}

/**
 * Transmissibility of the whole machine against speed over the running range for one source
 * (victory): the stiffness band as a filled area between its ends, the nominal curve, the skip
 * bands shaded, the crossings as lines labelled with their mode and order, the worst point, and
 * the required T dashed.
 */
export const SpeedChart = memo(function SpeedChart({ data, chart }: SpeedChartProps) {
  const [x0, x1] = data.xDomain;
  const [y0, y1] = data.yDomain;
  const domain = useMemo(() => ({ x: [x0, x1] as [number, number], y: [y0, y1] as [number, number] }), [x0, x1, y0, y1]);
  const xTicks = useMemo(() => speedTicks([x0, x1]), [x0, x1]);
  const yTicks = useMemo(() => decades(y0, y1, 7), [y0, y1]);
  const plotWidth = WIDTH - PADDING.left - PADDING.right;
  const toPx = (speed: number) => PADDING.left + ((speed - x0) / (x1 - x0 || 1)) * plotWidth;

  return (
    <VictoryChart scale={{ x: 'linear', y: 'log' }} domain={domain} width={WIDTH} height={HEIGHT} padding={PADDING}>
      {data.skipBands.map((band) => (
        <VictoryArea
          key={`skip-${band.min}`}
          data={[
            { x: band.min, y: y1, y0 },
            { x: band.max, y: y1, y0 },
          ]}
          style={SKIP_STYLE}
        />
      ))}
      {data.skipBands.map((band) => (
        <VictoryLabel
          key={`skip-label-${band.min}`}
          text="skipped"
          x={(toPx(band.min) + toPx(band.max)) / 2}
          y={HEIGHT - PADDING.bottom - 8}
          textAnchor="middle"
          style={SKIP_LABEL_STYLE}
        />
      ))}
      <VictoryAxis
        label="Speed (rpm)"
        tickValues={xTicks}
        tickFormat={(v: number) => rpm.format(v)}
        style={AXIS_STYLE}
        axisLabelComponent={<VictoryLabel dy={4} />}
      />
      <VictoryAxis dependentAxis label="Transmissibility T" tickValues={yTicks} tickFormat={formatTick} style={Y_AXIS_STYLE} />
      {y0 < 1 && y1 > 1 ? (
        <VictoryLine
          data={[
            { x: x0, y: 1 },
            { x: x1, y: 1 },
          ]}
          style={UNITY_STYLE}
        />
      ) : null}
      {chart.band ? <VictoryArea data={chart.band} style={BAND_STYLE} /> : null}
      {data.requirement && data.requirement > y0 && data.requirement < y1 ? (
        <VictoryLine
          data={[
            { x: x0, y: data.requirement },
            { x: x1, y: data.requirement, label: `required T ${formatTick(data.requirement)}` },
          ]}
          style={TARGET_STYLE}
          labels={({ datum }: { datum: { label?: string } }) => datum.label ?? ''}
          labelComponent={<VictoryLabel textAnchor="end" dy={-6} dx={-4} />}
        />
      ) : null}
      {chart.crossings.map((crossing) => (
        <VictoryLine
          key={`crossing-${crossing.label}-${crossing.speedRpm}`}
          data={[
            { x: crossing.speedRpm, y: y0 },
            { x: crossing.speedRpm, y: y1 },
          ]}
          style={GOVERNING_MARKER_STYLE}
        />
      ))}
      {chart.crossings.map((crossing, index) => (
        <VictoryLabel
          key={`crossing-label-${crossing.label}-${crossing.speedRpm}`}
          text={`${crossing.label} · ${rpm.format(crossing.speedRpm)} rpm`}
          x={Math.min(Math.max(toPx(crossing.speedRpm), PADDING.left + 50), WIDTH - PADDING.right - 50)}
          y={PADDING.top - 8 - (index % 2) * 13}
          textAnchor="middle"
          style={CROSSING_LABEL_STYLE}
        />
      ))}
      {chart.line.length >= 2 ? <VictoryLine data={chart.line} style={CURVE_STYLE} /> : null}
      {chart.computed.length > 0 ? <VictoryScatter data={chart.computed} size={3} style={POINT_STYLE} /> : null}
      {chart.worst ? (
        <VictoryScatter
          data={[{ ...chart.worst, label: `worst T ${formatTick(chart.worst.y)}` }]}
          size={5}
          style={WORST_STYLE}
          labels={({ datum }: { datum: { label?: string } }) => datum.label ?? ''}
          labelComponent={<VictoryLabel dx={8} dy={-8} textAnchor="start" />}
        />
      ) : null}
    </VictoryChart>
  );
});
