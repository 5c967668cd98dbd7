import { ComingSoon } from '@/components/layouts/coming-soon';

export function CartRoute() {
  return (
    <ComingSoon title="Cart">
      <p>One checkout across every seller you buy from.</p>
    </ComingSoon>
  );
}
