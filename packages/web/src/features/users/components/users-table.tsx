import { Button, HTMLTable, Tag } from '@blueprintjs/core';
import { DisableIcon, EditIcon, KeyIcon } from '@blueprintjs/icons';

import { ROLE_LABELS } from '@/lib/authorization';

import type { User } from '../types';

const UNIT_LABELS = { SI: 'SI', US: 'US customary' } as const;

export interface UsersTableProps {
  users: readonly User[];
  currentUserId: number;
  onEdit: (user: User) => void;
  onDeactivate: (user: User) => void;
  onTemporaryPassword: (user: User) => void;
}

export function UsersTable({ users, currentUserId, onEdit, onDeactivate, onTemporaryPassword }: UsersTableProps) {
  return (
    <HTMLTable className="tc-table" striped aria-label="People">
      <thead>
        <tr>
          <th scope="col">Email</th>
          <th scope="col">Name</th>
          <th scope="col">Role</th>
          <th scope="col">Units</th>
          <th scope="col">Status</th>
          <th scope="col">
            <span className="tc-visually-hidden">Actions</span>
          </th>
        </tr>
      </thead>
      <tbody>
        {users.map((user) => {
          const isSelf = user.id === currentUserId;
          return (
            <tr key={user.id} className={user.active ? undefined : 'tc-row-inactive'}>
              <td>{user.email}</td>
              <td>
                {user.name}
                {isSelf ? <span className="tc-muted"> (you)</span> : null}
              </td>
              <td>{ROLE_LABELS[user.role] ?? user.role}</td>
              <td>{UNIT_LABELS[user.unitSystem] ?? user.unitSystem}</td>
              <td>
                {user.active ? (
                  <Tag minimal intent="success">
                    Active
                  </Tag>
                ) : (
                  <Tag minimal>Deactivated</Tag>
                )}
                {user.mustChangePassword ? (
                  <Tag minimal intent="warning" className="tc-inline-tag">
                    Temporary password
                  </Tag>
                ) : null}
              </td>
              <td className="tc-table-actions">
                <Button variant="minimal" icon={<EditIcon />} aria-label={`Edit ${user.name}`} title="Edit" onClick={() => onEdit(user)} />
                {user.active && !isSelf ? (
                  <Button
                    variant="minimal"
                    icon={<KeyIcon />}
                    aria-label={`Set a temporary password for ${user.name}`}
                    title="Set a temporary password"
                    onClick={() => onTemporaryPassword(user)}
                  />
                ) : null}
                {user.active && !isSelf ? (
                  <Button
                    variant="minimal"
                    intent="danger"
                    icon={<DisableIcon />}
                    aria-label={`Deactivate ${user.name}`}
                    title="Deactivate"
                    onClick={() => onDeactivate(user)}
                  />
                ) : null}
              </td>
            </tr>
          );
        })}
      </tbody>
    </HTMLTable>
  );
}
