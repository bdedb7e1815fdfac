import { Callout, Radio, RadioGroup } from '@blueprintjs/core';
import { useFormikContext } from 'formik';
import { useMemo } from 'react';

import { useUnits } from '@/lib/units';

import type { DesignFigures } from '../hooks/use-design-figures';
import type { DesignFormValues, SpeedMode } from '../schemas/design-form';
import { QuantityField } from './form-cells';
import { FrequencyList } from './frequency-list';
import { PlanView } from './plan-view';
import { SideElevation } from './side-elevation';
import { SkipBands } from './skip-bands';
import { SourcesTable } from './sources-table';

/** Speeds, orders, vane count and supply → the disturbing frequencies, live. */
export function OperatingPanel({ readOnly, figures }: { readOnly: boolean; figures: DesignFigures }) {
  const { values, setFieldValue } = useFormikContext<DesignFormValues>();
  const units = useUnits();
  const mode = values.operating.speedMode;
  const { mountPoints, mass, components, sources } = figures;
  const planCg = useMemo(() => (mass ? { x: mass.cg.x, y: mass.cg.y } : null), [mass]);

  return (
    <>
      <div className="tc-two-columns">
        <div>
          <h3 className="tc-subsection-title tc-first">Machine speed</h3>
          <RadioGroup
            name="operating.speedMode"
            selectedValue={mode}
            onChange={(event) => void setFieldValue('operating.speedMode', event.currentTarget.value as SpeedMode)}
            disabled={readOnly}
            inline
            label="Speed"
          >
            <Radio value="fixed" label="Fixed speed" />
            <Radio value="range" label="Speed range (variable-speed drive)" />
          </RadioGroup>
          {mode === 'fixed' ? (
            <QuantityField name="operating.speedRpm" id="operating-speed" label="Running speed" unit="rpm" readOnly={readOnly} />
          ) : (
            <div className="tc-field-row">
              <QuantityField name="operating.speedMinRpm" id="operating-speed-min" label="Lowest speed" unit="rpm" readOnly={readOnly} />
              <QuantityField name="operating.speedMaxRpm" id="operating-speed-max" label="Highest speed" unit="rpm" readOnly={readOnly} />
            </div>
          )}
          {mode === 'range' ? (
            <>
              <SkipBands readOnly={readOnly} />
              <QuantityField
                name="operating.motorPoles"
                id="operating-poles"
                label="Motor poles"
                readOnly={readOnly}
                placeholder="not given"
                helperText="On a drive the motor's magnetic force follows the speed (2 × poles × speed ÷ 120) instead of twice the supply frequency."
              />
            </>
          ) : null}
          <QuantityField
            name="operating.orders"
            id="operating-orders"
            label="Shaft orders"
            readOnly={readOnly}
            numeric={false}
            helperText="Multiples of the running speed, separated by commas: 1 for unbalance, 2 for misalignment."
          />
          <QuantityField
            name="operating.vaneCount"
            id="operating-vanes"
            label="Impeller vanes or fan blades"
            readOnly={readOnly}
            placeholder="none"
            helperText="Gives the vane (blade) pass frequency. Leave blank if there is none."
          />
          <QuantityField
            name="operating.lineFrequencyHz"
            id="operating-line"
            label="Supply frequency"
            unit="Hz"
            readOnly={readOnly}
            placeholder="none"
            helperText="50 or 60 Hz: motors shake at twice the supply frequency."
          />
          <QuantityField
            name="operating.extraFrequenciesHz"
            id="operating-extra"
            label="Further frequencies"
            unit="Hz"
            readOnly={readOnly}
            numeric={false}
            placeholder="none"
            helperText="Any other steady forcing, separated by commas."
          />
        </div>
        <div>
          <h3 className="tc-subsection-title tc-first">Disturbing frequencies</h3>
          {figures.frequencies ? (
            <>
              <FrequencyList frequencies={figures.frequencies} />
              <p className="tc-muted tc-note">
                The lowest frequency governs: mounts must isolate it, and every higher one, by the minimum asked for under Requirements.
                {mode === 'range' ? ' With a speed range both ends of the range are checked.' : ''}
              </p>
            </>
          ) : (
            <Callout>{figures.frequencyProblem}</Callout>
          )}
        </div>
      </div>
      <section className="tc-sources" aria-labelledby="tc-sources-title">
        <h3 className="tc-subsection-title" id="tc-sources-title">
          Where the forces act
        </h3>
        <p className="tc-muted tc-intro">
          The whole machine is judged source by source over the running range: an unbalance turns with its shaft (its force is rotor mass ×
          eccentricity × speed², the eccentricity from the balance grade at the highest speed); a force acts along its axis at an order of
          the shaft speed or at a fixed frequency.
        </p>
        <SourcesTable readOnly={readOnly} components={components} />
        {mountPoints && mountPoints.length > 0 && sources.length > 0 ? (
          <div className="tc-two-columns tc-drawings" data-testid="sources-drawings">
            <div>
              <h4 className="tc-subsection-title">Plan, from above</h4>
              <PlanView points={mountPoints} loadsN={null} cg={planCg} sources={sources} units={units} />
            </div>
            <div>
              <h4 className="tc-subsection-title">Side elevation, looking along +y</h4>
              <SideElevation points={mountPoints} cg={mass?.cg ?? null} components={null} sources={sources} units={units} />
            </div>
          </div>
        ) : null}
      </section>
    </>
  );
}
