import type { ReactNode } from 'react';
import { Check, MapPin, Package, Pencil, Store, TriangleAlert, Truck } from 'lucide-react';
import { Link } from 'react-router-dom';
import { partNumberKindLabels } from '@shared/schemas/catalog';
import { Badge } from '@/components/ui/badge';
import { buttonClasses } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import type { ListingPage, ListingPart } from '../api/listing-types';
import { usedGradeLabels } from '../utils/condition-labels';
import { formatCents } from '../utils/money';
import { ListingStateBadge } from './listing-state-badge';
import { PhotoGallery } from './photo-gallery';

const interchangeText: Record<string, string> = {
  two_way: 'two-way: either fits',
  one_way: 'one-way: the newer fits where the older did, not the reverse',
  conditional: 'fits only with another change',
};

const grams = (g: number) => (g >= 1000 ? `${(g / 1000).toLocaleString('en-US', { maximumFractionDigits: 2 })} kg` : `${g} g`);

/** The public listing page: photos, price and condition, what the condition means, the part, seller, cautions. */
export function ListingView({ page, buySlot }: { page: ListingPage; /** Rendered under the price by the route (the cart feature's button). */ buySlot?: ReactNode }) {
  const { listing, condition, part, cautions, viewer } = page;
  const live = listing.state === 'approved';
  return (
    <article className="space-y-8">
      {viewer.isOwner || viewer.isAdmin ? (
        <Notice tone={live ? 'ok' : 'info'} title={<span className="flex flex-wrap items-center gap-2">This listing is <ListingStateBadge state={listing.state} /></span>}>
          <div className="flex flex-wrap items-center gap-3">
            <p>{live ? 'Buyers can see and buy it.' : 'Only you and administrators can see it until it is approved.'}</p>
            {viewer.isOwner ? (
              <Link to={paths.sellerListings.edit.getHref(listing.id)} className={buttonClasses('secondary', 'sm')}>
                <Pencil aria-hidden="true" className="size-4" /> Edit listing
              </Link>
            ) : null}
          </div>
        </Notice>
      ) : null}

      <div className="grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <PhotoGallery photos={listing.photos} title={listing.title} />

        <div className="space-y-5">
          <div>
            <p className="mb-1 text-label text-drab-700 uppercase">{part ? (part.numbers[0]?.numbers[0]?.printed ?? 'Catalog part') : 'Unidentified part'}</p>
            <h1 className="text-3xl font-bold break-words text-ink">{listing.title}</h1>
          </div>
          <div className="flex flex-wrap items-center gap-3">
            <p className="text-3xl font-bold text-ink">{formatCents(listing.priceCents, listing.currency)}</p>
            <Badge tone="drab">{listing.conditionLabel}</Badge>
            {listing.makersMarks ? (
              <Badge tone="accent">
                <Check aria-hidden="true" className="mr-1 size-3" />
                Maker&rsquo;s marks
              </Badge>
            ) : null}
          </div>
          <p className="text-sm text-ink-soft">
            {listing.quantity > 0 ? `${listing.quantity} available` : 'Sold out'} · {grams(listing.weightGrams)}
            {listing.lengthMm > 0 ? ` · ${listing.lengthMm} × ${listing.widthMm} × ${listing.heightMm} mm` : ''}
          </p>
          {buySlot && !viewer.isOwner ? <div>{buySlot}</div> : null}

          <SellerCardView page={page} />
        </div>
      </div>

      {cautions.length > 0 ? (
        <aside aria-label="Safety cautions" className="rounded-card border-2 border-warn/60 bg-warn-soft px-4 py-3">
          <p className="flex items-center gap-2 font-semibold text-ink">
            <TriangleAlert aria-hidden="true" className="size-5 shrink-0 text-warn" />
            Safety
          </p>
          <ul className="mt-2 list-disc space-y-1 pl-9 text-sm text-ink-soft">
            {cautions.map((c) => (
              <li key={c.code}>{c.text}</li>
            ))}
          </ul>
          <p className="mt-2 pl-7 text-xs text-ink-muted">General guidance only: local codes and a qualified mechanic come first.</p>
        </aside>
      ) : null}

      <div className="grid gap-6 lg:grid-cols-2">
        <Card>
          <h2 className="mb-3 text-xl font-bold text-ink">The condition: {condition.label}</h2>
          <p className="text-ink-soft">{condition.explanation}</p>
          {condition.grade ? (
            <div className="mt-4">
              <h3 className="font-semibold text-ink">
                Grade {condition.grade.rank} of 5: {condition.grade.label}
              </h3>
              <p className="text-sm text-ink-soft">{condition.grade.explanation}</p>
              <ol aria-label="The Drabyard grade scale for used originals" className="mt-3 flex flex-wrap gap-1.5">
                {Object.values(usedGradeLabels).map((g) => (
                  <li
                    key={g.label}
                    aria-current={g.rank === condition.grade!.rank ? 'true' : undefined}
                    className={
                      g.rank === condition.grade!.rank
                        ? 'rounded-tag border border-patina-500 bg-patina-600 px-2 py-0.5 text-xs font-semibold text-white'
                        : 'rounded-tag border border-rule px-2 py-0.5 text-xs text-ink-muted'
                    }
                  >
                    {g.rank}. {g.label}
                  </li>
                ))}
              </ol>
            </div>
          ) : null}
          {condition.rubberUse ? (
            <div className="mt-4">
              <h3 className="font-semibold text-ink">Rubber parts: {condition.rubberUse.label}</h3>
              <p className="text-sm text-ink-soft">{condition.rubberUse.explanation}</p>
            </div>
          ) : null}
        </Card>

        <Card>
          <h2 className="mb-3 text-xl font-bold text-ink">Description</h2>
          {listing.descriptionHtml ? (
            // Rendered and sanitised by the server on save (server/services/listing-description.ts).
            <div
              className="space-y-3 text-ink-soft [&_a]:text-patina-700 [&_a]:underline [&_blockquote]:border-l-4 [&_blockquote]:border-rule [&_blockquote]:pl-3 [&_code]:font-mono [&_h3]:font-semibold [&_h3]:text-ink [&_ol]:list-decimal [&_ol]:pl-6 [&_ul]:list-disc [&_ul]:pl-6"
              dangerouslySetInnerHTML={{ __html: listing.descriptionHtml }}
            />
          ) : (
            <p className="text-ink-muted">The seller gave no description.</p>
          )}
        </Card>
      </div>

      {part ? <PartSection part={part} /> : (
        <Card>
          <h2 className="mb-2 text-xl font-bold text-ink">The part</h2>
          <p className="text-ink-soft">The seller could not find this part in the catalog and described it in words. Check the description and photos against your vehicle.</p>
        </Card>
      )}
    </article>
  );
}

function SellerCardView({ page }: { page: ListingPage }) {
  const { seller, shipping } = page;
  return (
    <section aria-label="Seller" className="rounded-card border border-rule bg-paper-raised p-4 shadow-card">
      <p className="flex items-center gap-2 font-semibold text-ink">
        <Store aria-hidden="true" className="size-5 text-patina-600" />
        {seller.shopName}
      </p>
      <dl className="mt-2 space-y-1.5 text-sm text-ink-soft">
        {seller.location ? (
          <div className="flex gap-2">
            <dt className="sr-only">Location</dt>
            <MapPin aria-hidden="true" className="mt-0.5 size-4 shrink-0 text-ink-muted" />
            <dd>
              {seller.location}
              {seller.country ? `, ${seller.country}` : ''}
            </dd>
          </div>
        ) : null}
        <div className="flex gap-2">
          <dt className="sr-only">Shipping</dt>
          <Truck aria-hidden="true" className="mt-0.5 size-4 shrink-0 text-ink-muted" />
          <dd>
            {seller.shipsTo.length ? `Ships to ${seller.shipsTo.join(', ')}` : 'Does not ship'}
            {shipping ? ` · ${shipping.name}` : ''}
          </dd>
        </div>
        {seller.pickupAtShows ? (
          <div className="flex gap-2">
            <dt className="sr-only">Pickup</dt>
            <Package aria-hidden="true" className="mt-0.5 size-4 shrink-0 text-ink-muted" />
            <dd>Pickup at shows{seller.showsNote ? `: ${seller.showsNote}` : ''}</dd>
          </div>
        ) : null}
        <div>
          <dt className="font-semibold text-ink">Returns</dt>
          <dd>{seller.returnPolicy || 'No return policy given.'}</dd>
        </div>
        <div>
          <dt className="sr-only">On Drabyard</dt>
          <dd className="text-xs text-ink-muted">
            {seller.liveListings} live listing{seller.liveListings === 1 ? '' : 's'} · selling since {formatDate(seller.memberSince)}
          </dd>
        </div>
      </dl>
    </section>
  );
}

function PartSection({ part }: { part: ListingPart }) {
  const names = new Map(part.chain.parts.map((p) => [p.id, p]));
  const label = (id: string) => {
    const p = names.get(id);
    return p ? `${p.primaryNumber ?? ''} ${p.name}`.trim() : 'another part';
  };
  return (
    <Card>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 className="text-xl font-bold text-ink">The part: {part.part.name}</h2>
        <TextLink to={paths.catalogPart.getHref(part.part.id)}>Open in the catalog</TextLink>
      </div>
      {part.part.description ? <p className="mt-2 text-ink-soft">{part.part.description}</p> : null}
      <dl className="mt-4 grid gap-x-6 gap-y-2 sm:grid-cols-2">
        {part.numbers.map((g) => (
          <div key={g.kind}>
            <dt className="text-label text-ink-muted uppercase">{partNumberKindLabels[g.kind as keyof typeof partNumberKindLabels] ?? g.kind}</dt>
            <dd className="font-mono text-sm text-ink">{g.numbers.map((n) => n.printed).join(', ')}</dd>
          </div>
        ))}
      </dl>
      {part.chain.edges.length > 0 ? (
        <div className="mt-5">
          <h3 className="font-semibold text-ink">Supersession chain</h3>
          <ol aria-label="Supersession chain" className="mt-2 space-y-1.5 text-sm text-ink-soft">
            {part.chain.edges.map((e, i) => (
              <li key={e.id ?? i} className="flex flex-wrap gap-x-1.5">
                <span className={e.fromPartId === part.part.id ? 'font-semibold text-ink' : ''}>{label(e.fromPartId)}</span>
                <span>is replaced by</span>
                <span className={e.toPartId === part.part.id ? 'font-semibold text-ink' : ''}>
                  {e.quantity > 1 ? `${e.quantity} × ` : ''}
                  {label(e.toPartId)}
                </span>
                <span className="text-ink-muted">
                  ({interchangeText[e.interchange] ?? e.interchange}
                  {e.note ? `; ${e.note}` : ''})
                </span>
              </li>
            ))}
          </ol>
          {part.chain.current.length > 0 ? <p className="mt-2 text-sm text-ink-soft">Current number: {part.chain.current.map(label).join(', ')}</p> : null}
        </div>
      ) : null}
    </Card>
  );
}
