import { PlaceholderPage } from '@/components/placeholder-page';

export function Component() {
  return <PlaceholderPage title="Outbox" purpose="The e-mail Tacet has sent, as received by the local mail catcher in demo mode." />;
}
