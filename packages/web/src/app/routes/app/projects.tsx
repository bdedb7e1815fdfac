import { PlaceholderPage } from '@/components/placeholder-page';

export function Component() {
  return <PlaceholderPage title="Projects" purpose="Projects hold the designs for each machine, their revisions and their sign-off." />;
}
