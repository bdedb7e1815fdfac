import { Button, Callout, HTMLTable, NonIdealState, Spinner, Tag, type Intent } from '@blueprintjs/core';
import { hystereticDamping, viscousDamping } from '@tacet/vibration';
import { lazy, Suspense, useState } from 'react';

import { errorMessage } from '@/lib/api-errors';
import { formatDateTime } from '@/lib/dates';
import { formatNumber, useUnits } from '@/lib/units';

import { useVerifications } from '../api/get-verifications';
import type { Verification, VerificationVerdict } from '../types';
import { TapTestUploadForm } from './tap-test-upload-form';

// Victory is large: the chart loads as its own chunk.
const MeasuredFrfChart = lazy(() => import('./measured-frf-chart').then((m) => ({ default: m.MeasuredFrfChart })));

export const VERDICT_LABELS: Record<VerificationVerdict, string> = {
  agrees: 'Agrees with the design',
  stiffer: 'Stiffer than predicted',
  softer: 'Softer than predicted',
};
const VERDICT_INTENT: Record<VerificationVerdict, Intent> = { agrees: 'success', stiffer: 'warning', softer: 'warning' };

const KIND_LABELS = { frf: 'FRF file', impact: 'Raw hammer record' } as const;

const signed = (value: number, digits = 1) => `${value >= 0 ? '+' : '−'}${formatNumber(Math.abs(value), digits)} %`;

export function VerdictTag({ verdict }: { verdict: VerificationVerdict }) {
  return (
    <Tag large intent={VERDICT_INTENT[verdict]} data-testid="verification-verdict">
      {VERDICT_LABELS[verdict]}
    </Tag>
  );
}

/** One measurement: identified figures beside the predicted ones, the verdict, causes, warnings and the overlay. */
function VerificationResult({ verification: v }: { verification: Verification }) {
  const units = useUnits();
  const hz = (f: number) => `${formatNumber(f, 3)} Hz`;
  const damping = v.predicted.damping
    ? v.predicted.damping.model === 'hysteretic'
      ? hystereticDamping(v.predicted.damping.value)
      : viscousDamping(v.predicted.damping.value)
    : undefined;
  const predictedZeta = v.predicted.damping
    ? v.predicted.damping.model === 'viscous'
      ? v.predicted.damping.value
      : v.predicted.damping.value / 2
    : null;
  const modeText = `${v.predicted.mode} mode${v.predicted.coupled ? ' (coupled)' : ''}${v.predicted.source === 'bounce estimate' ? ', uncoupled estimate' : ''}`;
  return (
    <section className="tc-verification" aria-label="Measured against predicted" data-testid="verification-result">
      <div className="tc-verification-head">
        <VerdictTag verdict={v.verdict} />
        <span className="tc-muted">
          {formatDateTime(v.createdAt)} · {v.measuredBy.name} · {v.fileName} ({KIND_LABELS[v.kind]})
        </span>
      </div>
      {v.note ? <p className="tc-verification-note">{v.note}</p> : null}
      <HTMLTable compact className="tc-verification-figures" aria-label="Identified and predicted figures">
        <thead>
          <tr>
            <th />
            <th>Measured</th>
            <th>Predicted</th>
            <th>Deviation</th>
          </tr>
        </thead>
        <tbody>
          <tr>
            <th scope="row">Natural frequency</th>
            <td data-testid="measured-frequency">{hz(v.identified.naturalFrequencyHz)}</td>
            <td>
              {hz(v.predicted.naturalFrequencyHz)} <span className="tc-muted">({modeText})</span>
            </td>
            <td data-testid="frequency-deviation">
              {signed(v.deviationPct)} <span className="tc-muted">(tolerance ±{formatNumber(v.tolerancePct, 0)} %)</span>
            </td>
          </tr>
          <tr>
            <th scope="row">Damping ratio</th>
            <td>{v.identified.dampingRatio === null ? 'not identified' : formatNumber(v.identified.dampingRatio, 3)}</td>
            <td>{predictedZeta === null ? '—' : `${formatNumber(predictedZeta, 3)} (catalog)`}</td>
            <td />
          </tr>
          <tr>
            <th scope="row">Stiffness (apparent, from the mass)</th>
            <td>{units.format('stiffness', v.identified.stiffnessNPerM)}</td>
            <td>{units.format('stiffness', v.predicted.stiffnessNPerM)}</td>
            <td>{signed(v.stiffnessDeviationPct)}</td>
          </tr>
          <tr>
            <th scope="row">Mass (design)</th>
            <td colSpan={3}>{units.format('mass', v.predicted.massKg)}</td>
          </tr>
        </tbody>
      </HTMLTable>
      <ul className="tc-verification-notes">
        {v.notes.map((note) => (
          <li key={note}>{note}</li>
        ))}
      </ul>
      {v.warnings.length > 0 ? (
        <Callout intent="warning" title="What makes this measurement doubtful" className="tc-note">
          <ul className="tc-problem-list">
            {v.warnings.map((warning) => (
              <li key={warning}>{warning}</li>
            ))}
          </ul>
        </Callout>
      ) : null}
      {v.processing ? (
        <p className="tc-muted tc-verification-processing">
          {v.processing.hitsAveraged} of {v.processing.hitsFound} hits averaged (H1, force window{' '}
          {formatNumber(v.processing.forceWindowS * 1000, 0)} ms
          {v.processing.exponentialTimeConstantS === null
            ? ', no exponential window'
            : `, exponential window τ = ${formatNumber(v.processing.exponentialTimeConstantS, 2)} s, damping corrected`}
          ); {formatNumber(v.processing.blockDurationS, 1)} s per hit, lines every {formatNumber(v.processing.resolutionHz, 3)} Hz
          {v.identified.meanCoherence === null ? '' : `; coherence at resonance ${formatNumber(v.identified.meanCoherence, 2)}`}.
        </p>
      ) : null}
      <figure className="tc-chart" data-testid="measured-frf-chart" aria-label="Measured and predicted frequency response">
        <h4 className="tc-chart-title">Measured (points) and predicted (dashed) {v.measured.quantity}</h4>
        <Suspense
          fallback={
            <div className="tc-chart-loading">
              <Spinner size={24} aria-label="Loading the chart" />
            </div>
          }
        >
          <MeasuredFrfChart
            quantity={v.measured.quantity}
            frequencyHz={v.measured.frequencyHz}
            magnitude={v.measured.magnitude}
            phaseDeg={v.measured.phaseDeg}
            massKg={v.predicted.massKg}
            stiffnessNPerM={v.predicted.stiffnessNPerM}
            damping={damping}
            predictedHz={v.predicted.naturalFrequencyHz}
            measuredHz={v.identified.naturalFrequencyHz}
          />
        </Suspense>
        <figcaption className="tc-muted tc-chart-caption">
          Predicted: the design mass on the stiffness of the {v.predicted.mode} mode as one mass on one spring, with the catalog damping.
          Vertical lines: the predicted and the measured natural frequency.
        </figcaption>
      </figure>
    </section>
  );
}

function MeasurementHistory({
  items,
  selectedId,
  onSelect,
}: {
  items: Verification[];
  selectedId: number;
  onSelect: (id: number) => void;
}) {
  return (
    <HTMLTable compact striped interactive className="tc-verification-history" aria-label="Measurements">
      <thead>
        <tr>
          <th>When</th>
          <th>Measured by</th>
          <th>File</th>
          <th>Natural frequency</th>
          <th>Deviation</th>
          <th>Verdict</th>
          <th />
        </tr>
      </thead>
      <tbody>
        {items.map((v) => (
          <tr key={v.id} className={v.id === selectedId ? 'tc-row-selected' : undefined}>
            <td>{formatDateTime(v.createdAt)}</td>
            <td>{v.measuredBy.name}</td>
            <td>
              {v.fileName} <span className="tc-muted">({KIND_LABELS[v.kind]})</span>
            </td>
            <td>
              {formatNumber(v.identified.naturalFrequencyHz, 3)} Hz{' '}
              <span className="tc-muted">vs {formatNumber(v.predicted.naturalFrequencyHz, 3)}</span>
            </td>
            <td>{signed(v.deviationPct)}</td>
            <td>{VERDICT_LABELS[v.verdict]}</td>
            <td>
              <Button
                small
                variant="minimal"
                text={v.id === selectedId ? 'Shown' : 'Show'}
                disabled={v.id === selectedId}
                onClick={() => onSelect(v.id)}
              />
            </td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}

export interface MeasuredPanelProps {
  designId: number;
  /** Engineers and admins upload; every role that sees the design reads. */
  canUpload: boolean;
}

/**
 * The "Measured" section of a released (or superseded) design: upload of tap tests, the latest
 * (or chosen) measurement against the prediction, and the history of measurements.
 */
export function MeasuredPanel({ designId, canUpload }: MeasuredPanelProps) {
  const list = useVerifications(designId);
  const [selectedId, setSelectedId] = useState<number | null>(null);
  const items = list.data ?? [];
  const selected = items.find((v) => v.id === selectedId) ?? items[0];

  return (
    <div className="tc-measured" data-testid="measured-panel">
      {list.isPending ? <Spinner size={24} aria-label="Loading the measurements" /> : null}
      {list.isError ? (
        <Callout intent="danger" title="The measurements could not be loaded">
          {errorMessage(list.error)}
        </Callout>
      ) : null}
      {list.isSuccess && items.length === 0 ? (
        <NonIdealState
          title="No measurement yet"
          description={
            canUpload
              ? 'Once the machine is installed, a tap test shows whether it sits on its mounts as designed.'
              : 'Engineers add tap-test measurements once the machine is installed.'
          }
        />
      ) : null}
      {selected ? <VerificationResult verification={selected} /> : null}
      {items.length > 0 ? (
        <>
          <h3 className="tc-section-title">Every measurement</h3>
          <MeasurementHistory items={items} selectedId={selected?.id ?? 0} onSelect={setSelectedId} />
        </>
      ) : null}
      {canUpload ? <TapTestUploadForm designId={designId} onRecorded={(v) => setSelectedId(v.id)} /> : null}
    </div>
  );
}
