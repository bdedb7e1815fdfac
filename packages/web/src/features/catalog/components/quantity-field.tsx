import { FormGroup, InputGroup, Tag } from '@blueprintjs/core';
import { useField } from 'formik';
import type { ReactNode } from 'react';

export interface QuantityFieldProps {
  name: string;
  label: string;
  id: string;
  /** Unit shown inside the box and read with the label, e.g. "N/mm". */
  unit?: string;
  helperText?: ReactNode;
  placeholder?: string;
}

/** A number typed in the user's units, bound to a Formik text value; errors show once touched. */
export function QuantityField({ name, label, id, unit, helperText, placeholder }: QuantityFieldProps) {
  const [field, meta] = useField<string>(name);
  const error = meta.touched && meta.error ? meta.error : undefined;
  const helperId = `${id}-help`;
  const help = error ?? helperText;
  const fullLabel = unit ? `${label} (${unit})` : label;
  return (
    <FormGroup
      label={fullLabel}
      labelFor={id}
      intent={error ? 'danger' : 'none'}
      helperText={help ? <span id={helperId}>{help}</span> : undefined}
    >
      <InputGroup
        {...field}
        id={id}
        inputMode="decimal"
        autoComplete="off"
        placeholder={placeholder}
        value={field.value ?? ''}
        intent={error ? 'danger' : 'none'}
        rightElement={unit ? <Tag minimal>{unit}</Tag> : undefined}
        aria-invalid={error ? true : undefined}
        aria-describedby={help ? helperId : undefined}
      />
    </FormGroup>
  );
}
