import { useMemo } from 'react';

import { MountCatalog } from '@/features/catalog/components/mount-catalog';
import type { SupplierOption } from '@/features/catalog/types';
import { useSuppliers } from '@/features/suppliers/api/get-suppliers';
import { useUser } from '@/lib/auth';
import { canWriteCatalog } from '@/lib/authorization';

/** The catalog's mounts, with the suppliers list composed in for the filter and the mount form. */
export function Component() {
  const user = useUser();
  const suppliers = useSuppliers();
  const options = useMemo<SupplierOption[]>(
    () => (suppliers.data ?? []).map(({ id, name, active }) => ({ id, name, active })),
    [suppliers.data],
  );
  return <MountCatalog suppliers={options} canWrite={canWriteCatalog(user.role)} />;
}
