import { ShoppingCart } from 'lucide-react';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { toast } from 'sonner';
import { conditionPolicyLabels, type PlanDestination } from '@shared/schemas/garage';
import { Badge } from '@/components/ui/badge';
import { Button, buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useBuildPlan } from '../api/build-plan';
import type { SourcingPlan, ToCartResult } from '../api/garage-schemas';
import { usePlanToCart } from '../api/plan-to-cart';
import { conditionShortLabels, formatCents, unfilledReasonLabels } from '../utils/garage-format';
import { SelectField } from '@/components/ui/form-field';

// Where the plan ships to. The demo sellers ship within North America; others simply show as unfilled.
const destinations = [
  { value: 'US', label: 'United States' },
  { value: 'CA', label: 'Canada' },
  { value: 'GB', label: 'United Kingdom' },
  { value: 'AU', label: 'Australia' },
  { value: 'DE', label: 'Germany' },
  { value: 'NL', label: 'Netherlands' },
  { value: 'FR', label: 'France' },
  { value: 'pickup', label: 'Pickup at a show (no shipping)' },
];

function toDestination(value: string): PlanDestination {
  return value === 'pickup' ? { pickup: true } : { country: value };
}

/** The gap between this plan and a lower bound on any plan's cost: how sure we are it is the cheapest. */
export function PlanGap({ plan }: { plan: SourcingPlan }) {
  return (
    <p className="text-sm text-ink-soft" data-testid="plan-gap">
      {plan.optimal ? (
        <>
          <span className="font-semibold text-ok">Proven cheapest</span>: the search ran to the end; no plan filling as much costs less.
        </>
      ) : (
        <>
          <span className="font-semibold text-warn">Best found</span> within the search budget.
        </>
      )}{' '}
      Lower bound {formatCents(plan.lowerBoundCents)}; gap {formatCents(plan.gapCents)} ({plan.gapPercent.toFixed(2)}%).
    </p>
  );
}

/** Plan result: sellers with their items and shipping, totals, the gap, and the needs it cannot fill. */
export function PlanView({ plan }: { plan: SourcingPlan }) {
  const { sellers } = plan.plan;
  return (
    <div className="space-y-5">
      <section aria-label="Plan totals" className="grid gap-3 rounded-card border border-rule bg-paper-raised p-4 shadow-card sm:grid-cols-[repeat(3,auto)_minmax(0,1fr)] sm:items-center sm:gap-6">
        <div>
          <p className="text-label text-drab-700 uppercase">Items</p>
          <p className="font-mono text-lg text-ink">{formatCents(plan.plan.itemsCents)}</p>
        </div>
        <div>
          <p className="text-label text-drab-700 uppercase">Shipping</p>
          <p className="font-mono text-lg text-ink">{formatCents(plan.plan.shippingCents)}</p>
        </div>
        <div>
          <p className="text-label text-drab-700 uppercase">Landed total</p>
          <p className="font-mono text-2xl font-bold text-ink">{formatCents(plan.plan.totalCents)}</p>
        </div>
        <PlanGap plan={plan} />
      </section>

      {sellers.length === 0 ? (
        <Notice tone="warn" title="No listing can fill any need right now" />
      ) : (
        sellers.map((s) => (
          <section key={s.seller.id} aria-label={`From ${s.seller.name}`} className="rounded-card border border-rule bg-paper-raised shadow-card">
            <div className="flex flex-wrap items-baseline justify-between gap-2 border-b border-rule px-4 py-3">
              <h3 className="text-base font-semibold text-ink">{s.seller.name}</h3>
              <p className="text-sm text-ink-soft">
                Items {formatCents(s.itemsCents)} · shipping {formatCents(s.shippingCents)}
              </p>
            </div>
            <div className="overflow-x-auto">
              <table className="w-full min-w-[40rem] text-left text-sm">
                <thead className="text-label text-ink-soft uppercase">
                  <tr>
                    <th scope="col" className="px-4 py-2">
                      Listing
                    </th>
                    <th scope="col" className="px-4 py-2">
                      For
                    </th>
                    <th scope="col" className="px-4 py-2">
                      Condition
                    </th>
                    <th scope="col" className="px-4 py-2 text-right">
                      Qty
                    </th>
                    <th scope="col" className="px-4 py-2 text-right">
                      Each
                    </th>
                    <th scope="col" className="px-4 py-2 text-right">
                      Line
                    </th>
                  </tr>
                </thead>
                <tbody className="divide-y divide-rule">
                  {s.items.map((i) => (
                    <tr key={`${i.needId}/${i.listingId}`} className="align-top">
                      <td className="px-4 py-2">
                        <Link to={paths.listing.getHref(i.listingId)} className="font-medium text-patina-700 hover:underline">
                          {i.title}
                        </Link>
                      </td>
                      <td className="px-4 py-2 text-ink-soft">
                        <span className="font-mono">{i.forPart.primaryNumber ?? i.forPart.name}</span>
                        {i.substitute ? (
                          <span className="block text-xs text-info">
                            Fills it as {i.partNumber ?? 'a replacement'} ({i.substitute.interchange.replace('_', '-')}
                            {i.substitute.conditions.length ? `; ${i.substitute.conditions.join('; ')}` : ''})
                          </span>
                        ) : null}
                      </td>
                      <td className="px-4 py-2 text-ink-soft">{conditionShortLabels[i.condition] ?? i.condition}</td>
                      <td className="px-4 py-2 text-right font-mono">{i.quantity}</td>
                      <td className="px-4 py-2 text-right font-mono">{formatCents(i.unitPriceCents)}</td>
                      <td className="px-4 py-2 text-right font-mono">{formatCents(i.lineCents)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
            <ul className="border-t border-rule px-4 py-2 text-xs text-ink-muted">
              {s.shipments.map((sh, n) => (
                <li key={n}>
                  Shipping{sh.profileName ? ` (${sh.profileName})` : ''}: {formatCents(sh.shippingCents)} — {sh.explanation}
                </li>
              ))}
            </ul>
          </section>
        ))
      )}

      {plan.unfilled.length ? (
        <section aria-labelledby="unfilled-title" className="rounded-card border border-danger/40 bg-danger-soft/60 p-4">
          <h3 id="unfilled-title" className="text-base font-semibold text-ink">
            Cannot be filled ({plan.unfilled.length})
          </h3>
          <ul className="mt-2 space-y-2">
            {plan.unfilled.map((u) => (
              <li key={u.needId} className="text-sm">
                <span className="font-mono font-semibold text-ink">{u.part.primaryNumber ?? '—'}</span> <span className="text-ink">{u.part.name}</span>{' '}
                <Badge tone="danger" className="ml-1">
                  {unfilledReasonLabels[u.reason] ?? u.reason}
                </Badge>
                <span className="block text-ink-soft">
                  {u.detail} Wanted {u.requested} ({conditionPolicyLabels[u.policy].toLowerCase()}), found {u.filled}, missing {u.missing}.
                </span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}

function CartResult({ result }: { result: ToCartResult }) {
  const units = result.added.reduce((a, x) => a + x.quantity, 0);
  return (
    <Notice tone={result.warnings.length ? 'warn' : 'ok'} role="status" title={units ? `Added ${units} unit${units === 1 ? '' : 's'} from ${result.added.length} listing${result.added.length === 1 ? '' : 's'} to your cart` : 'Your cart already holds this plan'}>
      {result.warnings.length ? (
        <ul className="list-disc pl-5">
          {result.warnings.map((w, i) => (
            <li key={i}>{w.message ?? w.code}</li>
          ))}
        </ul>
      ) : null}
      <Link to={paths.cart.getHref()} className={buttonClasses('secondary', 'sm', 'mt-2')}>
        Go to the cart
      </Link>
    </Notice>
  );
}

/** Builds the sourcing plan for a destination and puts it in the cart in one click. */
export function SourcingPlanner({ vehicleId }: { vehicleId: string }) {
  const [where, setWhere] = useState('US');
  const build = useBuildPlan(vehicleId);
  const toCart = usePlanToCart(vehicleId);
  const [plan, setPlan] = useState<SourcingPlan | null>(null);
  const [cartResult, setCartResult] = useState<ToCartResult | null>(null);

  const onBuild = (e: FormEvent) => {
    e.preventDefault();
    setCartResult(null);
    build.mutate(toDestination(where), { onSuccess: setPlan, onError: (err) => toast.error(err.message) });
  };
  const onCart = () =>
    toCart.mutate(toDestination(where), {
      onSuccess: (r) => {
        setPlan(r.plan);
        setCartResult(r);
      },
      onError: (err) => toast.error(err.message),
    });

  const buys = plan ? plan.plan.sellers.some((s) => s.items.length > 0) : false;
  return (
    <div className="space-y-5">
      <form onSubmit={onBuild} aria-label="Build the sourcing plan" className="flex flex-wrap items-end gap-3">
        <SelectField label="Ship to" className="min-w-64" value={where} onChange={(e) => setWhere(e.target.value)}>
          {destinations.map((d) => (
            <option key={d.value} value={d.value}>
              {d.label}
            </option>
          ))}
        </SelectField>
        <Button type="submit" isLoading={build.isPending}>
          {plan ? 'Build again' : 'Build the plan'}
        </Button>
        {plan && buys ? (
          <Button variant="secondary" onClick={onCart} isLoading={toCart.isPending} icon={<ShoppingCart aria-hidden="true" className="size-4" />}>
            Put the plan in the cart
          </Button>
        ) : null}
      </form>
      {cartResult ? <CartResult result={cartResult} /> : null}
      {plan ? <PlanView plan={plan} /> : <p className="text-ink-soft">The plan picks live listings across sellers to cover your needs list at the lowest landed cost: item prices plus each seller&apos;s shipping, in the condition you asked for per line, counting later numbers that replace the old ones.</p>}
    </div>
  );
}
