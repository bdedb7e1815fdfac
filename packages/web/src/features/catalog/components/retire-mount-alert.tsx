import { Alert } from '@blueprintjs/core';
import { ArchiveIcon } from '@blueprintjs/icons';
import { useState } from 'react';

import { errorMessage } from '@/lib/api-errors';

import { useRetireMount } from '../api/retire-mount';
import type { Mount } from '../types';

export interface RetireMountAlertProps {
  /** The mount to retire; `null` closes the alert. */
  mount: Mount | null;
  onClose: () => void;
}

/** Asks before retiring: new selections stop offering the mount; nothing is deleted. */
export function RetireMountAlert({ mount, onClose }: RetireMountAlertProps) {
  const retire = useRetireMount();
  const [failure, setFailure] = useState<string | null>(null);

  const close = () => {
    setFailure(null);
    onClose();
  };

  const confirm = async () => {
    if (!mount) return;
    setFailure(null);
    try {
      await retire.mutateAsync(mount.id);
      close();
    } catch (error) {
      setFailure(errorMessage(error));
    }
  };

  return (
    <Alert
      isOpen={mount !== null}
      intent="danger"
      icon={<ArchiveIcon />}
      confirmButtonText="Retire"
      cancelButtonText="Cancel"
      loading={retire.isPending}
      onConfirm={() => void confirm()}
      onCancel={close}
    >
      {mount ? (
        <>
          <p>
            <strong>
              Retire {mount.partNumber} of {mount.supplier.name}?
            </strong>
          </p>
          <p>
            Selections will no longer offer it. Designs that already chose it keep their figures, and you can restore it
            at any time.
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
