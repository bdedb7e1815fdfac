import { Button, Callout } from '@blueprintjs/core';
import { PlusIcon } from '@blueprintjs/icons';
import { useState } from 'react';

import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { errorMessage } from '@/lib/api-errors';
import { useUser } from '@/lib/auth';

import { useUsers } from '../api/get-users';
import type { User } from '../types';
import { CreateUserDialog } from './create-user-dialog';
import { DeactivateUserAlert } from './deactivate-user-alert';
import { EditUserDialog } from './edit-user-dialog';
import { TemporaryPasswordDialog } from './temporary-password-dialog';
import { UsersTable } from './users-table';

function summary(users: readonly User[]): string {
  const active = users.filter((user) => user.active).length;
  const people = users.length === 1 ? '1 person' : `${users.length} people`;
  return `${people}, ${active} active`;
}

/** The People page: every account, who may do what, and the way to add or deactivate one. */
export function UsersAdmin() {
  const currentUser = useUser();
  const users = useUsers();
  const [creating, setCreating] = useState(false);
  const [editing, setEditing] = useState<User | null>(null);
  const [deactivating, setDeactivating] = useState<User | null>(null);
  const [resetting, setResetting] = useState<User | null>(null);

  return (
    <>
      <PageHeader
        title="People"
        description="Everyone who can sign in to Tacet, and the role that decides what each person may do."
        actions={<Button intent="primary" icon={<PlusIcon />} text="Add person" onClick={() => setCreating(true)} />}
      />
      <div className="tc-panel">
        {users.isPending ? <PageLoader label="Loading people" /> : null}
        {users.isError ? (
          <Callout intent="danger" title="The list of people could not be loaded">
            <p>{errorMessage(users.error)}</p>
            <Button text="Try again" onClick={() => void users.refetch()} />
          </Callout>
        ) : null}
        {users.data ? (
          <>
            <p className="tc-muted tc-table-summary">{summary(users.data)}</p>
            <UsersTable
              users={users.data}
              currentUserId={currentUser.id}
              onEdit={setEditing}
              onDeactivate={setDeactivating}
              onTemporaryPassword={setResetting}
            />
          </>
        ) : null}
      </div>
      <CreateUserDialog isOpen={creating} onClose={() => setCreating(false)} />
      <EditUserDialog user={editing} isSelf={editing?.id === currentUser.id} onClose={() => setEditing(null)} />
      <DeactivateUserAlert user={deactivating} onClose={() => setDeactivating(null)} />
      {resetting ? <TemporaryPasswordDialog user={resetting} onClose={() => setResetting(null)} /> : null}
    </>
  );
}
