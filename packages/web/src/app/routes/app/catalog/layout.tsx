import { Outlet } from 'react-router-dom';

import { CatalogSectionNav } from '@/features/catalog/components/catalog-section-nav';
import { useUser } from '@/lib/auth';
import { canWriteCatalog } from '@/lib/authorization';

/** The catalog area: its section links above whichever catalog page is open. */
export function Component() {
  const user = useUser();
  return (
    <>
      <CatalogSectionNav canImport={canWriteCatalog(user.role)} />
      <Outlet />
    </>
  );
}
