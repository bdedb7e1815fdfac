import { ArchiveIcon } from '@blueprintjs/icons';

import { ConfirmActionAlert } from '@/components/confirm-action-alert';

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
  return (
    <ConfirmActionAlert
      isOpen={mount !== null}
      icon={<ArchiveIcon />}
      confirmButtonText="Retire"
      pending={retire.isPending}
      onConfirm={() => (mount ? retire.mutateAsync(mount.id) : Promise.resolve())}
      onClose={onClose}
    >
      {mount ? (
        <>
          <p>
            <strong>
              Retire {mount.partNumber} of {mount.supplier.name}?
            </strong>
          </p>
          <p>Selections will no longer offer it. Designs that already chose it keep their figures, and you can restore it at any time.</p>
        </>
      ) : null}
    </ConfirmActionAlert>
  );
}
