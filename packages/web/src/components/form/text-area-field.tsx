import { FormGroup, TextArea } from '@blueprintjs/core';
import { useField } from 'formik';
import type { ReactNode } from 'react';

export interface TextAreaFieldProps {
  name: string;
  label: string;
  /** Defaults to `name`; must be unique on the page. */
  id?: string;
  helperText?: ReactNode;
  disabled?: boolean;
  rows?: number;
  placeholder?: string;
}

/** A labelled Blueprint text area bound to a Formik field; shows the field's error once touched. */
export function TextAreaField({ name, label, id = name, helperText, rows = 3, ...inputProps }: TextAreaFieldProps) {
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
      <TextArea
        {...field}
        {...inputProps}
        id={id}
        rows={rows}
        fill
        value={field.value ?? ''}
        intent={error ? 'danger' : 'none'}
        aria-invalid={error ? true : undefined}
        aria-describedby={help ? helperId : undefined}
      />
    </FormGroup>
  );
}
