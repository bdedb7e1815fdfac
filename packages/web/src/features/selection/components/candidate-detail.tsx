import { Button, Callout, HTMLTable, Tag } from '@blueprintjs/core';
import { TickCircleIcon } from '@blueprintjs/icons';
import { RESULT_LABELS, formatUtilisation, naturalFrequencyHz, stiffnessForNaturalFrequency } from '@tacet/vibration';
import { useMemo } from 'react';

import type { FrequencyMarker } from '@/components/charts/transmissibility-chart';
import { useUnits } from '@/lib/units';
import type { Candidate, DesignInput } from '@/types/design-api';
import type { Model2Candidate } from '@/types/model2-api';

import { useSpeedCurves } from '../api/get-speed-curves';
import { useCandidateDamping } from '../hooks/use-candidate-damping';
import { CandidateAltMass } from './candidate-alt-mass';
import { CandidateCharts } from './candidate-charts';
import { CandidateRestraintSection, type RestraintPlanLayout } from './candidate-restraint';
import { CandidateWholeMachine, type WholeMachineContext } from './candidate-whole-machine';
import {
  assumptionsOf,
  formatDays,
  formatFrequency,
  formatMargin,
  formatMoney,
  formatPct,
  formatRatio,
  formatTransmissibility,
  KIND_LABELS,
  shortLabel,
  utilizationWithMargin,
  weightMarginPct,
} from './candidate-format';
import { VerdictTag } from './candidates-table';
import { modeMotionText } from './mode-format';

/** A disturbing frequency as the design page lists it. */
export interface DisturbingFrequencyLine {
  frequencyHz: number;
  label: string;
  governing: boolean;
}

export interface CandidateDetailProps {
  candidate: Candidate;
  heading: string;
  /** The mass the server computed the candidate's fn with [kg]. */
  referenceMassKg: number;
  /** The mass of the input as it is now [kg], or null while incomplete. */
  liveMassKg: number | null;
  /** Live disturbing frequencies (for the chart lines and the isolation labels). */
  frequencies: readonly DisturbingFrequencyLine[] | null;
  targetTransmissibility: number | null;
  isChosen: boolean;
  /** The user may choose (draft, author or admin). */
  canChoose: boolean;
  /** Why choosing is not possible right now (e.g. the results are out of date). */
  chooseBlockedReason: string | null;
  choosing: boolean;
  onChoose: () => void;
  /** Mount points and CG in plan (of the input the candidate was computed from), for the restraint plan. */
  restraintLayout?: RestraintPlanLayout | null;
  /** What of the saved input the whole-machine section needs (range, skip bands, motion limit). */
  wholeMachineContext?: WholeMachineContext | null;
  /** The saved input the candidate was found for, to fetch its speed curves (null: the chart shows the result's points). */
  curvesInput?: DesignInput | null;
}

const SAME_MASS_TOLERANCE = 1e-9;

/** Everything about one candidate: loads per point, the curves, the modes and the reasons. */
export function CandidateDetail({
  candidate,
  heading,
  referenceMassKg,
  liveMassKg,
  frequencies,
  targetTransmissibility,
  isChosen,
  canChoose,
  chooseBlockedReason,
  choosing,
  onChoose,
  restraintLayout = null,
  wholeMachineContext = null,
  curvesInput = null,
}: CandidateDetailProps) {
  const units = useUnits();
  const damping = useCandidateDamping(candidate);
  const margin = weightMarginPct(candidate);
  const assumptions = assumptionsOf(candidate);
  const model2 = candidate as Candidate & Model2Candidate;
  const estimate = model2.wholeMachine ? ' (bounce estimate)' : '';
  const supportGiven = candidate.perPoint.some((point) => point.supportDeflectionMm !== undefined);
  const speedCurves = useSpeedCurves(curvesInput, candidate, model2.wholeMachine !== undefined && wholeMachineContext?.rangeRpm != null);

  // Σk_dyn follows from the server's fn and mass; the live fn re-uses it with the current mass.
  const stiffness = useMemo(
    () => stiffnessForNaturalFrequency(candidate.verticalNaturalFrequencyHz, referenceMassKg),
    [candidate.verticalNaturalFrequencyHz, referenceMassKg],
  );
  const massKg = liveMassKg ?? referenceMassKg;
  const liveFn = useMemo(() => naturalFrequencyHz(stiffness, massKg), [stiffness, massKg]);
  const massChanged = Math.abs(massKg - referenceMassKg) > SAME_MASS_TOLERANCE * referenceMassKg;

  const markers = useMemo<FrequencyMarker[]>(
    () => (frequencies ?? []).map((f) => ({ frequencyHz: f.frequencyHz, label: shortLabel(f.label), governing: f.governing })),
    [frequencies],
  );
  const labelFor = (hz: number) => frequencies?.find((f) => Math.abs(f.frequencyHz - hz) <= 1e-6 * hz)?.label ?? '';

  const dampingNote =
    damping.source === 'loading'
      ? 'Damping is being read from the catalog.'
      : damping.description
        ? `Damping: ${damping.description}${damping.source === 'catalog' ? ' (catalog)' : ''}${damping.varies ? '; the sizes differ, the first point’s is used' : ''}.`
        : 'Damping unknown: drawn undamped.';

  return (
    <section className="tc-candidate-detail" aria-label={heading}>
      <div className="tc-candidate-head">
        <div>
          <p className="tc-eyebrow">{heading}</p>
          <h3 className="tc-candidate-title">{candidate.label}</h3>
          <p className="tc-muted tc-candidate-sub">
            {candidate.supplier.name} · {KIND_LABELS[candidate.kind]} · <VerdictTag passes={candidate.passes} />
          </p>
        </div>
        <div className="tc-candidate-actions">
          {isChosen ? (
            <Tag large minimal intent="success" icon={<TickCircleIcon />}>
              Chosen for this design
            </Tag>
          ) : canChoose ? (
            <Button
              intent="primary"
              icon={<TickCircleIcon />}
              text="Choose this"
              loading={choosing}
              disabled={chooseBlockedReason !== null}
              title={chooseBlockedReason ?? undefined}
              onClick={onChoose}
            />
          ) : null}
        </div>
      </div>
      {!isChosen && canChoose && chooseBlockedReason ? <p className="tc-muted tc-note">{chooseBlockedReason}</p> : null}

      <dl className="tc-facts tc-facts--grid" aria-label="Candidate figures">
        <dt>Natural frequency, vertical{estimate}</dt>
        <dd>
          {formatFrequency(candidate.verticalNaturalFrequencyHz)}
          {massChanged ? (
            <span className="tc-live-note" data-testid="live-fn">
              {' '}
              → {formatFrequency(liveFn)} with the mass now ({units.format('mass', massKg)})
            </span>
          ) : null}
        </dd>
        <dt>{RESULT_LABELS.resonance}</dt>
        <dd>{formatRatio(candidate.resonanceAmplification)}</dd>
        <dt>Level error</dt>
        <dd>{units.measure('deflection', candidate.levelErrorMm / 1000)}</dd>
        <dt>Price, all points</dt>
        <dd>{formatMoney(candidate.totalPrice, candidate.currency)}</dd>
        <dt>Longest lead time</dt>
        <dd>{formatDays(candidate.maxLeadTimeDays)}</dd>
      </dl>

      {candidate.reasons.length > 0 ? (
        <Callout
          intent={candidate.passes ? 'primary' : 'warning'}
          title={candidate.passes ? 'Remarks' : RESULT_LABELS.checksNotMet}
          className="tc-note"
          data-testid="candidate-reasons"
        >
          <ul className="tc-problem-list">
            {candidate.reasons.map((reason) => (
              <li key={reason}>{reason}</li>
            ))}
          </ul>
        </Callout>
      ) : null}
      {assumptions.length > 0 ? (
        <Callout intent="warning" title="Assumed, not from the catalog" className="tc-note" data-testid="candidate-assumptions">
          <ul className="tc-problem-list">
            {assumptions.map((assumption) => (
              <li key={assumption}>{assumption}</li>
            ))}
          </ul>
          <p className="tc-muted">Each missing figure is filled in with the value that is unfavourable for the check it feeds.</p>
        </Callout>
      ) : null}
      {candidate.notes && candidate.notes.length > 0 ? (
        <Callout title="Notes" className="tc-note" data-testid="candidate-notes">
          <ul className="tc-problem-list">
            {candidate.notes.map((note) => (
              <li key={note}>{note}</li>
            ))}
          </ul>
        </Callout>
      ) : null}

      {model2.wholeMachine && wholeMachineContext ? (
        <CandidateWholeMachine
          candidate={model2}
          context={wholeMachineContext}
          targetTransmissibility={targetTransmissibility}
          curves={speedCurves}
        />
      ) : null}

      {candidate.altMassCase ? <CandidateAltMass altCase={candidate.altMassCase} /> : null}

      <h4 className="tc-subsection-title">Per mount point</h4>
      <div className="tc-table-scroll">
        <HTMLTable compact striped className="tc-table" aria-label="Loads per point">
          <thead>
            <tr>
              <th scope="col">Point</th>
              <th scope="col">Part number</th>
              <th scope="col" className="tc-number">
                Load
              </th>
              <th scope="col" className="tc-number">
                Utilisation
              </th>
              {margin > 0 ? (
                <th scope="col" className="tc-number">
                  With the {formatMargin(margin)} % <br />
                  weight margin
                </th>
              ) : null}
              <th scope="col" className="tc-number">
                Static deflection
              </th>
              {supportGiven ? (
                <th scope="col" className="tc-number">
                  Support <br />
                  deflection
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {candidate.perPoint.map((point) => {
              const checked = utilizationWithMargin(candidate, point.utilization);
              return (
                <tr key={point.label}>
                  <td>{point.label}</td>
                  <td>{point.partNumber}</td>
                  <td className="tc-number">{units.format('force', point.loadN)}</td>
                  <td className={`tc-number${point.utilization > 1 ? ' tc-text-danger' : ''}`}>{formatUtilisation(point.utilization)}</td>
                  {margin > 0 ? <td className={`tc-number${checked > 1 ? ' tc-text-danger' : ''}`}>{formatUtilisation(checked)}</td> : null}
                  <td className="tc-number">{units.format('deflection', point.staticDeflectionMm / 1000)}</td>
                  {supportGiven ? (
                    <td className="tc-number">
                      {point.supportDeflectionMm === undefined ? 'rigid' : units.format('deflection', point.supportDeflectionMm / 1000)}
                    </td>
                  ) : null}
                </tr>
              );
            })}
          </tbody>
        </HTMLTable>
      </div>
      <p className="tc-muted tc-note">
        Utilisation is load ÷ rated load.{' '}
        {margin > 0
          ? `The upper limit of the window is checked with the ${formatMargin(margin)} % weight margin, the lower limit without it.`
          : 'No weight margin is asked for.'}
      </p>

      {candidate.restraint ? <CandidateRestraintSection restraint={candidate.restraint} layout={restraintLayout} /> : null}

      <h4 className="tc-subsection-title">
        {model2.wholeMachine ? 'Bounce estimate: isolation at each disturbing frequency' : 'Isolation at each disturbing frequency'}
      </h4>
      {model2.wholeMachine ? (
        <p className="tc-muted tc-note" data-testid="estimate-note">
          The quick figures below treat the machine as one mass bouncing on its mounts. They are the estimate; the verdict comes from the
          whole machine above.
        </p>
      ) : null}
      <HTMLTable compact striped className="tc-table" aria-label="Isolation per frequency">
        <thead>
          <tr>
            <th scope="col" className="tc-number">
              Frequency
            </th>
            <th scope="col">Source</th>
            <th scope="col" className="tc-number">
              Transmissibility
            </th>
            <th scope="col" className="tc-number">
              Isolation
            </th>
            <th scope="col" className="tc-number">
              dB
            </th>
          </tr>
        </thead>
        <tbody>
          {candidate.isolation.map((row, index) => (
            <tr key={`${row.frequencyHz}-${index}`}>
              <td className="tc-number">{formatFrequency(row.frequencyHz)}</td>
              <td>{labelFor(row.frequencyHz)}</td>
              <td className="tc-number">{formatTransmissibility(row.transmissibility)}</td>
              <td className={`tc-number${row.efficiencyPct < 0 ? ' tc-text-danger' : ''}`}>{formatPct(row.efficiencyPct)}</td>
              <td className="tc-number">{formatRatio(row.dB)}</td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>

      <div className="tc-charts">
        <CandidateCharts
          naturalFrequencyHz={liveFn}
          massKg={massKg}
          stiffnessNPerM={stiffness}
          damping={damping.damping}
          markers={markers}
          targetTransmissibility={targetTransmissibility}
          dampingNote={dampingNote}
          estimate={model2.wholeMachine !== undefined}
        />
      </div>

      {candidate.modes && candidate.modes.length > 0 ? (
        <>
          <h4 className="tc-subsection-title">Rigid-body modes</h4>
          <HTMLTable compact striped className="tc-table" aria-label="Rigid-body modes">
            <thead>
              <tr>
                <th scope="col" className="tc-number">
                  Mode
                </th>
                <th scope="col" className="tc-number">
                  Frequency
                </th>
                <th scope="col">Motion</th>
                <th scope="col">Share of the motion</th>
              </tr>
            </thead>
            <tbody>
              {candidate.modes.map((mode, index) => {
                const motion = modeMotionText(mode);
                return (
                  <tr key={index}>
                    <td className="tc-number">{index + 1}</td>
                    <td className="tc-number">{formatFrequency(mode.frequencyHz)}</td>
                    <td>{motion.mixed ? <strong>{motion.name}</strong> : motion.name}</td>
                    <td>{motion.shares || <span className="tc-muted">one motion</span>}</td>
                  </tr>
                );
              })}
            </tbody>
          </HTMLTable>
          <p className="tc-muted tc-note">
            Six modes of the machine as a rigid body on the mounts. A mode is named after the motion that carries at least 90 % of its
            kinetic energy; a mixed mode after every motion it needs to reach 90 %, largest share first. Keep every mode well below the
            governing frequency.
          </p>
        </>
      ) : null}
    </section>
  );
}
