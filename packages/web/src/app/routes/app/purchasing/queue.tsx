import { PurchasingQueue } from '@/features/purchasing/components/purchasing-queue';

/** Purchasing: the released designs to buy (purchaser, admin). */
export function Component() {
  return <PurchasingQueue />;
}
