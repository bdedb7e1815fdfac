import { PlaceholderPage } from '@/components/placeholder-page';

export function Component() {
  return (
    <PlaceholderPage
      title="Purchasing"
      purpose="Bills of materials, calculation reports, requests for quotation and order status for released designs."
    />
  );
}
