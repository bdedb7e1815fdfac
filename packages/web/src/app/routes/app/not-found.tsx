import { NotFound } from '@/components/errors/not-found';

export function Component() {
  return <NotFound />;
}
