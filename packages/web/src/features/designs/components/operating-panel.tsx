import { Callout, Radio, RadioGroup } from '@blueprintjs/core';
import { useFormikContext } from 'formik';

import type { DesignFigures } from '../hooks/use-design-figures';
import type { DesignFormValues, SpeedMode } from '../schemas/design-form';
import { QuantityField } from './form-cells';
import { FrequencyList } from './frequency-list';

/** Speeds, orders, vane count and supply → the disturbing frequencies, live. */
export function OperatingPanel({ readOnly, figures }: { readOnly: boolean; figures: DesignFigures }) {
  const { values, setFieldValue } = useFormikContext<DesignFormValues>();
  const mode = values.operating.speedMode;

  return (
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
  );
}
