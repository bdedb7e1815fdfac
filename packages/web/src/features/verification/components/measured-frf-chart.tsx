import { logSpace, sdofFrf, type Damping } from '@tacet/vibration';
import { memo, useMemo } from 'react';
import { VictoryAxis, VictoryChart, VictoryLabel, VictoryLine, VictoryScatter } from 'victory';

import {
  AXIS_STYLE,
  CHART_COLORS,
  ceilDecade,
  decades,
  floorDecade,
  formatTick,
  NATURAL_FREQUENCY_STYLE,
  oneTwoFive,
  Y_AXIS_STYLE,
} from '@/components/charts/chart-style';
import { useUnits } from '@/lib/units';

import type { FrfQuantity } from '../types';

export interface MeasuredFrfChartProps {
  quantity: FrfQuantity;
  /** The measured FRF in SI units of `quantity`. */
  frequencyHz: readonly number[];
  magnitude: readonly number[];
  phaseDeg: readonly number[];
  /** The predicted one-mass model: m [kg], k [N/m] of the nearest mode, catalog damping. */
  massKg: number;
  stiffnessNPerM: number;
  damping: Damping | undefined;
  predictedHz: number;
  measuredHz: number;
  width?: number;
}

const WIDTH = 680;
const HEIGHT = 210;
const PADDING = { top: 14, right: 24, bottom: 30, left: 78 };
const LAST_PADDING = { ...PADDING, bottom: 52 };
const PHASE_TICKS = [-180, -90, 0, 90, 180];
const MEASURED_STYLE = { data: { fill: CHART_COLORS.marker, opacity: 0.85 } } as const;
const PREDICTED_STYLE = { data: { stroke: CHART_COLORS.curve, strokeWidth: 2, strokeDasharray: '7,4' } } as const;
const MEASURED_FN_STYLE = { data: { stroke: CHART_COLORS.marker, strokeWidth: 1, strokeDasharray: '2,3' } } as const;

const QUANTITY_WORDS: Record<FrfQuantity, string> = { accelerance: 'accelerance', mobility: 'mobility', receptance: 'receptance' };

interface Point {
  x: number;
  y: number;
}

/**
 * The measured FRF (points) over the predicted one (dashed: the design's mass on the stiffness of
 * the nearest predicted mode, with the catalog damping, from `sdofFrf`), magnitude and phase,
 * in the quantity measured and the user's units (m → mm or in, N → N or lbf).
 */
export const MeasuredFrfChart = memo(function MeasuredFrfChart(props: MeasuredFrfChartProps) {
  const { quantity, frequencyHz, magnitude, phaseDeg, massKg, stiffnessNPerM, damping, predictedHz, measuredHz, width = WIDTH } = props;
  const units = useUnits();
  // length per force converts as the inverse of stiffness (N/mm ↔ mm/N, lbf/in ↔ in/lbf)
  const [force, length] = units.label('stiffness').split('/');
  const unit =
    quantity === 'receptance' ? `${length}/${force}` : quantity === 'mobility' ? `(${length}/s)/${force}` : `(${length}/s²)/${force}`;
  const toDisplay = useMemo(() => (value: number) => 1 / units.toDisplay('stiffness', 1 / value), [units]);

  const [fMin, fMax] = useMemo(() => {
    const low = Math.max(frequencyHz[0] || measuredHz / 4, Math.min(measuredHz, predictedHz) / 4);
    const high = Math.min(frequencyHz[frequencyHz.length - 1] || measuredHz * 8, Math.max(measuredHz, predictedHz) * 8);
    return [low, high > low ? high : low * 10];
  }, [frequencyHz, measuredHz, predictedHz]);

  const data = useMemo(() => {
    const measuredMagnitude: Point[] = [];
    const measuredPhase: Point[] = [];
    frequencyHz.forEach((f, i) => {
      if (f < fMin || f > fMax || !(magnitude[i] > 0)) return;
      measuredMagnitude.push({ x: f, y: toDisplay(magnitude[i]) });
      measuredPhase.push({ x: f, y: phaseDeg[i] });
    });
    const grid = logSpace(fMin, fMax, 400);
    const model = sdofFrf({ massKg, stiffnessNPerM, damping }, quantity, grid);
    const predictedMagnitude: Point[] = [];
    const predictedPhase: Point[] = [];
    grid.forEach((f, i) => {
      if (model.magnitude[i] > 0) predictedMagnitude.push({ x: f, y: toDisplay(model.magnitude[i]) });
      predictedPhase.push({ x: f, y: model.phaseDeg[i] });
    });
    let low = Infinity;
    let high = 0;
    for (const p of [...measuredMagnitude, ...predictedMagnitude]) {
      low = Math.min(low, p.y);
      high = Math.max(high, p.y);
    }
    const range: [number, number] = low < high ? [floorDecade(low), ceilDecade(high)] : [1e-6, 1];
    return { measuredMagnitude, measuredPhase, predictedMagnitude, predictedPhase, range };
  }, [frequencyHz, magnitude, phaseDeg, fMin, fMax, massKg, stiffnessNPerM, damping, quantity, toDisplay]);

  const xTicks = useMemo(() => oneTwoFive(fMin, fMax), [fMin, fMax]);
  // offsetY keeps the frequency axis at the bottom of the phase panel, whose range crosses zero
  const xAxis = (label?: string) => (
    <VictoryAxis
      offsetY={label ? LAST_PADDING.bottom : PADDING.bottom}
      label={label}
      tickValues={xTicks}
      tickFormat={label ? formatTick : () => ''}
      style={AXIS_STYLE}
      axisLabelComponent={<VictoryLabel dy={4} />}
    />
  );
  const frequencyLines = (low: number, high: number) => [
    <VictoryLine
      key="predicted"
      data={[
        { x: predictedHz, y: low },
        { x: predictedHz, y: high },
      ]}
      style={NATURAL_FREQUENCY_STYLE}
    />,
    <VictoryLine
      key="measured"
      data={[
        { x: measuredHz, y: low },
        { x: measuredHz, y: high },
      ]}
      style={MEASURED_FN_STYLE}
    />,
  ];

  return (
    <div className="tc-frf-panels">
      <VictoryChart
        scale={{ x: 'log', y: 'log' }}
        domain={{ x: [fMin, fMax], y: data.range }}
        width={width}
        height={HEIGHT}
        padding={PADDING}
      >
        {xAxis()}
        <VictoryAxis
          dependentAxis
          label={`|${QUANTITY_WORDS[quantity]}| (${unit})`}
          tickValues={decades(...data.range)}
          tickFormat={formatTick}
          style={Y_AXIS_STYLE}
        />
        {frequencyLines(data.range[0], data.range[1])}
        <VictoryLine data={data.predictedMagnitude} style={PREDICTED_STYLE} />
        <VictoryScatter data={data.measuredMagnitude} size={1.8} style={MEASURED_STYLE} />
      </VictoryChart>
      <VictoryChart
        scale={{ x: 'log', y: 'linear' }}
        domain={{ x: [fMin, fMax], y: [-180, 180] }}
        width={width}
        height={HEIGHT - 20}
        padding={LAST_PADDING}
      >
        {xAxis('Frequency (Hz)')}
        <VictoryAxis dependentAxis label="phase (°)" tickValues={PHASE_TICKS} style={Y_AXIS_STYLE} />
        {frequencyLines(-180, 180)}
        <VictoryLine data={data.predictedPhase} style={PREDICTED_STYLE} />
        <VictoryScatter data={data.measuredPhase} size={1.8} style={MEASURED_STYLE} />
      </VictoryChart>
    </div>
  );
});
