import { logSpace, sdofFrf, type Damping } from '@tacet/vibration';
import { memo, useMemo } from 'react';
import { VictoryAxis, VictoryChart, VictoryLabel, VictoryLine } from 'victory';

import { useUnits } from '@/lib/units';

import {
  AXIS_STYLE,
  ceilDecade,
  CURVE_STYLE,
  decades,
  floorDecade,
  formatTick,
  GOVERNING_MARKER_STYLE,
  MARKER_STYLE,
  oneTwoFive,
  PHASE_STYLE,
  Y_AXIS_STYLE,
} from './chart-style';
import type { FrequencyMarker } from './transmissibility-chart';

export interface FrfChartProps {
  /** Mass of the mounted machine m [kg]. */
  massKg: number;
  /** Total dynamic stiffness of the mounts Σk_dyn [N/m]. */
  stiffnessNPerM: number;
  /** Damping of the mounts; omitted = undamped. */
  damping?: Damping;
  /** Natural frequency fn [Hz], to centre the frequency span. */
  naturalFrequencyHz: number;
  markers?: readonly FrequencyMarker[];
  samples?: number;
  width?: number;
}

const WIDTH = 680;
const PANEL_HEIGHT = 190;
const PADDING = { top: 14, right: 24, bottom: 30, left: 72 };
const LAST_PADDING = { ...PADDING, bottom: 52 };
const CURVE_SAMPLES = 1000;
const PHASE_TICKS = [-180, -135, -90, -45, 0];

interface Point {
  x: number;
  y: number;
}

/** "N/mm" → "mm/N", "lbf/in" → "in/lbf": the unit of compliance in the user's system. */
export function inverseUnit(stiffnessUnit: string): string {
  const [force, length] = stiffnessUnit.split('/');
  return length && force ? `${length}/${force}` : `1/(${stiffnessUnit})`;
}

function logRange(values: readonly Point[]): [number, number] {
  let low = Infinity;
  let high = 0;
  for (const p of values) {
    if (p.y > 0) {
      low = Math.min(low, p.y);
      high = Math.max(high, p.y);
    }
  }
  return [floorDecade(low), ceilDecade(high)];
}

/** Vertical lines at the disturbing frequencies (Victory needs its own elements as direct children). */
function markerLines(markers: readonly FrequencyMarker[], low: number, high: number) {
  return markers.map((m) => (
    <VictoryLine
      key={`${m.label}-${m.frequencyHz}`}
      data={[
        { x: m.frequencyHz, y: low },
        { x: m.frequencyHz, y: high },
      ]}
      style={m.governing ? GOVERNING_MARKER_STYLE : MARKER_STYLE}
    />
  ));
}

/**
 * Frequency response of the machine on its mounts (one degree of freedom, vertical), computed
 * in the browser with `sdofFrf`: receptance magnitude and phase, and dynamic stiffness
 * magnitude, in three panels sharing the frequency axis.
 */
export const FrfChart = memo(function FrfChart({
  massKg,
  stiffnessNPerM,
  damping,
  naturalFrequencyHz,
  markers = [],
  samples = CURVE_SAMPLES,
  width = WIDTH,
}: FrfChartProps) {
  const units = useUnits();
  const stiffnessUnit = units.label('stiffness');
  const complianceUnit = inverseUnit(stiffnessUnit);

  const [fMin, fMax] = useMemo(() => {
    const frequencies = markers.map((m) => m.frequencyHz);
    const low = Math.min(naturalFrequencyHz / 3, ...frequencies.map((f) => f / 2));
    const high = Math.max(naturalFrequencyHz * 10, ...frequencies.map((f) => f * 1.5));
    return [floorDecade(low), ceilDecade(high)];
  }, [naturalFrequencyHz, markers]);

  const curves = useMemo(() => {
    const frequencies = logSpace(fMin, fMax, samples);
    const system = { massKg, stiffnessNPerM, damping };
    const receptance = sdofFrf(system, 'receptance', frequencies);
    const dynamic = sdofFrf(system, 'dynamicStiffness', frequencies);
    const n = frequencies.length;
    const magnitude = new Array<Point>(n);
    const phase = new Array<Point>(n);
    const stiffness = new Array<Point>(n);
    for (let i = 0; i < n; i++) {
      const f = frequencies[i];
      // Display units: stiffness in N/mm or lbf/in, compliance as its inverse (mm/N, in/lbf).
      const kDisplay = units.toDisplay('stiffness', dynamic.magnitude[i]);
      stiffness[i] = { x: f, y: kDisplay };
      magnitude[i] = { x: f, y: 1 / units.toDisplay('stiffness', 1 / receptance.magnitude[i]) };
      phase[i] = { x: f, y: receptance.phaseDeg[i] };
    }
    return { magnitude, phase, stiffness };
  }, [fMin, fMax, samples, massKg, stiffnessNPerM, damping, units]);

  const magnitudeRange = useMemo(() => logRange(curves.magnitude), [curves]);
  const stiffnessRange = useMemo(() => logRange(curves.stiffness), [curves]);
  const xTicks = useMemo(() => oneTwoFive(fMin, fMax), [fMin, fMax]);
  const visibleMarkers = useMemo(() => markers.filter((m) => m.frequencyHz > fMin && m.frequencyHz < fMax), [markers, fMin, fMax]);

  const xAxis = (label?: string) => (
    <VictoryAxis
      label={label}
      tickValues={xTicks}
      tickFormat={label ? formatTick : () => ''}
      style={AXIS_STYLE}
      axisLabelComponent={<VictoryLabel dy={4} />}
    />
  );

  return (
    <div className="tc-frf-panels">
      <VictoryChart
        scale={{ x: 'log', y: 'log' }}
        domain={{ x: [fMin, fMax], y: magnitudeRange }}
        width={width}
        height={PANEL_HEIGHT}
        padding={PADDING}
      >
        {xAxis()}
        <VictoryAxis
          dependentAxis
          label={`|receptance| (${complianceUnit})`}
          tickValues={decades(...magnitudeRange)}
          tickFormat={formatTick}
          style={Y_AXIS_STYLE}
        />
        {markerLines(visibleMarkers, magnitudeRange[0], magnitudeRange[1])}
        <VictoryLine data={curves.magnitude} style={CURVE_STYLE} />
      </VictoryChart>
      <VictoryChart
        scale={{ x: 'log', y: 'linear' }}
        domain={{ x: [fMin, fMax], y: [-180, 0] }}
        width={width}
        height={PANEL_HEIGHT - 30}
        padding={PADDING}
      >
        {xAxis()}
        <VictoryAxis dependentAxis label="phase (°)" tickValues={PHASE_TICKS} style={Y_AXIS_STYLE} />
        {markerLines(visibleMarkers, -180, 0)}
        <VictoryLine data={curves.phase} style={PHASE_STYLE} />
      </VictoryChart>
      <VictoryChart
        scale={{ x: 'log', y: 'log' }}
        domain={{ x: [fMin, fMax], y: stiffnessRange }}
        width={width}
        height={PANEL_HEIGHT + 16}
        padding={LAST_PADDING}
      >
        {xAxis('Frequency (Hz)')}
        <VictoryAxis
          dependentAxis
          label={`|dynamic stiffness| (${stiffnessUnit})`}
          tickValues={decades(...stiffnessRange)}
          tickFormat={formatTick}
          style={Y_AXIS_STYLE}
        />
        {markerLines(visibleMarkers, stiffnessRange[0], stiffnessRange[1])}
        <VictoryLine data={curves.stiffness} style={CURVE_STYLE} />
      </VictoryChart>
    </div>
  );
});
