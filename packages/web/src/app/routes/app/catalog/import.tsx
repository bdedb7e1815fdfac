import { useQueryClient } from '@tanstack/react-query';

import { Forbidden } from '@/components/errors/forbidden';
import { CatalogImport } from '@/features/catalog/components/import/catalog-import';
import { suppliersQueryKey } from '@/features/suppliers/api/get-suppliers';
import { useUser } from '@/lib/auth';
import { canWriteCatalog } from '@/lib/authorization';

/** CSV import of the catalog: catalog managers and admins only (the server enforces the same). */
export function Component() {
  const user = useUser();
  const queryClient = useQueryClient();
  if (!canWriteCatalog(user.role)) return <Forbidden />;
  // An import can name suppliers for the first time: refresh the supplier list too.
  return <CatalogImport onImported={() => void queryClient.invalidateQueries({ queryKey: suppliersQueryKey })} />;
}
