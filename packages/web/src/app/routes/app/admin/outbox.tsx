import { OutboxPage } from '@/features/outbox/components/outbox-page';

export function Component() {
  return <OutboxPage />;
}
