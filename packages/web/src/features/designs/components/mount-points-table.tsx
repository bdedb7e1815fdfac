import { Button, HTMLTable } from '@blueprintjs/core';
import { PlusIcon } from '@blueprintjs/icons';
import { INPUT_LABELS } from '@tacet/vibration';
import { FieldArray, useFormikContext } from 'formik';

import { useUnits } from '@/lib/units';

import { blankMountPoint, type DesignFormValues } from '../schemas/design-form';
import { CellInput, ListError, RemoveRowCell } from './form-cells';

/** The next free label: A, B, … Z, then P27, P28 … */
export function nextPointLabel(existing: readonly string[]): string {
  const taken = new Set(existing.map((label) => label.trim().toUpperCase()));
  for (let i = 0; i < 26; i++) {
    const letter = String.fromCharCode(65 + i);
    if (!taken.has(letter)) return letter;
  }
  let n = existing.length + 1;
  while (taken.has(`P${n}`)) n++;
  return `P${n}`;
}

export interface MountPointsTableProps {
  readOnly: boolean;
  /** Live loads with equal mounts [N], in row order, or null while they cannot be computed. */
  loadsN: readonly number[] | null;
}

/** What the support stiffness is, under the table. */
export const SUPPORT_STIFFNESS_HELP = 'stiffness of the floor or steel under the point; leave it empty for a rigid floor.';

/** Where the mounts sit (plan position and height of their elastic centre), how stiff the support under each is, and the load each takes. */
export function MountPointsTable({ readOnly, loadsN }: MountPointsTableProps) {
  const { values } = useFormikContext<DesignFormValues>();
  const units = useUnits();
  const m = units.label('position');
  const stiffnessUnit = units.label('stiffness');

  return (
    <FieldArray name="mountPoints">
      {({ push, remove }) => (
        <>
          <div className="tc-table-scroll">
            <HTMLTable compact className="tc-table tc-edit-table" aria-label="Mount points">
              <thead>
                <tr>
                  <th scope="col">Label</th>
                  <th scope="col">x ({m})</th>
                  <th scope="col">y ({m})</th>
                  <th scope="col">z ({m})</th>
                  <th scope="col">
                    {INPUT_LABELS.supportStiffness} <br />({stiffnessUnit}, optional)
                  </th>
                  <th scope="col" className="tc-number">
                    Load, <br />
                    equal mounts
                  </th>
                  {readOnly ? null : (
                    <th scope="col">
                      <span className="tc-visually-hidden">Actions</span>
                    </th>
                  )}
                </tr>
              </thead>
              <tbody>
                {values.mountPoints.map((row, index) => {
                  const name = row.label.trim() || `point ${index + 1}`;
                  const field = (key: string) => `mountPoints[${index}].${key}`;
                  const load = loadsN?.[index];
                  return (
                    <tr key={index}>
                      <td className="tc-cell-label">
                        <CellInput name={field('label')} label={`Label of mount point ${index + 1}`} readOnly={readOnly} />
                      </td>
                      {(['x', 'y', 'z'] as const).map((axis) => (
                        <td key={axis}>
                          <CellInput name={field(axis)} label={`${axis} of point ${name}`} readOnly={readOnly} numeric />
                        </td>
                      ))}
                      <td>
                        <CellInput
                          name={field('supportStiffness')}
                          label={`${INPUT_LABELS.supportStiffness} under point ${name}`}
                          readOnly={readOnly}
                          numeric
                          placeholder="rigid"
                        />
                      </td>
                      <td className={`tc-number${load !== undefined && load < 0 ? ' tc-text-danger' : ''}`}>
                        {load === undefined ? '—' : units.format('force', load)}
                      </td>
                      <RemoveRowCell
                        label={`Remove point ${name}`}
                        readOnly={readOnly}
                        disabled={values.mountPoints.length <= 3}
                        onRemove={() => remove(index)}
                      />
                    </tr>
                  );
                })}
              </tbody>
            </HTMLTable>
          </div>
          <p className="tc-muted tc-note" data-testid="support-stiffness-help">
            {INPUT_LABELS.supportStiffness}: {SUPPORT_STIFFNESS_HELP}
          </p>
          <ListError name="mountPoints" />
          {readOnly ? null : (
            <Button
              className="tc-add-row"
              icon={<PlusIcon />}
              variant="outlined"
              text="Add mount point"
              onClick={() => push(blankMountPoint(nextPointLabel(values.mountPoints.map((p) => p.label))))}
            />
          )}
        </>
      )}
    </FieldArray>
  );
}
