import { zodResolver } from '@hookform/resolvers/zod';
import { Check, ChevronDown, ChevronRight, MessageSquareWarning, ShieldAlert, X } from 'lucide-react';
import { Fragment, useEffect, useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useSearchParams } from 'react-router-dom';
import { toast } from 'sonner';
import { listingDecisionInput, listingFlagCodes, type ListingDecisionInput } from '@shared/schemas/listings';
import { Badge } from '@/components/ui/badge';
import { Button, buttonClasses } from '@/components/ui/button';
import { TextAreaField } from '@/components/ui/form-field';
import { Notice } from '@/components/ui/notice';
import { Skeleton } from '@/components/ui/skeleton';
import { textLinkClasses } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { useApproveMany } from '../api/approve-many';
import { useDecideListing } from '../api/decide-listing';
import { useReviewQueue } from '../api/get-review-queue';
import type { QueueFilters, QueueListing } from '../api/moderation-types';
import { LinkPartForm } from './link-part-form';

export const flagLabels: Record<(typeof listingFlagCodes)[number], string> = {
  rubber_brake_serviceable: 'Old brake rubber offered for use',
  rubber_rebuilt_confirm: 'Rebuilt brake unit: check rubber renewed',
  restricted_category: 'Restricted category',
  price_outlier: 'Price far off the usual',
  photo_reused: "Photo like another seller's",
  new_seller: 'New seller',
};

const ages: Array<[string, string]> = [
  ['', 'Any age'],
  ['24', 'Waiting over a day'],
  ['72', 'Waiting over 3 days'],
  ['168', 'Waiting over a week'],
];

const money = (cents: number, currency: string) => new Intl.NumberFormat('en-US', { style: 'currency', currency }).format(cents / 100);
const waited = (h: number) => (h < 1 ? 'under an hour' : h < 48 ? `${h} h` : `${Math.floor(h / 24)} days`);
const selectClasses = 'block h-9 w-full rounded-tag border border-rule-strong bg-paper-raised px-2 text-sm';

function useFilters(): [QueueFilters, (change: Partial<Record<keyof QueueFilters, string>>) => void] {
  const [params, setParams] = useSearchParams();
  const min = params.get('minAgeHours');
  const filters: QueueFilters = {
    flag: params.get('flag') ?? undefined,
    sellerId: params.get('seller') ?? undefined,
    minAgeHours: min && /^\d+$/.test(min) ? Number(min) : undefined,
    sort: params.get('sort') === 'newest' ? 'newest' : 'oldest',
  };
  const set = (change: Partial<Record<keyof QueueFilters, string>>) =>
    setParams(
      (p) => {
        const next = new URLSearchParams(p);
        for (const [k, v] of Object.entries(change)) {
          const key = k === 'sellerId' ? 'seller' : k;
          if (v) next.set(key, v);
          else next.delete(key);
        }
        return next;
      },
      { replace: true },
    );
  return [filters, set];
}

/** The administrator's review queue: filters, bulk approval of unflagged listings, and a decision per listing. */
export function ReviewQueue() {
  const [filters, setFilter] = useFilters();
  const queue = useReviewQueue(filters);
  const [selected, setSelected] = useState<Set<string>>(new Set());
  const [open, setOpen] = useState<string | null>(null);
  const [sellers, setSellers] = useState<Map<string, string>>(new Map());
  const approveMany = useApproveMany();
  const listings = useMemo(() => queue.data ?? [], [queue.data]);

  // Sellers seen in the queue so far, so the seller filter keeps its options while it is applied.
  useEffect(() => {
    setSellers((prev) => {
      const next = new Map(prev);
      for (const l of listings) next.set(l.seller.id, l.seller.shopName);
      return next.size === prev.size ? prev : next;
    });
  }, [listings]);

  const unflagged = listings.filter((l) => l.flags.length === 0);
  const chosen = [...selected].filter((id) => unflagged.some((l) => l.id === id));
  const toggle = (id: string) =>
    setSelected((s) => {
      const n = new Set(s);
      if (n.has(id)) n.delete(id);
      else n.add(id);
      return n;
    });

  const bulkApprove = () =>
    approveMany.mutate(chosen, {
      onSuccess: (r) => {
        setSelected(new Set());
        toast.success(`${r.approved.length} listing${r.approved.length === 1 ? '' : 's'} approved`);
        if (r.skipped.length) toast.warning(`${r.skipped.length} not approved: ${r.skipped.map((s) => s.reason.replace(/_/g, ' ')).join(', ')}`);
      },
      onError: (e) => toast.error(e.message),
    });

  return (
    <div className="space-y-5">
      <div role="search" aria-label="Filter the queue" className="grid gap-3 rounded-card border border-rule bg-paper-raised p-4 shadow-card sm:grid-cols-4">
        <label className="text-sm font-semibold text-ink">
          Flag
          <select aria-label="Flag" value={filters.flag ?? ''} onChange={(e) => setFilter({ flag: e.target.value })} className={cn(selectClasses, 'mt-1 font-normal')}>
            <option value="">Any</option>
            <option value="none">No flags</option>
            {listingFlagCodes.map((c) => (
              <option key={c} value={c}>
                {flagLabels[c]}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm font-semibold text-ink">
          Age
          <select aria-label="Age" value={filters.minAgeHours !== undefined ? String(filters.minAgeHours) : ''} onChange={(e) => setFilter({ minAgeHours: e.target.value })} className={cn(selectClasses, 'mt-1 font-normal')}>
            {ages.map(([v, t]) => (
              <option key={v} value={v}>
                {t}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm font-semibold text-ink">
          Seller
          <select aria-label="Seller" value={filters.sellerId ?? ''} onChange={(e) => setFilter({ sellerId: e.target.value })} className={cn(selectClasses, 'mt-1 font-normal')}>
            <option value="">All sellers</option>
            {[...sellers].map(([id, name]) => (
              <option key={id} value={id}>
                {name}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm font-semibold text-ink">
          Order
          <select aria-label="Order" value={filters.sort} onChange={(e) => setFilter({ sort: e.target.value === 'newest' ? 'newest' : '' })} className={cn(selectClasses, 'mt-1 font-normal')}>
            <option value="oldest">Oldest first</option>
            <option value="newest">Newest first</option>
          </select>
        </label>
      </div>

      <div className="flex flex-wrap items-center gap-3">
        <Button size="sm" variant="secondary" disabled={unflagged.length === 0} onClick={() => setSelected(new Set(unflagged.map((l) => l.id)))}>
          Select all unflagged ({unflagged.length})
        </Button>
        <Button size="sm" icon={<Check aria-hidden="true" className="size-4" />} disabled={chosen.length === 0} isLoading={approveMany.isPending} onClick={bulkApprove}>
          Approve {chosen.length} selected
        </Button>
        <p className="text-xs text-ink-muted">Only listings without flags can be approved in bulk.</p>
      </div>

      {queue.isPending ? (
        <div role="status" className="space-y-2">
          <span className="sr-only">Loading the queue…</span>
          <Skeleton className="h-14" />
          <Skeleton className="h-14" />
          <Skeleton className="h-14" />
        </div>
      ) : queue.isError ? (
        <Notice tone="danger" role="alert" title="We could not load the queue">
          {queue.error.message}
        </Notice>
      ) : listings.length === 0 ? (
        <Notice tone="info" role="status" title="Nothing waiting">
          No listing waiting for review matches these filters.
        </Notice>
      ) : (
        <div className="overflow-x-auto rounded-card border border-rule bg-paper-raised shadow-card">
          <table className="w-full min-w-[56rem] border-collapse text-left text-sm">
            <caption className="sr-only">Listings waiting for review</caption>
            <thead className="bg-paper-sunk text-label text-ink-muted uppercase">
              <tr>
                <th scope="col" className="w-10 px-3 py-2.5">
                  <span className="sr-only">Select</span>
                </th>
                <th scope="col" className="px-3 py-2.5">Listing</th>
                <th scope="col" className="px-3 py-2.5">Seller</th>
                <th scope="col" className="px-3 py-2.5">Price</th>
                <th scope="col" className="px-3 py-2.5">Flags</th>
                <th scope="col" className="px-3 py-2.5">Waiting</th>
                <th scope="col" className="px-3 py-2.5 text-right">Review</th>
              </tr>
            </thead>
            <tbody>
              {listings.map((l) => (
                <Fragment key={l.id}>
                  <tr className={cn('border-t border-rule align-middle', open === l.id && 'bg-patina-50/50')}>
                    <td className="px-3 py-2">
                      <input
                        type="checkbox"
                        aria-label={`Select ${l.title}`}
                        disabled={l.flags.length > 0}
                        title={l.flags.length > 0 ? 'Flagged listings need a decision one by one' : undefined}
                        checked={selected.has(l.id)}
                        onChange={() => toggle(l.id)}
                        className="size-4 accent-patina-600"
                      />
                    </td>
                    <th scope="row" className="px-3 py-2 font-normal">
                      <div className="flex items-center gap-3">
                        <span className="block size-12 shrink-0 overflow-hidden rounded-tag border border-rule bg-paper-sunk" style={l.photos[0] ? { backgroundColor: l.photos[0].placeholderColor } : undefined}>
                          {l.photos[0] ? <img src={l.photos[0].urls.thumb} alt="" className="h-full w-full object-cover" /> : null}
                        </span>
                        <span>
                          <span className="block font-semibold text-ink">{l.title}</span>
                          <span className="block text-xs text-ink-muted">
                            {l.part ? `${l.part.primaryNumber ?? ''} ${l.part.name}`.trim() : 'Unidentified part'} · {l.conditionLabel} · {l.photos.length} photo{l.photos.length === 1 ? '' : 's'}
                          </span>
                        </span>
                      </div>
                    </th>
                    <td className="px-3 py-2 text-ink-soft">{l.seller.shopName}</td>
                    <td className="px-3 py-2 tabular-nums">{money(l.priceCents, l.currency)}</td>
                    <td className="px-3 py-2">
                      <div className="flex flex-wrap gap-1">
                        {l.flags.length === 0 ? <span className="text-xs text-ink-muted">None</span> : null}
                        {l.flags.map((f) => (
                          <Badge key={f.code} tone={f.severity === 'block' ? 'danger' : 'warn'}>
                            {flagLabels[f.code as keyof typeof flagLabels] ?? f.code}
                          </Badge>
                        ))}
                      </div>
                    </td>
                    <td className="px-3 py-2 whitespace-nowrap text-ink-soft">{waited(l.waitingHours)}</td>
                    <td className="px-3 py-2 text-right">
                      <Button
                        size="sm"
                        variant="secondary"
                        aria-expanded={open === l.id}
                        aria-label={`Review ${l.title}`}
                        icon={open === l.id ? <ChevronDown aria-hidden="true" className="size-4" /> : <ChevronRight aria-hidden="true" className="size-4" />}
                        onClick={() => setOpen((o) => (o === l.id ? null : l.id))}
                      >
                        Review
                      </Button>
                    </td>
                  </tr>
                  {open === l.id ? (
                    <tr className="bg-patina-50/50">
                      <td colSpan={7} className="px-4 pb-5">
                        <ReviewPanel listing={l} onDone={() => setOpen(null)} />
                      </td>
                    </tr>
                  ) : null}
                </Fragment>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}

type Mode = 'request-changes' | 'reject';

function ReviewPanel({ listing, onDone }: { listing: QueueListing; onDone: () => void }) {
  const [mode, setMode] = useState<Mode | null>(null);
  const decide = useDecideListing();
  const blocked = listing.flags.some((f) => f.severity === 'block');
  const form = useForm<ListingDecisionInput>({ resolver: zodResolver(listingDecisionInput), defaultValues: { decision: 'approve', message: '' } });

  const send = (input: ListingDecisionInput) =>
    decide.mutate(
      { id: listing.id, ...input },
      {
        onSuccess: () => {
          toast.success(input.decision === 'approve' ? `Approved: ${listing.title}` : input.decision === 'reject' ? `Rejected: ${listing.title}` : `Changes requested: ${listing.title}`);
          onDone();
        },
        onError: (e) => toast.error(e.message),
      },
    );

  return (
    <div className="space-y-4 pt-3">
      {listing.photos.length > 0 ? (
        <ul aria-label={`Photos of ${listing.title}`} className="grid grid-cols-2 gap-3 md:grid-cols-3 xl:grid-cols-4">
          {listing.photos.map((p, i) => (
            <li key={p.id} className="overflow-hidden rounded-tag border border-rule" style={{ backgroundColor: p.placeholderColor }}>
              <a href={p.urls.large} target="_blank" rel="noreferrer">
                <img src={p.urls.medium} alt={`${listing.title}, photo ${i + 1}`} className="aspect-[4/3] w-full object-contain" />
              </a>
            </li>
          ))}
        </ul>
      ) : (
        <Notice tone="warn" title="No photos">
          Originals should be proven by photos of the part and its marks.
        </Notice>
      )}

      <div className="grid gap-4 lg:grid-cols-2">
        <div className="space-y-2">
          <h3 className="font-semibold text-ink">Description</h3>
          {listing.descriptionHtml ? (
            <div className="space-y-2 text-sm text-ink-soft [&_ol]:list-decimal [&_ol]:pl-5 [&_ul]:list-disc [&_ul]:pl-5" dangerouslySetInnerHTML={{ __html: listing.descriptionHtml }} />
          ) : (
            <p className="text-sm text-ink-muted">No description.</p>
          )}
          <p className="text-sm text-ink-soft">
            Quantity {listing.quantity} · maker&rsquo;s marks {listing.makersMarks ? 'claimed' : 'not claimed'}
            {listing.rubberUse ? ` · rubber: ${listing.rubberUse.replace('_', ' ')}` : ''} ·{' '}
            <Link to={paths.listing.getHref(listing.id)} className={textLinkClasses}>
              Open the listing page
            </Link>
          </p>
        </div>
        {listing.flags.length > 0 ? (
          <div className="space-y-2">
            <h3 className="font-semibold text-ink">Flags</h3>
            <ul className="space-y-2">
              {listing.flags.map((f) => (
                <li key={f.code} className={cn('flex gap-2 rounded-tag border px-3 py-2 text-sm', f.severity === 'block' ? 'border-danger/40 bg-danger-soft' : 'border-warn/40 bg-warn-soft')}>
                  {f.severity === 'block' ? <ShieldAlert aria-hidden="true" className="size-4 shrink-0 text-danger" /> : <MessageSquareWarning aria-hidden="true" className="size-4 shrink-0 text-warn" />}
                  <span className="text-ink">{f.message}</span>
                </li>
              ))}
            </ul>
          </div>
        ) : null}
      </div>

      {listing.part === null ? <LinkPartForm listing={listing} /> : null}

      <div className="flex flex-wrap gap-2">
        <Button
          icon={<Check aria-hidden="true" className="size-4" />}
          disabled={blocked || decide.isPending}
          title={blocked ? 'A blocking flag: request changes or reject' : undefined}
          isLoading={decide.isPending && decide.variables?.decision === 'approve'}
          onClick={() => send({ decision: 'approve' })}
        >
          Approve
        </Button>
        <Button variant="secondary" aria-expanded={mode === 'request-changes'} onClick={() => setMode((m) => (m === 'request-changes' ? null : 'request-changes'))}>
          Request changes
        </Button>
        <Button variant="danger" icon={<X aria-hidden="true" className="size-4" />} aria-expanded={mode === 'reject'} onClick={() => setMode((m) => (m === 'reject' ? null : 'reject'))}>
          Reject
        </Button>
      </div>

      {mode ? (
        <form
          noValidate
          aria-label={mode === 'reject' ? `Reject ${listing.title}` : `Request changes to ${listing.title}`}
          onSubmit={(e) => {
            form.setValue('decision', mode);
            void form.handleSubmit(send)(e);
          }}
          className="max-w-2xl space-y-3"
        >
          <TextAreaField
            label={mode === 'reject' ? 'Reason for rejecting (sent to the seller)' : 'What the seller should change'}
            rows={3}
            autoFocus
            hint={mode === 'reject' ? 'Rejection is final: the seller must make a new listing. For fixable problems, request changes instead.' : 'They can edit and submit again.'}
            error={form.formState.errors.message?.message}
            {...form.register('message')}
          />
          <div className="flex gap-2">
            <Button type="submit" variant={mode === 'reject' ? 'danger' : 'primary'} isLoading={decide.isPending}>
              {mode === 'reject' ? 'Reject listing' : 'Send back to the seller'}
            </Button>
            <button type="button" className={buttonClasses('ghost', 'md')} onClick={() => setMode(null)}>
              Cancel
            </button>
          </div>
        </form>
      ) : null}
    </div>
  );
}
