import { Button, FormGroup, InputGroup } from '@blueprintjs/core';
import { TrashIcon } from '@blueprintjs/icons';
import { getIn, useField, useFormikContext } from 'formik';
import type { ReactNode } from 'react';

export interface CellInputProps {
  name: string;
  /** Accessible name, e.g. "Mass of Pump". */
  label: string;
  readOnly: boolean;
  numeric?: boolean;
  placeholder?: string;
}

/**
 * One editable cell of a design table, bound to a Formik field. The problem appears under the
 * box once the field was touched (or a save was attempted).
 */
export function CellInput({ name, label, readOnly, numeric = false, placeholder }: CellInputProps) {
  const [field, meta] = useField<string>(name);
  const error = meta.touched && meta.error ? meta.error : undefined;
  const errorId = `${name}-error`;
  return (
    <div className="tc-cell-input">
      <InputGroup
        {...field}
        value={field.value ?? ''}
        size="small"
        aria-label={label}
        readOnly={readOnly}
        inputMode={numeric ? 'decimal' : undefined}
        className={numeric ? 'tc-input-number' : undefined}
        placeholder={placeholder}
        intent={error ? 'danger' : 'none'}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : undefined}
        autoComplete="off"
      />
      {error ? (
        <div id={errorId} className="tc-cell-error">
          {error}
        </div>
      ) : null}
    </div>
  );
}

export interface QuantityFieldProps {
  name: string;
  label: string;
  id?: string;
  /** Unit shown inside the box, e.g. "rpm" or "°C". */
  unit?: string;
  readOnly: boolean;
  helperText?: ReactNode;
  placeholder?: string;
  numeric?: boolean;
}

/** A labelled input with its unit, bound to a Formik field. */
export function QuantityField({ name, label, id = name, unit, readOnly, helperText, placeholder, numeric = true }: QuantityFieldProps) {
  const [field, meta] = useField<string>(name);
  const error = meta.touched && meta.error ? meta.error : undefined;
  const help = error ?? helperText;
  const helperId = `${id}-help`;
  return (
    <FormGroup
      label={label}
      labelFor={id}
      intent={error ? 'danger' : 'none'}
      helperText={help ? <span id={helperId}>{help}</span> : undefined}
      className="tc-quantity-field"
    >
      <InputGroup
        {...field}
        id={id}
        value={field.value ?? ''}
        readOnly={readOnly}
        inputMode={numeric ? 'decimal' : undefined}
        placeholder={placeholder}
        rightElement={unit ? <span className="tc-input-unit">{unit}</span> : undefined}
        intent={error ? 'danger' : 'none'}
        aria-invalid={error ? true : undefined}
        aria-describedby={help ? helperId : undefined}
        autoComplete="off"
      />
    </FormGroup>
  );
}

/** A table- or list-level problem (e.g. duplicate labels) once the user has touched the list. */
export function ListError({ name }: { name: string }) {
  const { errors, touched, submitCount } = useFormikContext();
  const error = getIn(errors, name);
  if (typeof error !== 'string') return null;
  if (!getIn(touched, name) && submitCount === 0) return null;
  return (
    <p className="tc-list-error" role="alert">
      {error}
    </p>
  );
}

export interface RemoveRowCellProps {
  /** Accessible name, e.g. "Remove point A". */
  label: string;
  readOnly: boolean;
  /** E.g. when the table holds the fewest rows it may. */
  disabled?: boolean;
  onRemove: () => void;
}

/** The last cell of an editable design table's row: its remove button (no cell when read-only). */
export function RemoveRowCell({ label, readOnly, disabled, onRemove }: RemoveRowCellProps) {
  if (readOnly) return null;
  return (
    <td className="tc-table-actions">
      <Button
        variant="minimal"
        size="small"
        icon={<TrashIcon />}
        aria-label={label}
        title="Remove"
        disabled={disabled}
        onClick={onRemove}
      />
    </td>
  );
}
