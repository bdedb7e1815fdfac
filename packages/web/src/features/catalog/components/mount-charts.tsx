import { VictoryAxis, VictoryChart, VictoryContainer, VictoryLabel, VictoryLine, VictoryScatter } from 'victory';

import { formatNumber, useUnits } from '@/lib/units';

import type { Mount } from '../types';
import { deflectionAtLoad, naturalFrequencyAtLoad } from '../utils/mount-figures';
import { mmToM } from '../utils/mount-display';

const ACCENT = '#2f5d62';
const LIMIT = '#b0563a';
const AXIS_STYLE = {
  axis: { stroke: '#9aa3a5' },
  grid: { stroke: '#e6e4dc' },
  tickLabels: { fontSize: 10, fill: '#4b5355', padding: 4, fontFamily: 'Noto Sans, system-ui, sans-serif' },
  axisLabel: { fontSize: 11, fill: '#4b5355', padding: 30, fontFamily: 'Noto Sans, system-ui, sans-serif' },
};
/** The load axis's numbers are wider ("12,000"): its title sits further out. */
const Y_AXIS_STYLE = { ...AXIS_STYLE, axisLabel: { ...AXIS_STYLE.axisLabel, padding: 48 } };
const LABEL_STYLE = { fontSize: 10, fontFamily: 'Noto Sans, system-ui, sans-serif' };
const WIDTH = 460;
const HEIGHT = 240;
const PADDING = { top: 18, right: 24, bottom: 48, left: 72 };

/** Points of the natural frequency between 10 % and 100 % of the rated load. */
export const FREQUENCY_CURVE_POINTS = 46;

interface Point {
  x: number;
  y: number;
}

/**
 * The static load–deflection line of a mount (0 … rated load, the rated point, the deflection
 * limit), and its vertical natural frequency against load, in the user's units.
 */
export function MountCharts({ mount }: { mount: Mount }) {
  const units = useUnits();
  const load = (n: number) => units.toDisplay('force', n);
  const deflection = (m: number) => units.toDisplay('deflection', m);

  const ratedDeflectionM = deflectionAtLoad(mount, mount.ratedLoadN);
  const maxDeflectionM = mmToM(mount.maxDeflectionMm);
  if (!Number.isFinite(ratedDeflectionM)) {
    return <p className="tc-muted">No chart: the rated load or stiffness is missing.</p>;
  }

  const ratedPoint: Point = { x: deflection(ratedDeflectionM), y: load(mount.ratedLoadN) };
  const loadLine: Point[] = [{ x: 0, y: 0 }, ratedPoint];
  const limitX = maxDeflectionM !== null ? deflection(maxDeflectionM) : null;
  const xMax = Math.max(ratedPoint.x, limitX ?? 0) * 1.12;
  const yMax = ratedPoint.y * 1.15;

  const frequencyCurve: Point[] = [];
  for (let i = 0; i < FREQUENCY_CURVE_POINTS; i += 1) {
    const loadN = mount.ratedLoadN * (0.1 + (0.9 * i) / (FREQUENCY_CURVE_POINTS - 1));
    const hz = naturalFrequencyAtLoad(mount, loadN);
    if (Number.isFinite(hz)) frequencyCurve.push({ x: load(loadN), y: hz });
  }
  const ratedHz = naturalFrequencyAtLoad(mount, mount.ratedLoadN);
  const fMax = Math.max(...frequencyCurve.map((point) => point.y)) * 1.1;

  const forceUnit = units.label('force');
  const deflectionUnit = units.label('deflection');

  return (
    <div className="tc-mount-charts">
      <figure className="tc-mount-chart" aria-labelledby="mount-chart-load-title">
        <figcaption id="mount-chart-load-title">Static load against deflection</figcaption>
        <VictoryChart
          width={WIDTH}
          height={HEIGHT}
          padding={PADDING}
          domain={{ x: [0, xMax], y: [0, yMax] }}
          containerComponent={
            <VictoryContainer
              title="Static load against deflection"
              desc={`A straight line from zero to the rated load of ${formatNumber(ratedPoint.y)} ${forceUnit} at ${formatNumber(ratedPoint.x)} ${deflectionUnit}.`}
              responsive
            />
          }
        >
          <VictoryAxis label={`Static deflection (${deflectionUnit})`} style={AXIS_STYLE} tickCount={6} />
          <VictoryAxis dependentAxis label={`Load (${forceUnit})`} style={Y_AXIS_STYLE} tickCount={5} />
          <VictoryLine data={loadLine} style={{ data: { stroke: ACCENT, strokeWidth: 2 } }} />
          {limitX !== null ? (
            <VictoryLine
              data={[
                { x: limitX, y: 0 },
                { x: limitX, y: yMax },
              ]}
              style={{ data: { stroke: LIMIT, strokeWidth: 1.5, strokeDasharray: '5,4' } }}
              labels={({ datum }: { datum: Point }) => (datum.y > 0 ? 'max deflection' : '')}
              labelComponent={<VictoryLabel dx={-4} dy={10} textAnchor="end" style={{ ...LABEL_STYLE, fill: LIMIT }} />}
            />
          ) : null}
          <VictoryScatter
            data={[ratedPoint]}
            size={4.5}
            style={{ data: { fill: ACCENT } }}
            labels={() => 'rated load'}
            labelComponent={<VictoryLabel dx={-6} dy={-2} textAnchor="end" style={{ ...LABEL_STYLE, fill: ACCENT }} />}
          />
        </VictoryChart>
      </figure>
      <figure className="tc-mount-chart" aria-labelledby="mount-chart-frequency-title">
        <figcaption id="mount-chart-frequency-title">Natural frequency against load</figcaption>
        <VictoryChart
          width={WIDTH}
          height={HEIGHT}
          padding={PADDING}
          domain={{ y: [0, fMax] }}
          domainPadding={{ x: [0, 14] }}
          containerComponent={
            <VictoryContainer
              title="Natural frequency against load"
              desc={`The vertical natural frequency falls as the load rises, to ${formatNumber(ratedHz)} Hz at the rated load.`}
              responsive
            />
          }
        >
          <VictoryAxis label={`Load per mount (${forceUnit})`} style={AXIS_STYLE} tickCount={6} />
          <VictoryAxis dependentAxis label="Natural frequency (Hz)" style={Y_AXIS_STYLE} tickCount={5} />
          <VictoryLine data={frequencyCurve} style={{ data: { stroke: ACCENT, strokeWidth: 2 } }} />
          <VictoryScatter
            data={[{ x: ratedPoint.y, y: ratedHz }]}
            size={4.5}
            style={{ data: { fill: ACCENT } }}
            labels={() => `${formatNumber(ratedHz)} Hz at rated load`}
            labelComponent={<VictoryLabel dx={-6} dy={-8} textAnchor="end" style={{ ...LABEL_STYLE, fill: ACCENT }} />}
          />
        </VictoryChart>
      </figure>
    </div>
  );
}
