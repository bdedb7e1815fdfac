import { AccountSettings } from '@/features/account/components/account-settings';

export function Component() {
  return <AccountSettings />;
}
