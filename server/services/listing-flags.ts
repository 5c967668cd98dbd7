/**
 * Gathers what the pure flag rules (domain/listing-flags.ts) need from the database, and stores the result.
 * Called whenever a listing enters or changes while in review, and again at approval.
 */
import { and, count, eq, inArray, isNotNull, ne, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { listingFlags, listingPhotos, listings, parts } from '../db/schema/index';
import { computeFlags, PHOTO_REUSE_MAX_DISTANCE, type ListingFlag } from '../domain/listing-flags';
import { isHydraulicRubber } from '../domain/standards/part-specs';
import type { Tx } from './listing-photos';
import type { ListingFlag as FlagReply } from '../../shared/schemas/listing-replies';

type ListingRow = typeof listings.$inferSelect;
type PartRow = typeof parts.$inferSelect;

// The demo catalog files rubber dust boots, cylinder repair kits and seals of the brake system under these
// general categories; with safety class "brake" they are hydraulic brake rubber too.
// source: /work/shared/DOMAIN.md, "Safety rules of the trade" (hoses, cylinder cups, boots).
const BRAKE_RUBBER_GENERAL = new Set(['cylinder_kit', 'boot', 'seal']);

export function partHasHydraulicRubber(p: Pick<PartRow, 'category' | 'safetyClass'>): boolean {
  return isHydraulicRubber(p.category) || (p.safetyClass === 'brake' && BRAKE_RUBBER_GENERAL.has(p.category));
}

/** Weapon mounts and whatever the catalog marks restricted get the extra review. */
export function partIsRestricted(p: Pick<PartRow, 'category' | 'restricted'>): boolean {
  return p.restricted || p.category === 'weapon_mount';
}

export async function evaluateFlags(conn: Db | Tx, l: ListingRow): Promise<ListingFlag[]> {
  const [part] = l.partId ? await conn.select().from(parts).where(eq(parts.id, l.partId)) : [];
  const hashes = (await conn.select({ dhash: listingPhotos.dhash }).from(listingPhotos).where(eq(listingPhotos.listingId, l.id))).map((r) => r.dhash);
  const comparable = part
    ? (
        await conn
          .select({ priceCents: listings.priceCents })
          .from(listings)
          .where(and(eq(listings.partId, part.id), ne(listings.id, l.id), inArray(listings.state, ['approved', 'sold_out'])))
          .limit(2000)
      ).map((r) => r.priceCents)
    : [];
  // Near matches are found in SQL (Hamming distance on the 64-bit hash); the domain rule then judges them.
  const others = hashes.length
    ? await conn
        .select({ listingId: listingPhotos.listingId, sellerId: listings.sellerId, hash: listingPhotos.dhash })
        .from(listingPhotos)
        .innerJoin(listings, eq(listings.id, listingPhotos.listingId))
        .where(
          and(
            ne(listings.sellerId, l.sellerId),
            sql`exists (select 1 from unnest(array[${sql.join(hashes.map((h) => sql`${h}`), sql`, `)}]::text[]) as h(v)
                 where bit_count(('x' || h.v)::bit(64) # ('x' || ${listingPhotos.dhash})::bit(64)) <= ${PHOTO_REUSE_MAX_DISTANCE})`,
          ),
        )
        .limit(200)
    : [];
  const [{ n: approvedBefore }] = await conn
    .select({ n: count() })
    .from(listings)
    .where(and(eq(listings.sellerId, l.sellerId), ne(listings.id, l.id), isNotNull(listings.approvedAt)));
  return computeFlags({
    listing: {
      condition: l.condition,
      rubberUse: l.rubberUse,
      partCategory: part?.category ?? null,
      safetyClass: part?.safetyClass ?? null,
      priceCents: l.priceCents,
      title: l.title,
      description: l.descriptionMd,
    },
    isHydraulicRubber: part ? partHasHydraulicRubber(part) : false,
    restrictedCategory: part ? partIsRestricted(part) : false,
    comparablePricesCents: comparable,
    photoHashes: hashes,
    otherSellersPhotoHashes: others,
    sellerApprovedListingCount: approvedBefore,
    sellerId: l.sellerId,
  });
}

/** Replaces the listing's stored flags with freshly computed ones. */
export async function refreshFlags(tx: Db | Tx, l: ListingRow): Promise<ListingFlag[]> {
  const flags = await evaluateFlags(tx, l);
  await tx.delete(listingFlags).where(eq(listingFlags.listingId, l.id));
  if (flags.length) {
    await tx.insert(listingFlags).values(flags.map((f) => ({ listingId: l.id, code: f.code, severity: f.severity, message: f.message, details: f.details })));
  }
  return flags;
}

export type FlagDto = FlagReply;

export async function flagsOf(conn: Db | Tx, listingIds: string[]): Promise<Map<string, FlagDto[]>> {
  const out = new Map<string, FlagDto[]>();
  if (!listingIds.length) return out;
  const rows = await conn.select().from(listingFlags).where(inArray(listingFlags.listingId, listingIds));
  for (const r of rows) {
    const list = out.get(r.listingId) ?? [];
    list.push({ code: r.code, severity: r.severity, message: r.message, details: r.details });
    out.set(r.listingId, list);
  }
  for (const list of out.values()) list.sort((a, b) => (a.severity === b.severity ? a.code.localeCompare(b.code) : a.severity === 'block' ? -1 : 1));
  return out;
}
