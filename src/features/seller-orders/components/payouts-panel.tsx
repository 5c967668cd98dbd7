import { BadgeCheck, Landmark } from 'lucide-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FormAlert, Notice } from '@/components/ui/notice';
import { textLinkClasses } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { useStartOnboarding, type PayoutsReply } from '../api/get-payouts';
import { formatCents } from '@/lib/money';
import { orderRef, transferStateLabels } from '../utils/seller-states';

type Props = {
  data: PayoutsReply;
  /** 'done' or 'refresh' when the seller comes back from the onboarding page. */
  onboardingReturn: string | null;
  redirect?: (url: string) => void;
};

/** Payout setup (connected account and the provider's onboarding page) and the money on its way. */
export function PayoutsPanel({ data, onboardingReturn, redirect }: Props) {
  const onboard = useStartOnboarding({ redirect });
  const [problem, setProblem] = useState<string | null>(null);
  const { payouts, recentTransfers } = data;
  const start = () => {
    setProblem(null);
    onboard.mutate(undefined, { onError: (e) => setProblem(e.message) });
  };

  return (
    <div className="space-y-5">
      <Card className="space-y-4">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 className="flex items-center gap-2 text-lg font-semibold text-ink">
            <Landmark aria-hidden="true" className="size-5 text-drab-700" /> Payout account
          </h2>
          {payouts.payoutsEnabled ? <Badge tone="ok">Payouts on</Badge> : <Badge tone="warn">{payouts.hasAccount ? 'Setup not finished' : 'Not set up'}</Badge>}
        </div>
        {payouts.payoutsEnabled ? (
          <p className="flex items-center gap-2 text-sm text-ink-soft">
            <BadgeCheck aria-hidden="true" className="size-4 text-ok" /> Your share of each sale is sent to your account once the buyer has paid.
          </p>
        ) : (
          <>
            {onboardingReturn === 'done' ? (
              <Notice tone="info" role="status" title="Thanks, we are checking your details">
                The payment provider has not confirmed your account yet. This page shows it as soon as they do.
              </Notice>
            ) : null}
            {onboardingReturn === 'refresh' ? <Notice tone="warn" role="status" title="That setup link ran out. Start again to get a fresh one." /> : null}
            <p className="text-sm text-ink-soft">
              Nothing is paid out until your payout account is set up. Sales you make meanwhile wait and are sent as soon as it is
              {payouts.transfers.waitingForOnboardingCents > 0 ? ` (${formatCents(payouts.transfers.waitingForOnboardingCents)} is waiting now)` : ''}.
            </p>
            <FormAlert message={problem} />
            <Button onClick={start} isLoading={onboard.isPending}>
              {payouts.hasAccount ? 'Continue payout setup' : 'Set up payouts'}
            </Button>
          </>
        )}
        <dl className="grid gap-3 border-t border-rule pt-4 text-sm sm:grid-cols-3">
          <div>
            <dt className="text-label text-ink-muted uppercase">Sent</dt>
            <dd className="text-lg font-semibold tabular-nums">{formatCents(payouts.transfers.paidCents)}</dd>
          </div>
          <div>
            <dt className="text-label text-ink-muted uppercase">Being sent</dt>
            <dd className="text-lg font-semibold tabular-nums">{formatCents(payouts.transfers.pendingCents)}</dd>
          </div>
          <div>
            <dt className="text-label text-ink-muted uppercase">Waiting for setup</dt>
            <dd className="text-lg font-semibold tabular-nums">{formatCents(payouts.transfers.waitingForOnboardingCents)}</dd>
          </div>
        </dl>
      </Card>
      {recentTransfers.length > 0 ? (
        <Card className="space-y-3">
          <h2 className="text-lg font-semibold text-ink">Latest payouts</h2>
          <ul className="divide-y divide-rule text-sm">
            {recentTransfers.slice(0, 8).map((t) => (
              <li key={t.id} className="grid grid-cols-[7rem_1fr_auto] items-center gap-3 py-2 sm:grid-cols-[8rem_10rem_1fr_auto]">
                <span className="whitespace-nowrap">{formatDate(t.createdAt)}</span>
                <Link to={paths.sellerOrders.detail.getHref(t.subOrderId)} className={`${textLinkClasses} font-mono`}>
                  {orderRef(t.orderId)}
                </Link>
                <span className="hidden text-ink-soft sm:block">{transferStateLabels[t.state]}</span>
                <span className="font-medium tabular-nums">{formatCents(t.amountCents)}</span>
              </li>
            ))}
          </ul>
        </Card>
      ) : null}
    </div>
  );
}
