import { Alert } from '@blueprintjs/core';
import { DisableIcon } from '@blueprintjs/icons';
import { useState } from 'react';

import { errorMessage } from '@/lib/api-errors';

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
  const [failure, setFailure] = useState<string | null>(null);

  const close = () => {
    setFailure(null);
    onClose();
  };

  const confirm = async () => {
    if (!user) return;
    setFailure(null);
    try {
      await deactivate.mutateAsync(user.id);
      close();
    } catch (error) {
      setFailure(errorMessage(error));
    }
  };

  return (
    <Alert
      isOpen={user !== null}
      intent="danger"
      icon={<DisableIcon />}
      confirmButtonText="Deactivate"
      cancelButtonText="Cancel"
      loading={deactivate.isPending}
      onConfirm={() => void confirm()}
      onCancel={close}
    >
      {user ? (
        <>
          <p>
            <strong>Deactivate {user.name}?</strong>
          </p>
          <p>
            {user.email} will no longer be able to sign in. Their projects, designs and history stay as they are, and
            an administrator can make the account active again.
          </p>
          {failure ? (
            <p className="tc-alert-error" role="alert">
              {failure}
            </p>
          ) : null}
        </>
      ) : null}
    </Alert>
  );
}
