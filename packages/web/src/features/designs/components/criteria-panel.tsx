import { Callout, Checkbox, FormGroup } from '@blueprintjs/core';
import { MOUNT_TYPE_LABELS as GLOSSARY_MOUNT_TYPES } from '@tacet/vibration';
import { useFormikContext } from 'formik';

import { useUnits } from '@/lib/units';
import { MOUNT_TYPES, type SupplierRef } from '@/types/design-api';

import type { DesignFormValues } from '../schemas/design-form';
import { QuantityField } from './form-cells';

export const MOUNT_TYPE_LABELS: Record<(typeof MOUNT_TYPES)[number], string> = GLOSSARY_MOUNT_TYPES;

export interface CriteriaPanelProps {
  readOnly: boolean;
  /** Suppliers to filter on; undefined while loading, null when the list is unavailable. */
  suppliers: readonly SupplierRef[] | null | undefined;
}

function CheckboxList({
  name,
  legend,
  options,
  readOnly,
  help,
}: {
  name: 'criteria.mountTypes' | 'criteria.supplierIds';
  legend: string;
  options: readonly { value: string; label: string }[];
  readOnly: boolean;
  help: string;
}) {
  const { values, setFieldValue } = useFormikContext<DesignFormValues>();
  const selected = name === 'criteria.mountTypes' ? values.criteria.mountTypes : values.criteria.supplierIds;
  const toggle = (value: string, on: boolean) => {
    const next = on ? [...selected, value] : selected.filter((v) => v !== value);
    void setFieldValue(
      name,
      options.map((o) => o.value).filter((v) => next.includes(v)),
    );
  };
  return (
    <fieldset className="tc-checkbox-list">
      <legend>{legend}</legend>
      <p className="tc-muted tc-note">{help}</p>
      <div className="tc-checkbox-grid">
        {options.map((option) => (
          <Checkbox
            key={option.value}
            label={option.label}
            checked={selected.includes(option.value)}
            disabled={readOnly}
            onChange={(event) => toggle(option.value, event.currentTarget.checked)}
          />
        ))}
      </div>
    </fieldset>
  );
}

/** What the mounts must achieve, and which mounts may be considered. */
export function CriteriaPanel({ readOnly, suppliers }: CriteriaPanelProps) {
  const units = useUnits();
  const { values } = useFormikContext<DesignFormValues>();

  return (
    <div className="tc-two-columns">
      <div>
        <h3 className="tc-subsection-title tc-first">Performance</h3>
        <QuantityField
          name="criteria.minIsolationPct"
          id="criteria-isolation"
          label="Minimum isolation"
          unit="%"
          readOnly={readOnly}
          helperText="At every disturbing frequency. 80–90 % suits machines on grade; 95 % and more over sensitive rooms (common practice)."
        />
        <FormGroup
          label="Load utilisation window"
          helperText="Load on each mount divided by its rated load; 0.5 to 1.0 is common practice."
        >
          <div className="tc-field-row">
            <QuantityField name="criteria.minUtilization" id="criteria-min-utilization" label="Lowest" readOnly={readOnly} />
            <QuantityField name="criteria.maxUtilization" id="criteria-max-utilization" label="Highest" readOnly={readOnly} />
          </div>
        </FormGroup>
        <QuantityField
          name="criteria.ambientTemp"
          id="criteria-ambient"
          label="Ambient temperature"
          unit={units.label('temperature')}
          readOnly={readOnly}
          placeholder="not checked"
          helperText="Mounts whose rated range does not cover it are left out."
        />
        <QuantityField
          name="criteria.weightMarginPct"
          id="criteria-margin"
          label="Weight margin"
          unit="%"
          readOnly={readOnly}
          placeholder="10"
          helperText="Allowance for an uncertain weight: added in the overload checks, taken off for the springs' light case. Empty: 10 %."
        />
        <QuantityField
          name="criteria.stiffnessTolerancePct"
          id="criteria-stiffness-tolerance"
          label="Stiffness tolerance, ±"
          unit="%"
          readOnly={readOnly}
          placeholder="by mount type"
          helperText="How far the real stiffness may be from the catalog's; the verdict holds at the worse end. Empty: ±10 % for springs, ±15 % for elastomer mounts, ±20 % for pads and wire ropes (common practice)."
        />
      </div>
      <div>
        <h3 className="tc-subsection-title tc-first">Mounts to consider</h3>
        <CheckboxList
          name="criteria.mountTypes"
          legend="Mount types"
          options={MOUNT_TYPES.map((type) => ({ value: type, label: MOUNT_TYPE_LABELS[type] }))}
          readOnly={readOnly}
          help="None ticked: every type is considered."
        />
        {suppliers === undefined ? <p className="tc-muted">Loading suppliers…</p> : null}
        {suppliers === null ? (
          <Callout className="tc-note">
            {values.criteria.supplierIds.length > 0
              ? `The supplier list is not available right now; the saved filter (${values.criteria.supplierIds.length} suppliers) stays as it is.`
              : 'The supplier list is not available right now, so every supplier is considered.'}
          </Callout>
        ) : null}
        {suppliers && suppliers.length > 0 ? (
          <CheckboxList
            name="criteria.supplierIds"
            legend="Suppliers"
            options={suppliers.map((s) => ({ value: String(s.id), label: s.name }))}
            readOnly={readOnly}
            help="None ticked: every supplier is considered."
          />
        ) : null}
      </div>
    </div>
  );
}
