import { FormGroup, HTMLSelect } from '@blueprintjs/core';
import { useField } from 'formik';
import type { ReactNode } from 'react';

export interface SelectOption {
  value: string;
  label: string;
}

export interface SelectFieldProps {
  name: string;
  label: string;
  id?: string;
  options: readonly SelectOption[];
  helperText?: ReactNode;
  disabled?: boolean;
}

/** A labelled native select (Blueprint HTMLSelect) bound to a Formik field. */
export function SelectField({ name, label, id = name, options, helperText, disabled }: SelectFieldProps) {
  const [field, meta] = useField<string>(name);
  const error = meta.touched && meta.error ? meta.error : undefined;
  const helperId = `${id}-help`;
  const help = error ?? helperText;
  return (
    <FormGroup
      label={label}
      labelFor={id}
      intent={error ? 'danger' : 'none'}
      helperText={help ? <span id={helperId}>{help}</span> : undefined}
    >
      <HTMLSelect
        name={field.name}
        value={field.value ?? ''}
        onChange={field.onChange}
        onBlur={field.onBlur}
        id={id}
        fill
        disabled={disabled}
        options={options.map((option) => ({ value: option.value, label: option.label }))}
        aria-invalid={error ? true : undefined}
        aria-describedby={help ? helperId : undefined}
      />
    </FormGroup>
  );
}
