import { Button, Callout, HTMLSelect, HTMLTable } from '@blueprintjs/core';
import { LightbulbIcon, PlusIcon } from '@blueprintjs/icons';
import { FieldArray, useField, useFormikContext } from 'formik';
import { useState } from 'react';

import { useUnits } from '@/lib/units';
import type { DesignComponent } from '@/types/design-api';
import { SOURCE_AXES } from '@/types/model2-api';

import type { DesignFormValues } from '../schemas/design-form';
import { blankSource, proposeSources, ROTATING_SHARE, SOURCE_LIMITS } from '../schemas/sources-form';
import { CellInput, ListError, RemoveRowCell } from './form-cells';

const KIND_OPTIONS = [
  { value: 'unbalance', label: 'Unbalance' },
  { value: 'force', label: 'Force' },
];

const AXIS_OPTIONS = SOURCE_AXES.map((axis) => ({ value: axis, label: axis }));

function CellSelect({
  name,
  label,
  options,
  readOnly,
  narrow = false,
}: {
  name: string;
  label: string;
  options: { value: string; label: string }[];
  readOnly: boolean;
  narrow?: boolean;
}) {
  const [field] = useField<string>(name);
  return (
    <HTMLSelect
      name={field.name}
      value={field.value}
      onChange={field.onChange}
      onBlur={field.onBlur}
      aria-label={label}
      options={options}
      disabled={readOnly}
      minimal
      className={narrow ? 'tc-cell-select tc-cell-select--axis' : 'tc-cell-select'}
    />
  );
}

function NotUsed() {
  return (
    <span className="tc-muted" aria-label="not used for this kind">
      —
    </span>
  );
}

export interface SourcesTableProps {
  readOnly: boolean;
  /** The equipment in SI (null while incomplete), for the proposal. */
  components: readonly DesignComponent[] | null;
}

/**
 * The disturbing sources: where each acts, its kind, order or fixed frequency and size. An
 * unbalance rotates in the plane normal to its shaft axis; a force acts along its axis. The
 * proposal fills rows from the equipment's pumps, fans and motors.
 */
export function SourcesTable({ readOnly, components }: SourcesTableProps) {
  const { values, setFieldValue } = useFormikContext<DesignFormValues>();
  const units = useUnits();
  const [proposalNote, setProposalNote] = useState<string | null>(null);
  const rows = values.operating.sources;
  const m = units.label('position');

  const propose = () => {
    if (!components || components.length === 0) {
      setProposalNote('Complete the equipment first: the proposal reads its components.');
      return;
    }
    const proposed = proposeSources(components, units);
    if (proposed.length === 0) {
      setProposalNote('No pump, fan or motor among the components: add the sources by hand.');
      return;
    }
    const taken = new Set(rows.map((row) => row.label.trim()));
    const fresh = proposed.filter((row) => !taken.has(row.label)).slice(0, SOURCE_LIMITS.sources - rows.length);
    void setFieldValue('operating.sources', [...rows, ...fresh]);
    setProposalNote(
      fresh.length === 0
        ? 'The equipment proposes nothing new: its sources are already listed.'
        : `Proposed ${fresh.length === 1 ? 'one source' : `${fresh.length} sources`} at the components' centres of gravity, shaft along x, balance grade G 6.3. ` +
            `Rotor masses are first guesses (about ${ROTATING_SHARE.impeller * 100} % of a pump or fan, ${ROTATING_SHARE.rotor * 100} % of a motor): replace them with the maker's figures.`,
    );
  };

  return (
    <FieldArray name="operating.sources">
      {({ push, remove }) => (
        <>
          {rows.length === 0 ? (
            <p className="tc-muted tc-note" data-testid="no-sources">
              No sources: the machine is judged with a vertical force through its centre of gravity at every disturbing frequency.
            </p>
          ) : (
            <div className="tc-table-scroll">
              <HTMLTable compact className="tc-table tc-edit-table tc-sources-table" aria-label="Sources">
                <thead>
                  <tr>
                    <th scope="col" rowSpan={2}>
                      Source
                    </th>
                    <th scope="col" rowSpan={2}>
                      Kind
                    </th>
                    <th scope="colgroup" colSpan={3} className="tc-group-head">
                      Acts at ({m})
                    </th>
                    <th scope="col" rowSpan={2} title="Shaft axis of an unbalance; line of action of a force">
                      Axis
                    </th>
                    <th scope="col" rowSpan={2} className="tc-number" title="Multiple of the shaft speed">
                      Order
                    </th>
                    <th scope="col" rowSpan={2} className="tc-number" title="A fixed frequency instead of an order">
                      Fixed (Hz)
                    </th>
                    <th scope="colgroup" colSpan={2} className="tc-group-head">
                      Size
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
                    <th scope="col" className="tc-number tc-wrap-head" title="Rotor mass of an unbalance; amplitude of a force">
                      Rotor ({units.label('mass')}) or force ({units.label('force')})
                    </th>
                    <th scope="col" className="tc-number">
                      Grade G (mm/s)
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {rows.map((row, index) => {
                    const name = row.label.trim() || `source ${index + 1}`;
                    const field = (key: string) => `operating.sources[${index}].${key}`;
                    const unbalance = row.kind === 'unbalance';
                    return (
                      <tr key={index} data-testid="source-row">
                        <td className="tc-cell-name">
                          <CellInput name={field('label')} label={`Name of source ${index + 1}`} readOnly={readOnly} />
                        </td>
                        <td>
                          <CellSelect name={field('kind')} label={`Kind of ${name}`} options={KIND_OPTIONS} readOnly={readOnly} />
                        </td>
                        {(['x', 'y', 'z'] as const).map((axis) => (
                          <td key={axis}>
                            <CellInput name={field(axis)} label={`${axis} of ${name}`} readOnly={readOnly} numeric />
                          </td>
                        ))}
                        <td>
                          <CellSelect name={field('axis')} label={`Axis of ${name}`} options={AXIS_OPTIONS} readOnly={readOnly} narrow />
                        </td>
                        <td>
                          <CellInput name={field('order')} label={`Order of ${name}`} readOnly={readOnly} numeric placeholder="1" />
                        </td>
                        <td>
                          {unbalance ? (
                            <NotUsed />
                          ) : (
                            <CellInput
                              name={field('frequencyHz')}
                              label={`Fixed frequency of ${name}`}
                              readOnly={readOnly}
                              numeric
                              placeholder="—"
                            />
                          )}
                        </td>
                        <td>
                          {unbalance ? (
                            <CellInput name={field('rotorMass')} label={`Rotor mass of ${name}`} readOnly={readOnly} numeric />
                          ) : (
                            <CellInput name={field('amplitude')} label={`Force of ${name}`} readOnly={readOnly} numeric />
                          )}
                        </td>
                        <td>
                          {unbalance ? (
                            <CellInput name={field('balanceGrade')} label={`Balance grade of ${name}`} readOnly={readOnly} numeric />
                          ) : (
                            <NotUsed />
                          )}
                        </td>
                        <RemoveRowCell label={`Remove ${name}`} readOnly={readOnly} onRemove={() => remove(index)} />
                      </tr>
                    );
                  })}
                </tbody>
              </HTMLTable>
            </div>
          )}
          <ListError name="operating.sources" />
          {readOnly ? null : (
            <div className="tc-row-actions">
              <Button
                className="tc-add-row"
                icon={<PlusIcon />}
                variant="outlined"
                text="Add source"
                disabled={rows.length >= SOURCE_LIMITS.sources}
                onClick={() => push(blankSource(`Source ${rows.length + 1}`))}
              />
              <Button
                className="tc-add-row"
                icon={<LightbulbIcon />}
                variant="outlined"
                text="Propose from the equipment"
                disabled={rows.length >= SOURCE_LIMITS.sources}
                onClick={propose}
              />
            </div>
          )}
          {proposalNote ? (
            <Callout className="tc-note" role="status" data-testid="proposal-note">
              {proposalNote}
            </Callout>
          ) : null}
        </>
      )}
    </FieldArray>
  );
}
