import { randomUUID } from 'node:crypto';
import { getDb } from '../../server/db/client';
import { listings, sellerProfiles, shippingProfiles } from '../../server/db/schema/index';
import { shippingProfileSchema, type ShippingProfileInput } from '../../server/domain/shipping';
import { createUser } from './users';

type Condition = (typeof listings.$inferInsert)['condition'];

/** A seller with a shop (fictional) and one default shipping profile (flat 10.00 to the US unless given). */
export async function createSellerWithShipping(opts: { shopName?: string; rules?: ShippingProfileInput; shopShipsTo?: string[] } = {}) {
  const user = await createUser({ roles: ['buyer', 'seller'] });
  const shopName = opts.shopName ?? `Test Yard ${randomUUID().slice(0, 4)}`;
  await getDb()
    .insert(sellerProfiles)
    .values({ userId: user.id, shopName, shipsTo: opts.shopShipsTo ?? ['*'] });
  const rules = shippingProfileSchema.parse(opts.rules ?? { kind: 'flat_per_order', amountCents: 1000, shipsTo: ['US'] });
  const [profile] = await getDb().insert(shippingProfiles).values({ sellerId: user.id, name: 'Standard', rules, isDefault: true }).returning();
  return { user, shopName, profile };
}

/** An approved (live) listing inserted directly; the listing life cycle is another suite's concern. */
export async function createLiveListing(seller: { id: string }, partId: string, opts: { condition?: Condition; priceCents?: number; quantity?: number; title?: string } = {}) {
  const [row] = await getDb()
    .insert(listings)
    .values({
      sellerId: seller.id,
      partId,
      title: opts.title ?? `Test listing ${randomUUID().slice(0, 4)}`,
      condition: opts.condition ?? 'nos',
      quantity: opts.quantity ?? 5,
      priceCents: opts.priceCents ?? 2500,
      weightGrams: 200,
      lengthMm: 100,
      widthMm: 50,
      heightMm: 20,
      state: 'approved',
      submittedAt: new Date(),
      approvedAt: new Date(),
    })
    .returning();
  return row;
}
