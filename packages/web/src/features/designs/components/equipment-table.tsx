import { Button, HTMLTable } from '@blueprintjs/core';
import { PlusIcon } from '@blueprintjs/icons';
import { INPUT_LABELS } from '@tacet/vibration';
import { FieldArray, useFormikContext } from 'formik';

import { useUnits } from '@/lib/units';

import { blankComponent, type DesignFormValues } from '../schemas/design-form';
import { CellInput, ListError, RemoveRowCell } from './form-cells';

function rowName(name: string, index: number): string {
  return name.trim() || `component ${index + 1}`;
}

/** What the second mass is, under the table. */
export const SECOND_MASS_HELP =
  'drained, empty or without its liquid; the verdict covers both. Leave it empty when the mass does not change.';

/** The parts of the machine with their operating mass, optional second mass, centre of gravity and optional box size. */
export function EquipmentTable({ readOnly }: { readOnly: boolean }) {
  const { values } = useFormikContext<DesignFormValues>();
  const units = useUnits();
  const m = units.label('position');
  const kg = units.label('mass');

  return (
    <FieldArray name="components">
      {({ push, remove }) => (
        <>
          <div className="tc-table-scroll">
            <HTMLTable compact className="tc-table tc-edit-table" aria-label="Equipment">
              <thead>
                <tr>
                  <th scope="col" rowSpan={2}>
                    Component
                  </th>
                  <th scope="col" rowSpan={2} className="tc-number">
                    Mass ({kg})
                  </th>
                  <th scope="col" rowSpan={2} className="tc-number">
                    {INPUT_LABELS.secondMass} <br />({kg}, optional)
                  </th>
                  <th scope="colgroup" colSpan={3} className="tc-group-head">
                    Centre of gravity ({m})
                  </th>
                  <th scope="colgroup" colSpan={3} className="tc-group-head">
                    Box size ({m}, optional)
                  </th>
                  {readOnly ? null : (
                    <th scope="col" rowSpan={2}>
                      <span className="tc-visually-hidden">Actions</span>
                    </th>
                  )}
                </tr>
                <tr>
                  <th scope="col">x</th>
                  <th scope="col">y</th>
                  <th scope="col">z</th>
                  <th scope="col">along x</th>
                  <th scope="col">along y</th>
                  <th scope="col">along z</th>
                </tr>
              </thead>
              <tbody>
                {values.components.map((row, index) => {
                  const name = rowName(row.name, index);
                  const field = (key: string) => `components[${index}].${key}`;
                  return (
                    <tr key={index}>
                      <td className="tc-cell-name">
                        <CellInput name={field('name')} label={`Name of component ${index + 1}`} readOnly={readOnly} />
                      </td>
                      <td>
                        <CellInput name={field('mass')} label={`Mass of ${name}`} readOnly={readOnly} numeric />
                      </td>
                      <td>
                        <CellInput
                          name={field('altMass')}
                          label={`${INPUT_LABELS.secondMass} of ${name}`}
                          readOnly={readOnly}
                          numeric
                          placeholder="—"
                        />
                      </td>
                      {(['x', 'y', 'z'] as const).map((axis) => (
                        <td key={axis}>
                          <CellInput name={field(axis)} label={`CG ${axis} of ${name}`} readOnly={readOnly} numeric />
                        </td>
                      ))}
                      {(['lx', 'ly', 'lz'] as const).map((key, i) => (
                        <td key={key}>
                          <CellInput
                            name={field(key)}
                            label={`Box size along ${'xyz'[i]} of ${name}`}
                            readOnly={readOnly}
                            numeric
                            placeholder="—"
                          />
                        </td>
                      ))}
                      <RemoveRowCell
                        label={`Remove ${name}`}
                        readOnly={readOnly}
                        disabled={values.components.length <= 1}
                        onRemove={() => remove(index)}
                      />
                    </tr>
                  );
                })}
              </tbody>
            </HTMLTable>
          </div>
          <p className="tc-muted tc-note" data-testid="second-mass-help">
            {INPUT_LABELS.secondMass}: {SECOND_MASS_HELP}
          </p>
          <ListError name="components" />
          {readOnly ? null : (
            <Button
              className="tc-add-row"
              icon={<PlusIcon />}
              variant="outlined"
              text="Add component"
              onClick={() => push(blankComponent())}
            />
          )}
        </>
      )}
    </FieldArray>
  );
}
