import { randomUUID } from 'node:crypto';
import { getDb } from '../../server/db/client';
import { listingPhotos, listings, sellerProfiles } from '../../server/db/schema/index';
import type { Condition } from '../../server/domain/conditions';
import { createUser } from './users';

/** A seller (user with the seller role) and their shop profile. */
export async function createSellerProfile(opts: { shopName?: string; shipsTo?: string[]; pickupAtShows?: boolean } = {}) {
  const user = await createUser({ roles: ['buyer', 'seller'] });
  const [profile] = await getDb()
    .insert(sellerProfiles)
    .values({
      userId: user.id,
      shopName: opts.shopName ?? `Test yard ${randomUUID().slice(0, 6)}`,
      shipsTo: opts.shipsTo ?? ['US'],
      pickupAtShows: opts.pickupAtShows ?? false,
    })
    .returning();
  return { user, profile };
}

export interface ListingOpts {
  partId?: string | null;
  title?: string;
  condition?: Condition;
  priceCents?: number;
  quantity?: number;
  state?: (typeof listings.$inferInsert)['state'];
  photos?: number;
  descriptionMd?: string;
}

/** A listing inserted directly (live by default), with `photos` photo rows. */
export async function createListingRow(sellerId: string, opts: ListingOpts = {}) {
  const [l] = await getDb()
    .insert(listings)
    .values({
      sellerId,
      partId: opts.partId ?? null,
      title: opts.title ?? `Test listing ${randomUUID().slice(0, 6)}`,
      condition: opts.condition ?? 'used_original',
      usedGrade: (opts.condition ?? 'used_original') === 'used_original' ? 'honest' : null,
      quantity: opts.quantity ?? 1,
      priceCents: opts.priceCents ?? 2500,
      descriptionMd: opts.descriptionMd ?? '',
      state: opts.state ?? 'approved',
      approvedAt: (opts.state ?? 'approved') === 'approved' ? new Date() : null,
    })
    .returning();
  for (let i = 0; i < (opts.photos ?? 0); i++) {
    const k = `test/${l.id}-${i}`;
    await getDb()
      .insert(listingPhotos)
      .values({ listingId: l.id, position: i, thumbKey: `${k}-t.webp`, mediumKey: `${k}-m.webp`, largeKey: `${k}-l.webp`, width: 800, height: 600, placeholderColor: '#777777', dhash: randomUUID().replace(/-/g, '').slice(0, 16) });
  }
  return l;
}
