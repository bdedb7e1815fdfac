import { DisableIcon } from '@blueprintjs/icons';

import { ConfirmActionAlert } from '@/components/confirm-action-alert';

import { useDeactivateUser } from '../api/deactivate-user';
import type { User } from '../types';

export interface DeactivateUserAlertProps {
  /** The account to deactivate; `null` closes the alert. */
  user: User | null;
  onClose: () => void;
}

/** Asks before deactivating: the person can no longer sign in, but everything they did stays. */
export function DeactivateUserAlert({ user, onClose }: DeactivateUserAlertProps) {
  const deactivate = useDeactivateUser();
  return (
    <ConfirmActionAlert
      isOpen={user !== null}
      icon={<DisableIcon />}
      confirmButtonText="Deactivate"
      pending={deactivate.isPending}
      onConfirm={() => (user ? deactivate.mutateAsync(user.id) : Promise.resolve())}
      onClose={onClose}
    >
      {user ? (
        <>
          <p>
            <strong>Deactivate {user.name}?</strong>
          </p>
          <p>
            {user.email} will no longer be able to sign in. Their projects, designs and history stay as they are, and an administrator can
            make the account active again.
          </p>
        </>
      ) : null}
    </ConfirmActionAlert>
  );
}
