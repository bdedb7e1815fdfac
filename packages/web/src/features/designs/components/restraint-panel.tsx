import { Callout, FormGroup, HTMLSelect, Switch } from '@blueprintjs/core';
import { WarningSignIcon } from '@blueprintjs/icons';
import {
  SEISMIC_CODE_EDITION,
  SEISMIC_RESTRAINT_CAUTION,
  SNUBBER_GAP_LIMIT_M,
  VIBRATION_ISOLATED_COEFFICIENTS,
  isVibrationInputError,
  seismicDesignForce,
  type SeismicForceResult,
} from '@tacet/vibration';
import { useFormikContext } from 'formik';
import { useMemo } from 'react';

import { formatNumber, useUnits, type Units } from '@/lib/units';

import type { DesignFigures } from '../hooks/use-design-figures';
import { parseRestraint, type DesignFormValues } from '../schemas/design-form';
import { QuantityField } from './form-cells';

const LIMIT_WORDS: Record<SeismicForceResult['limit'], string> = {
  formula: 'from the formula',
  minimum: 'the code’s lower limit 0.3·S_DS·I_p·W_p governs',
  maximum: 'the code’s upper limit 1.6·S_DS·I_p·W_p governs',
};

/** The design force of the current input, live (null while the input is incomplete). */
function useDesignForce(values: DesignFormValues, figures: DesignFigures, units: Units): SeismicForceResult | null {
  return useMemo(() => {
    const restraint = parseRestraint(values.restraint, units);
    const weightN = figures.mass?.weightN;
    if (!restraint || weightN === undefined) return null;
    try {
      return seismicDesignForce({
        ...restraint,
        snubberGapM: restraint.snubberGapMm === undefined ? null : restraint.snubberGapMm / 1000,
        weightN,
      });
    } catch (error) {
      if (isVibrationInputError(error)) return null;
      throw error;
    }
  }, [values.restraint, figures.mass, units]);
}

function ForcePreview({ force, weightN, units }: { force: SeismicForceResult; weightN: number; units: Units }) {
  const ratio = (value: number) => `${formatNumber(value / weightN, 2)} × W`;
  return (
    <dl className="tc-facts" aria-label="Seismic design force">
      <div className="tc-fact">
        <dt>F_p</dt>
        <dd data-testid="restraint-fp">
          {units.format('force', force.fpN)} ({ratio(force.fpN)}), {LIMIT_WORDS[force.limit]}
        </dd>
      </div>
      <div className="tc-fact">
        <dt>Design force on the restraints</dt>
        <dd data-testid="restraint-design-force">
          {units.format('force', force.designForceN)} ({ratio(force.designForceN)})
          {force.doubled ? ' — doubled: the gap exceeds 0.25 in (6.35 mm) or is not given' : ''}
        </dd>
      </div>
      <div className="tc-fact">
        <dt>Vertical effect E_v = 0.2·S_DS·D</dt>
        <dd data-testid="restraint-ev">{units.format('force', force.verticalForceN)}</dd>
      </div>
    </dl>
  );
}

/**
 * Seismic restraint of the machine (ASCE 7-16 §13.3.1): the inputs with their meaning in plain
 * words, the design force as the user types, and the cautions. With it on, every candidate is
 * checked against its mounts' restraint ratings.
 */
export function RestraintPanel({ readOnly, figures }: { readOnly: boolean; figures: DesignFigures }) {
  const units = useUnits();
  const { values, setFieldValue } = useFormikContext<DesignFormValues>();
  const { enabled } = values.restraint;
  const force = useDesignForce(values, figures, units);
  const lengthUnit = units.label('deflection');
  const gapLimit = units.format('deflection', SNUBBER_GAP_LIMIT_M, 2);

  return (
    <div className="tc-restraint-panel" aria-label="Seismic restraint">
      <h3 className="tc-subsection-title tc-first">Seismic restraint ({SEISMIC_CODE_EDITION})</h3>
      <p className="tc-muted">
        Where the machine stands in a seismic region its mounts must be restrained (restrained springs, housed mounts with snubbers, or
        separate snubbers), and the restraints must carry the code’s seismic force. With this check on, Tacet computes that force by{' '}
        {SEISMIC_CODE_EDITION} §13.3.1, the horizontal force and the uplift on every mount in the worst direction, and passes only mounts
        whose catalog ratings cover them.
      </p>
      <Switch
        label="Check seismic restraint"
        checked={enabled}
        disabled={readOnly}
        onChange={(event) => void setFieldValue('restraint.enabled', event.currentTarget.checked)}
      />
      {enabled ? (
        <div className="tc-two-columns">
          <div>
            <QuantityField
              name="restraint.sdsG"
              id="restraint-sds"
              label="S_DS, design spectral acceleration"
              unit="g"
              readOnly={readOnly}
              helperText="The site’s design spectral response acceleration at short periods, in g (e.g. 1.0). The structural engineer or the seismic data for the site give it."
            />
            <FormGroup
              label="I_p, component importance factor"
              labelFor="restraint-importance"
              helperText="1.5 when the machine is needed for life safety after an earthquake (fire pumps, for example), holds hazardous contents, or serves an essential facility that must keep running; 1.0 otherwise."
            >
              <HTMLSelect
                id="restraint-importance"
                value={values.restraint.importanceFactor}
                disabled={readOnly}
                onChange={(event) => void setFieldValue('restraint.importanceFactor', event.currentTarget.value)}
                options={[
                  { value: '1', label: '1.0 — ordinary' },
                  { value: '1.5', label: '1.5 — life safety, hazardous or essential' },
                ]}
              />
            </FormGroup>
            <QuantityField
              name="restraint.zOverH"
              id="restraint-z-over-h"
              label="z/h, height in the building"
              readOnly={readOnly}
              helperText="Height of the machine’s attachment above the building’s base divided by the roof height: 0 at grade or in the basement, 1 on the roof. Higher floors shake more."
            />
            <QuantityField
              name="restraint.snubberGap"
              id="restraint-gap"
              label="Gap to the restraints"
              unit={lengthUnit}
              readOnly={readOnly}
              placeholder="not specified"
              helperText={`The nominal clearance between the machine (or its frame) and the restraint, as the documents specify it. Above ${gapLimit}, or left blank, the code doubles the design force.`}
            />
          </div>
          <div>
            <div className="tc-field-row">
              <QuantityField
                name="restraint.ap"
                id="restraint-ap"
                label="a_p, amplification"
                readOnly={readOnly}
                placeholder={String(VIBRATION_ISOLATED_COEFFICIENTS.ap)}
              />
              <QuantityField
                name="restraint.rp"
                id="restraint-rp"
                label="R_p, response modification"
                readOnly={readOnly}
                placeholder={String(VIBRATION_ISOLATED_COEFFICIENTS.rp)}
              />
            </div>
            <p className="tc-muted tc-note">
              Left blank, a_p = {VIBRATION_ISOLATED_COEFFICIENTS.ap} and R_p = {VIBRATION_ISOLATED_COEFFICIENTS.rp}: the values of{' '}
              {SEISMIC_CODE_EDITION} Table 13.6-1 for vibration-isolated components. Change them only for a component the table lists
              otherwise.
            </p>
            <h4 className="tc-subsection-title">The force</h4>
            <p className="tc-muted tc-note">
              F_p = 0.4·a_p·S_DS·W_p·(1 + 2·z/h) / (R_p/I_p), between 0.3 and 1.6·S_DS·I_p·W_p, acting at the centre of gravity in any
              horizontal direction; W_p is the operating weight.
            </p>
            {force && figures.mass ? (
              <ForcePreview force={force} weightN={figures.mass.weightN} units={units} />
            ) : (
              <p className="tc-muted">Complete the equipment and the figures on the left to see the force.</p>
            )}
          </div>
        </div>
      ) : null}
      <Callout intent="warning" icon={<WarningSignIcon />} className="tc-note" title="Anchorage and the code are the structural engineer’s">
        {SEISMIC_RESTRAINT_CAUTION}
      </Callout>
    </div>
  );
}
