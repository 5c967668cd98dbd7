import { ArrowRightLeft, BookOpen, Camera, Store } from 'lucide-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { SearchHit } from '@shared/schemas/search';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { paths } from '@/config/paths';
import { formatCents } from '../utils/format-money';

// Originals read as the trade's safe bets; reproductions and cores are plainly marked as what they are.
const conditionTone: Record<NonNullable<SearchHit['condition']>, BadgeTone> = {
  nos: 'ok',
  nors: 'accent',
  used_original: 'drab',
  rebuilt: 'accent',
  reproduction: 'neutral',
  core: 'warn',
};

export function hitHref(hit: SearchHit): string {
  if (hit.type === 'listing') return paths.listing.getHref(hit.id);
  return paths.catalogPart.getHref(hit.partId ?? hit.id);
}

/** The server writes fit notes as a clause ("listed under replacement number …"); a card shows a sentence. */
export function fitNoteSentence(note: string): string {
  return note.charAt(0).toUpperCase() + note.slice(1);
}

function Stock({ hit }: { hit: SearchHit }) {
  if (!hit.inStock) return <span className="text-danger">Out of stock</span>;
  if (hit.quantity !== null && hit.quantity > 1) return <span>{hit.quantity} in stock</span>;
  return <span>In stock</span>;
}

/** The listing's first photo; a drawn placeholder when there is none or it fails to load. */
function Thumbnail({ hit }: { hit: SearchHit }) {
  const [failed, setFailed] = useState(false);
  const isListing = hit.type === 'listing';
  return (
    <div className="relative size-20 shrink-0 overflow-hidden rounded-tag border border-rule bg-paper-sunk sm:size-24">
      {hit.thumbnailUrl && !failed ? (
        <img src={hit.thumbnailUrl} alt="" loading="lazy" decoding="async" onError={() => setFailed(true)} className="size-full object-cover" />
      ) : (
        <div className="flex size-full flex-col items-center justify-center gap-1 text-drab-700" aria-hidden="true">
          {isListing ? <Camera className="size-5" /> : <BookOpen className="size-5" />}
          <span className="text-[0.625rem] tracking-wide uppercase">{isListing ? 'No photo' : 'Catalog'}</span>
        </div>
      )}
    </div>
  );
}

/** One hit: a seller's listing (price, condition, seller) or a catalog part (where it fits). */
export function ResultCard({ hit }: { hit: SearchHit }) {
  const isListing = hit.type === 'listing';
  const numberShown = hit.primaryNumber ?? hit.matchedNumber;
  return (
    <article
      aria-labelledby={`hit-${hit.id}`}
      className="group relative flex gap-4 rounded-card border border-rule bg-paper-raised p-3 shadow-card transition-colors hover:border-rule-strong sm:p-4"
    >
      <Thumbnail hit={hit} />

      <div className="min-w-0 flex-1">
        <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
          <h3 id={`hit-${hit.id}`} className="min-w-0 text-base font-semibold text-ink">
            {/* The whole card is the link's target area (the ::after overlay); the title is its name. */}
            <Link to={hitHref(hit)} className="after:absolute after:inset-0 after:rounded-card hover:text-patina-700 hover:underline">
              {hit.title}
            </Link>
          </h3>
          {isListing && hit.priceCents !== null ? (
            <p className="shrink-0 text-lg font-bold text-ink tabular-nums">{formatCents(hit.priceCents)}</p>
          ) : null}
        </div>

        <div className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-ink-soft">
          {numberShown ? <span className="font-mono text-ink">{numberShown}</span> : null}
          {isListing ? (
            hit.condition ? (
              <Badge tone={conditionTone[hit.condition]}>{hit.conditionLabel ?? hit.condition}</Badge>
            ) : null
          ) : (
            <Badge tone="drab">Catalog part</Badge>
          )}
        </div>

        {hit.fitNote ? (
          <p className="mt-2 flex items-start gap-1.5 rounded-tag bg-patina-50 px-2 py-1 text-sm text-patina-800">
            <ArrowRightLeft aria-hidden="true" className="mt-0.5 size-3.5 shrink-0" />
            <span>
              <span className="sr-only">Fit note: </span>
              {fitNoteSentence(hit.fitNote)}
            </span>
          </p>
        ) : null}

        <p className="mt-2 flex flex-wrap gap-x-3 gap-y-1 text-xs text-ink-muted">
          {isListing ? (
            <>
              {hit.sellerName ? (
                <span className="inline-flex items-center gap-1">
                  <Store aria-hidden="true" className="size-3.5" />
                  <span className="sr-only">Seller: </span>
                  {hit.sellerName}
                </span>
              ) : null}
              <Stock hit={hit} />
            </>
          ) : null}
          {hit.vehicleNames.length ? <span>Fits {hit.vehicleNames.join(', ')}</span> : null}
        </p>
      </div>
    </article>
  );
}
