import { INPUT_LABELS } from '@tacet/vibration';

import { useUnits } from '@/lib/units';
import type { CandidateAltMassCase as AltMassCase } from '@/types/design-api';

import { formatFrequency, formatPct, formatTransmissibility } from './candidate-format';
import { VerdictTag } from './candidates-table';
import { bandEndText } from './candidate-whole-machine';

const rpm = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** The lowest bounce-estimate isolation of the second mass case, or null without disturbing frequencies. */
export function lowestAltIsolation(altCase: AltMassCase): AltMassCase['isolation'][number] | null {
  return altCase.isolation.reduce<AltMassCase['isolation'][number] | null>(
    (low, row) => (low === null || row.efficiencyPct < low.efficiencyPct ? row : low),
    null,
  );
}

/**
 * The second mass case of a candidate (components drained, empty or without their liquid): its
 * mass, the bounce estimate and the whole-machine worst point, and whether it passes. The
 * candidate's verdict already covers it; this says how it fares on its own.
 */
export function CandidateAltMass({ altCase }: { altCase: AltMassCase }) {
  const units = useUnits();
  const worst = altCase.wholeMachineWorst;
  const lowest = lowestAltIsolation(altCase);
  const bandEnd = worst ? bandEndText(worst.stiffnessFactor) : null;
  return (
    <section aria-label={`${INPUT_LABELS.secondMass} case`} data-testid="alt-mass-case">
      <h4 className="tc-subsection-title">
        {INPUT_LABELS.secondMass} case <VerdictTag passes={altCase.passes} />
      </h4>
      <dl className="tc-facts tc-facts--grid" aria-label={`${INPUT_LABELS.secondMass} figures`}>
        <dt>Mass</dt>
        <dd>{units.format('mass', altCase.massKg)}</dd>
        <dt>Natural frequency, vertical (bounce estimate)</dt>
        <dd>{formatFrequency(altCase.verticalNaturalFrequencyHz)}</dd>
        {lowest ? (
          <>
            <dt>Lowest isolation (bounce estimate)</dt>
            <dd>
              {formatPct(lowest.efficiencyPct)} at {formatFrequency(lowest.frequencyHz)}
            </dd>
          </>
        ) : null}
      </dl>
      {worst ? (
        <p className="tc-whole-machine-worst" data-testid="alt-mass-worst">
          Whole machine, worst point:{' '}
          <strong>
            {worst.transmissibility > 1
              ? `no isolation (transmissibility ${formatTransmissibility(worst.transmissibility)})`
              : `isolation ${formatPct(worst.efficiencyPct)}`}
          </strong>{' '}
          at {typeof worst.speedRpm === 'number' ? `${rpm.format(worst.speedRpm)} rpm, ` : ''}
          {formatFrequency(worst.frequencyHz)}, from {worst.source}
          {bandEnd ? `, at ${bandEnd}` : ''}.
        </p>
      ) : null}
      <p className="tc-muted tc-note">
        The machine with the second mass of its components (drained, empty or without its liquid), the centre of gravity moving with it. The
        verdict above covers both cases.
      </p>
    </section>
  );
}
