import { ComingSoon } from '@/components/layouts/coming-soon';

export function OrdersRoute() {
  return (
    <ComingSoon title="Orders">
      <p>Your orders, their shipments and their receipts.</p>
    </ComingSoon>
  );
}
