import { Banknote, FileSpreadsheet, Package, Plus, Store } from 'lucide-react';
import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { listingStateCodes, type ListingStateCode } from '@shared/schemas/listings';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Button, buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useMyListings } from '@/features/seller/api/get-my-listings';
import { MyListingsTable } from '@/features/seller/components/my-listings-table';
import { StateCounts } from '@/features/seller/components/state-counts';

const PAGE_SIZE = 50;

export function SellerDeskRoute() {
  const [params, setParams] = useSearchParams();
  const rawState = params.get('state');
  const state = listingStateCodes.includes(rawState as ListingStateCode) ? (rawState as ListingStateCode) : undefined;
  const sort = params.get('sort') ?? '-updated';
  const q = params.get('q') ?? '';
  const page = Math.max(1, Number(params.get('page')) || 1);
  const [text, setText] = useState(q);
  const listings = useMyListings({ state, sort, q: q || undefined, page, pageSize: PAGE_SIZE });

  const update = (change: Record<string, string | undefined>) =>
    setParams(
      (p) => {
        const next = new URLSearchParams(p);
        for (const [k, v] of Object.entries(change)) {
          if (v) next.set(k, v);
          else next.delete(k);
        }
        if (!('page' in change)) next.delete('page');
        return next;
      },
      { replace: true },
    );

  const data = listings.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;

  return (
    <ContentLayout
      title="Seller desk"
      eyebrow="Your stock"
      description="Your listings and where each stands. Quick-edit stock and prices; a live listing stays live."
      actions={
        <>
          <Link to={paths.sellerOrders.list.getHref()} className={buttonClasses('ghost', 'sm')}>
            <Package aria-hidden="true" className="size-4" /> Orders
          </Link>
          <Link to={paths.sellerOrders.payouts.getHref()} className={buttonClasses('ghost', 'sm')}>
            <Banknote aria-hidden="true" className="size-4" /> Payouts
          </Link>
          <Link to={paths.sellerListings.shop.getHref()} className={buttonClasses('ghost', 'sm')}>
            <Store aria-hidden="true" className="size-4" /> Shop and shipping
          </Link>
          <Link to={paths.sellerListings.import.getHref()} className={buttonClasses('secondary', 'sm')}>
            <FileSpreadsheet aria-hidden="true" className="size-4" /> Import CSV
          </Link>
          <Link to={paths.sellerListings.new.getHref()} className={buttonClasses('primary', 'sm')}>
            <Plus aria-hidden="true" className="size-4" /> New listing
          </Link>
        </>
      }
    >
      {listings.isPending ? (
        <PageSkeleton label="Loading your listings" />
      ) : listings.isError ? (
        <Notice tone="danger" role="alert" title="We could not load your listings">
          <p>{listings.error.message}</p>
        </Notice>
      ) : (
        <div className="space-y-5">
          <StateCounts counts={data!.counts} active={state} onSelect={(s) => update({ state: s })} />
          <form
            role="search"
            className="flex max-w-lg gap-2"
            onSubmit={(e) => {
              e.preventDefault();
              update({ q: text.trim() || undefined });
            }}
          >
            <label htmlFor="desk-q" className="sr-only">
              Search your listings
            </label>
            <input
              id="desk-q"
              type="search"
              value={text}
              onChange={(e) => setText(e.target.value)}
              placeholder="Search titles and descriptions"
              className="block h-9 flex-1 rounded-tag border border-rule-strong bg-paper-raised px-3 text-sm"
            />
            <Button type="submit" size="sm" variant="secondary">
              Search
            </Button>
          </form>
          {data!.listings.length === 0 ? (
            <Notice tone="info" role="status" title={state || q ? 'No listing matches' : 'No listings yet'}>
              {state || q ? 'Try another state or search.' : 'Create your first listing, or import a spreadsheet of them.'}
            </Notice>
          ) : (
            <MyListingsTable listings={data!.listings} sort={sort} onSortChange={(s) => update({ sort: s === '-updated' ? undefined : s })} />
          )}
          {pages > 1 ? (
            <nav aria-label="Pages" className="flex items-center gap-3 text-sm">
              <Button size="sm" variant="secondary" disabled={page <= 1} onClick={() => update({ page: String(page - 1) })}>
                Previous
              </Button>
              <span>
                Page {page} of {pages}
              </span>
              <Button size="sm" variant="secondary" disabled={page >= pages} onClick={() => update({ page: String(page + 1) })}>
                Next
              </Button>
            </nav>
          ) : null}
        </div>
      )}
    </ContentLayout>
  );
}
