import { ComingSoon } from '@/components/layouts/coming-soon';

export function SellerDeskRoute() {
  return (
    <ComingSoon title="Seller desk" eyebrow="Your stock">
      <p>List stock one by one or from a spreadsheet, answer orders, and follow your payouts.</p>
    </ComingSoon>
  );
}
