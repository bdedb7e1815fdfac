import { HTMLTable, Tag } from '@blueprintjs/core';

import { formatNumber, useUnits } from '@/lib/units';

import type { ImportPreviewRow } from '../../types';
import { dampingText, displayNumber } from '../../utils/mount-display';
import { mountTypeLabel } from '../../utils/mount-labels';

export interface ImportPreviewTableProps {
  rows: readonly ImportPreviewRow[];
  accepted: number;
}

/** The accepted rows as they will be stored (the first hundred), in the user's units. */
export function ImportPreviewTable({ rows, accepted }: ImportPreviewTableProps) {
  const units = useUnits();
  if (rows.length === 0) return <p className="tc-muted">No row of this file can be imported.</p>;
  return (
    <>
      <div className="tc-import-scroll">
        <HTMLTable className="tc-table" compact striped aria-label="Rows that will be imported">
          <thead>
            <tr>
              <th scope="col" className="tc-number">
                Row
              </th>
              <th scope="col">Will</th>
              <th scope="col">Supplier</th>
              <th scope="col">Part number</th>
              <th scope="col">Type</th>
              <th scope="col" className="tc-number">
                Rated load ({units.label('force')})
              </th>
              <th scope="col" className="tc-number">
                Stiffness ({units.label('stiffness')})
              </th>
              <th scope="col">Damping</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row, index) => (
              <tr key={`${row.supplierName}-${row.partNumber}-${index}`}>
                <td className="tc-number">{row.row !== undefined ? formatNumber(row.row, 0) : '—'}</td>
                <td>
                  {row.action === 'create' ? (
                    <Tag minimal intent="success">
                      Add
                    </Tag>
                  ) : (
                    <Tag minimal intent="primary">
                      Update
                    </Tag>
                  )}
                </td>
                <td>{row.supplierName}</td>
                <td>{row.partNumber}</td>
                <td>{mountTypeLabel(row.mountType)}</td>
                <td className="tc-number">{displayNumber(units, 'force', row.ratedLoadN)}</td>
                <td className="tc-number">{displayNumber(units, 'stiffness', row.verticalStiffnessNPerM)}</td>
                <td>{dampingText({ dampingRatio: row.dampingRatio ?? null, lossFactor: row.lossFactor ?? null })}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </div>
      {accepted > rows.length ? (
        <p className="tc-muted tc-import-note">
          The first {formatNumber(rows.length, 0)} of {formatNumber(accepted, 0)} accepted rows.
        </p>
      ) : null}
    </>
  );
}
