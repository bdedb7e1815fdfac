import { Alert, type AlertProps, type Intent } from '@blueprintjs/core';
import { useState, type ReactNode } from 'react';

import { errorMessage } from '@/lib/api-errors';

export interface ConfirmActionAlertProps {
  isOpen: boolean;
  icon: AlertProps['icon'];
  confirmButtonText: string;
  intent?: Intent;
  /** True while the action runs (shows a spinner on the confirm button). */
  pending: boolean;
  /** The action; when it throws, the alert stays open and says why in words. */
  onConfirm: () => Promise<unknown>;
  onClose: () => void;
  children: ReactNode;
}

/** Asks before an action, runs it, closes on success and shows the server's reason on failure. */
export function ConfirmActionAlert({
  isOpen,
  icon,
  confirmButtonText,
  intent = 'danger',
  pending,
  onConfirm,
  onClose,
  children,
}: ConfirmActionAlertProps) {
  const [failure, setFailure] = useState<string | null>(null);

  const close = () => {
    setFailure(null);
    onClose();
  };

  const confirm = async () => {
    setFailure(null);
    try {
      await onConfirm();
      close();
    } catch (error) {
      setFailure(errorMessage(error));
    }
  };

  return (
    <Alert
      isOpen={isOpen}
      intent={intent}
      icon={icon}
      confirmButtonText={confirmButtonText}
      cancelButtonText="Cancel"
      loading={pending}
      onConfirm={() => void confirm()}
      onCancel={close}
    >
      {isOpen ? (
        <>
          {children}
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
