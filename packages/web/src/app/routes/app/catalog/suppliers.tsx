import { SuppliersAdmin } from '@/features/suppliers/components/suppliers-admin';
import { useUser } from '@/lib/auth';
import { canWriteCatalog } from '@/lib/authorization';

export function Component() {
  const user = useUser();
  return <SuppliersAdmin canWrite={canWriteCatalog(user.role)} />;
}
