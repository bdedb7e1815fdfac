import { UsersAdmin } from '@/features/users/components/users-admin';

export function Component() {
  return <UsersAdmin />;
}
