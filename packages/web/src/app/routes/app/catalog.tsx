import { PlaceholderPage } from '@/components/placeholder-page';

export function Component() {
  return (
    <PlaceholderPage title="Catalog" purpose="The mounts of every supplier in one place, with their ratings, stiffness and damping." />
  );
}
