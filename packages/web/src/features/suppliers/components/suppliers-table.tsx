import { Button, HTMLTable, Tag } from '@blueprintjs/core';
import { EditIcon } from '@blueprintjs/icons';

import { formatNumber } from '@/lib/units';

import type { Supplier } from '../types';

import './suppliers.css';

export interface SuppliersTableProps {
  suppliers: readonly Supplier[];
  /** Absent for roles that may only read. */
  onEdit?: (supplier: Supplier) => void;
}

export function SuppliersTable({ suppliers, onEdit }: SuppliersTableProps) {
  return (
    <HTMLTable className="tc-table" striped aria-label="Suppliers">
      <thead>
        <tr>
          <th scope="col">Name</th>
          <th scope="col">Contact email</th>
          <th scope="col">Phone</th>
          <th scope="col" className="tc-number">
            Mounts
          </th>
          <th scope="col">Status</th>
          {onEdit ? (
            <th scope="col">
              <span className="tc-visually-hidden">Actions</span>
            </th>
          ) : null}
        </tr>
      </thead>
      <tbody>
        {suppliers.map((supplier) => (
          <tr key={supplier.id} className={supplier.active ? undefined : 'tc-row-inactive'}>
            <td>
              {supplier.name}
              {supplier.notes ? <div className="tc-muted tc-supplier-notes">{supplier.notes}</div> : null}
            </td>
            <td>{supplier.contactEmail ? <a href={`mailto:${supplier.contactEmail}`}>{supplier.contactEmail}</a> : '—'}</td>
            <td>{supplier.phone ?? '—'}</td>
            <td className="tc-number">{formatNumber(supplier.mountCount, 0)}</td>
            <td>
              {supplier.active ? (
                <Tag minimal intent="success">
                  Active
                </Tag>
              ) : (
                <Tag minimal>Inactive</Tag>
              )}
            </td>
            {onEdit ? (
              <td className="tc-table-actions">
                <Button
                  variant="minimal"
                  icon={<EditIcon />}
                  aria-label={`Edit ${supplier.name}`}
                  title="Edit"
                  onClick={() => onEdit(supplier)}
                />
              </td>
            ) : null}
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}
