import { HTMLTable, Spinner } from '@blueprintjs/core';
import { lazy, Suspense, useMemo } from 'react';

import { useUnits } from '@/lib/units';
import type { Model2Candidate, SkipBand, SpeedCurve } from '@/types/model2-api';

import { formatFrequency, formatPct, formatTransmissibility } from './candidate-format';
import { modeText, speedChartData, worstPointForces } from './speed-chart-data';

// Victory loads as its own chunk, as the other charts do.
const SpeedChart = lazy(() => import('./speed-chart').then((m) => ({ default: m.SpeedChart })));

const rpm = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });
const formatRpm = (value: number | null | undefined) =>
  typeof value !== 'number' || !Number.isFinite(value) ? '—' : `${rpm.format(value)} rpm`;

/** What of the design input the whole-machine section needs (from the saved input). */
export interface WholeMachineContext {
  /** The running range [rpm]; null at a fixed speed. */
  rangeRpm: { min: number; max: number } | null;
  skipBandsRpm: readonly SkipBand[];
  /** The start-up motion limit [mm], when the requirements give one. */
  maxResonantMotionMm: number | null;
}

export interface CandidateWholeMachineProps {
  candidate: Model2Candidate;
  context: WholeMachineContext;
  targetTransmissibility: number | null;
  /** The server's sweep per source, when available. */
  curves?: readonly SpeedCurve[] | null;
}

/** "the stiff end of the band (+15 %)" from the factor that governed. */
export function bandEndText(factor: number | undefined): string | null {
  if (factor === undefined || !Number.isFinite(factor) || Math.abs(factor - 1) < 1e-9) return null;
  const pct = Math.round((factor - 1) * 1000) / 10;
  return factor > 1 ? `the stiff end of the band (+${pct} %)` : `the soft end of the band (${pct} %)`;
}

/**
 * The whole-machine verdict of one candidate: the worst point, transmissibility against speed
 * for each source with the crossings, skip bands, requirement and stiffness band; beside the
 * charts the start-up passage through the modes below the range and the peak force per mount at
 * the worst point.
 */
export function CandidateWholeMachine({ candidate, context, targetTransmissibility, curves = null }: CandidateWholeMachineProps) {
  const units = useUnits();
  const wm = candidate.wholeMachine;
  const data = useMemo(
    () =>
      context.rangeRpm
        ? speedChartData({ candidate, rangeRpm: context.rangeRpm, skipBandsRpm: context.skipBandsRpm, targetTransmissibility, curves })
        : null,
    [candidate, context.rangeRpm, context.skipBandsRpm, targetTransmissibility, curves],
  );
  const forces = useMemo(() => worstPointForces(candidate), [candidate]);
  if (!wm) return null;
  const { worst } = wm;
  const bandEnd = bandEndText(worst.stiffnessFactor);
  const passage = candidate.passage;
  const crossings = candidate.crossings ?? [];
  const limit = context.maxResonantMotionMm;
  const maxForce = forces ? Math.max(...forces.map((f) => f.forceN), 0) : 0;
  const anyCurve = data?.sources.some((s) => s.fromCurve) ?? false;
  const anyBand = data?.sources.some((s) => s.band) ?? false;

  return (
    <section className="tc-whole-machine" aria-label="Whole machine" data-testid="whole-machine">
      <h4 className="tc-subsection-title">Whole machine over the running range</h4>
      <p className="tc-whole-machine-worst" data-testid="whole-machine-worst">
        Worst transmissibility <strong>{formatTransmissibility(worst.transmissibility)}</strong>{' '}
        {worst.transmissibility > 1 ? (
          <>
            (<strong>no isolation</strong>: the force reaching the floor is amplified)
          </>
        ) : (
          <>
            (isolation <strong>{formatPct(worst.efficiencyPct)}</strong>)
          </>
        )}{' '}
        at {typeof worst.speedRpm === 'number' ? `${formatRpm(worst.speedRpm)}, ` : ''}
        {formatFrequency(worst.frequencyHz)}, from {worst.source}
        {bandEnd ? `, at ${bandEnd}` : ''}. This is the figure the verdict is checked against.
      </p>

      <div className="tc-whole-machine-grid">
        <div className="tc-whole-machine-charts">
          {data && data.sources.length > 0 ? (
            data.sources.map((chart) => (
              <figure
                key={chart.source}
                className="tc-chart"
                data-testid="speed-chart"
                data-band={chart.band ? 'drawn' : 'none'}
                data-crossings={chart.crossings.length}
                aria-label={`Transmissibility against speed, ${chart.source}`}
              >
                <h5 className="tc-chart-title">{chart.source}</h5>
                <Suspense
                  fallback={
                    <div className="tc-chart-loading">
                      <Spinner size={24} aria-label="Loading the chart" />
                    </div>
                  }
                >
                  <SpeedChart data={data} chart={chart} />
                </Suspense>
              </figure>
            ))
          ) : data ? null : (
            <HTMLTable compact striped className="tc-table" aria-label="Whole machine per frequency">
              <thead>
                <tr>
                  <th scope="col">Source</th>
                  <th scope="col" className="tc-number">
                    Frequency
                  </th>
                  <th scope="col" className="tc-number">
                    Transmissibility
                  </th>
                  <th scope="col" className="tc-number">
                    Isolation
                  </th>
                </tr>
              </thead>
              <tbody>
                {wm.perFrequency.map((row, index) => (
                  <tr key={`${row.source}-${row.frequencyHz}-${index}`}>
                    <td>{row.source}</td>
                    <td className="tc-number">{formatFrequency(row.frequencyHz)}</td>
                    <td className="tc-number">{formatTransmissibility(row.transmissibility)}</td>
                    <td className="tc-number">{formatPct((1 - row.transmissibility) * 100)}</td>
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
          )}
          {data ? (
            <p className="tc-muted tc-chart-caption">
              Sum of the peak forces through all mounts per unit of force from the source, each source on its own.{' '}
              {anyBand ? 'Filled: the stiffness band, from its soft to its stiff end; line: the nominal stiffness. ' : ''}
              {anyCurve ? '' : 'Dots: the speeds the model computed (range ends, crossings, worst point), joined. '}
              Shaded grey: skip bands. Dark lines: crossings of a mode by an order of the source. Dashed: the required transmissibility.
            </p>
          ) : null}
        </div>

        <div className="tc-whole-machine-side">
          <h5 className="tc-side-title">Start-up and coast-down</h5>
          {passage && passage.length > 0 ? (
            <HTMLTable compact striped className="tc-table" aria-label="Start-up passage">
              <thead>
                <tr>
                  <th scope="col">Mode</th>
                  <th scope="col" className="tc-number">
                    Speed
                  </th>
                  <th scope="col" className="tc-number">
                    Motion
                  </th>
                </tr>
              </thead>
              <tbody>
                {passage.map((row, index) => {
                  const over = limit !== null && row.motionMm > limit;
                  return (
                    <tr key={`${row.mode}-${index}`} className={over ? 'is-over' : undefined}>
                      <td>
                        {modeText(row.mode)}
                        <span className="tc-cell-note">{formatFrequency(row.modeFrequencyHz)}</span>
                      </td>
                      <td className="tc-number">{formatRpm(row.speedRpm)}</td>
                      <td className={`tc-number${over ? ' tc-text-danger' : ''}`}>{units.format('deflection', row.motionMm / 1000)}</td>
                    </tr>
                  );
                })}
              </tbody>
            </HTMLTable>
          ) : passage ? (
            <p className="tc-muted tc-note">No mode below the running range: nothing is passed through on the way up.</p>
          ) : (
            <p className="tc-muted tc-note" data-testid="passage-missing">
              This result has no start-up figures: find mounts again to add them.
            </p>
          )}
          <p className="tc-muted tc-note" data-testid="passage-limit">
            Steady peak motion at the mounts at each mode below the lowest running speed, from the unbalance at that speed.{' '}
            {limit !== null ? `Limit: ${units.format('deflection', limit / 1000)}.` : 'No limit is set under Requirements.'} A fast run-up
            passes with less; limit stops or snubbers take the rest.
          </p>

          {forces && forces.length > 0 ? (
            <>
              <h5 className="tc-side-title">Force per mount at the worst point</h5>
              <HTMLTable compact className="tc-table tc-force-bars" aria-label="Dynamic force per mount at the worst point">
                <tbody>
                  {forces.map((point) => (
                    <tr key={point.label}>
                      <th scope="row">{point.label}</th>
                      <td className="tc-number">{units.format('force', point.forceN)}</td>
                      <td className="tc-bar-cell" aria-hidden="true">
                        <span className="tc-bar" style={{ width: `${maxForce > 0 ? (point.forceN / maxForce) * 100 : 0}%` }} />
                      </td>
                    </tr>
                  ))}
                </tbody>
              </HTMLTable>
              <p className="tc-muted tc-note">Peak dynamic force through each mount, for the source's own size.</p>
            </>
          ) : null}
        </div>
      </div>

      {crossings.length > 0 ? (
        <>
          <h5 className="tc-side-title">Crossings inside the running range</h5>
          <HTMLTable compact striped className="tc-table" aria-label="Crossings">
            <thead>
              <tr>
                <th scope="col">Mode</th>
                <th scope="col" className="tc-number">
                  Mode frequency
                </th>
                <th scope="col">Source</th>
                <th scope="col" className="tc-number">
                  Order
                </th>
                <th scope="col" className="tc-number">
                  Speed
                </th>
              </tr>
            </thead>
            <tbody>
              {crossings.map((c, index) => (
                <tr key={`${c.source}-${c.mode}-${c.order}-${index}`}>
                  <td>{modeText(c.mode)}</td>
                  <td className="tc-number">{formatFrequency(c.modeFrequencyHz)}</td>
                  <td>{c.source}</td>
                  <td className="tc-number">{Number(c.order.toPrecision(6))}×</td>
                  <td className="tc-number">{formatRpm(c.speedRpm)}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </>
      ) : null}
    </section>
  );
}
