import { FormGroup, InputGroup } from '@blueprintjs/core';
import { useField } from 'formik';
import type { ReactNode } from 'react';

export interface TextFieldProps {
  name: string;
  label: string;
  /** Defaults to `name`; must be unique on the page. */
  id?: string;
  type?: 'text' | 'email' | 'password';
  autoComplete?: string;
  helperText?: ReactNode;
  disabled?: boolean;
  autoFocus?: boolean;
  placeholder?: string;
}

/** A labelled Blueprint text input bound to a Formik field; shows the field's error once touched. */
export function TextField({ name, label, id = name, type = 'text', helperText, ...inputProps }: TextFieldProps) {
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
      <InputGroup
        {...field}
        {...inputProps}
        id={id}
        type={type}
        value={field.value ?? ''}
        intent={error ? 'danger' : 'none'}
        aria-invalid={error ? true : undefined}
        aria-describedby={help ? helperId : undefined}
      />
    </FormGroup>
  );
}
