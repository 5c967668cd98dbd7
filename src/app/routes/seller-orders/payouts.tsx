import { ChevronLeft, ChevronRight } from 'lucide-react';
import { Link, useSearchParams } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Button, buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Skeleton } from '@/components/ui/skeleton';
import { paths } from '@/config/paths';
import { usePayouts } from '@/features/seller-orders/api/get-payouts';
import { useStatement } from '@/features/seller-orders/api/get-statement';
import { PayoutsPanel } from '@/features/seller-orders/components/payouts-panel';
import { StatementTable } from '@/features/seller-orders/components/statement-table';
import { isMonth, monthOf, shiftMonth } from '@/features/seller-orders/utils/month';

export function SellerPayoutsRoute() {
  const [params, setParams] = useSearchParams();
  const thisMonth = monthOf(new Date());
  const raw = params.get('month');
  const month = isMonth(raw) ? raw : thisMonth;
  const payouts = usePayouts();
  const statement = useStatement(month);

  const setMonth = (m: string) =>
    setParams(
      (p) => {
        const next = new URLSearchParams(p);
        next.set('month', m);
        next.delete('onboarding');
        return next;
      },
      { replace: true },
    );

  return (
    <ContentLayout
      title="Payouts and statements"
      eyebrow="Seller desk"
      description="Where your money stands, and a statement per month of sales, fees, shipping and refunds."
      actions={
        <Link to={paths.sellerOrders.list.getHref()} className={buttonClasses('secondary', 'sm')}>
          Orders to fulfil
        </Link>
      }
    >
      <div className="space-y-8">
        {payouts.isPending ? (
          <PageSkeleton label="Loading your payouts" />
        ) : payouts.isError ? (
          <Notice tone="danger" role="alert" title="Payouts could not be loaded">
            {payouts.error.message}
          </Notice>
        ) : (
          <PayoutsPanel data={payouts.data} onboardingReturn={params.get('onboarding')} />
        )}

        <section aria-label="Monthly statement" className="space-y-4">
          <div className="flex flex-wrap items-end gap-3">
            <Button variant="secondary" size="sm" aria-label="Previous month" onClick={() => setMonth(shiftMonth(month, -1))} icon={<ChevronLeft aria-hidden="true" className="size-4" />} />
            <div>
              <label htmlFor="statement-month" className="mb-1 block text-sm font-semibold text-ink">
                Month
              </label>
              <input
                id="statement-month"
                type="month"
                value={month}
                max={thisMonth}
                onChange={(e) => (isMonth(e.target.value) ? setMonth(e.target.value) : undefined)}
                className="h-8 rounded-tag border border-rule-strong bg-paper-raised px-2 text-sm text-ink"
              />
            </div>
            <Button
              variant="secondary"
              size="sm"
              aria-label="Next month"
              disabled={month >= thisMonth}
              onClick={() => setMonth(shiftMonth(month, 1))}
              icon={<ChevronRight aria-hidden="true" className="size-4" />}
            />
          </div>
          {statement.isPending ? (
            <Skeleton className="h-48" />
          ) : statement.isError ? (
            <Notice tone="danger" role="alert" title="The statement could not be loaded">
              {statement.error.message}
            </Notice>
          ) : (
            <StatementTable statement={statement.data} />
          )}
        </section>
      </div>
    </ContentLayout>
  );
}
