/**
 * A seller's shop profile (shown on their listings) and shipping profiles (the rules checkout charges by).
 * Shipping rules are validated by the domain's schema before they are stored.
 */
import { and, asc, eq, ne } from 'drizzle-orm';
import type { z } from 'zod';
import type { shippingProfileInput, shopProfileInput, updateShippingProfileInput } from '../../shared/schemas/listings';
import type { SessionUser } from '../auth/require-role';
import { getDb } from '../db/client';
import { sellerProfiles, shippingProfiles } from '../db/schema/index';
import { shippingProfileSchema } from '../domain/shipping';
import { AppError, notFound, zodDetails } from '../errors';
import { audit } from '../lib/audit';

type ShopRow = typeof sellerProfiles.$inferSelect;
type ShippingRow = typeof shippingProfiles.$inferSelect;

const shopDto = (r: ShopRow) => ({
  shopName: r.shopName,
  location: r.location,
  country: r.country,
  shipsTo: r.shipsTo,
  pickupAtShows: r.pickupAtShows,
  showsNote: r.showsNote,
  returnPolicy: r.returnPolicy,
  payoutsEnabled: r.payoutsEnabled,
  updatedAt: r.updatedAt.toISOString(),
});
export type ShopDto = ReturnType<typeof shopDto>;

export async function getShop(userId: string): Promise<ShopDto | null> {
  const [r] = await getDb().select().from(sellerProfiles).where(eq(sellerProfiles.userId, userId));
  return r ? shopDto(r) : null;
}

export async function saveShop(user: SessionUser, input: z.output<typeof shopProfileInput>): Promise<ShopDto> {
  const values = { ...input, shipsTo: [...new Set(input.shipsTo)] };
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(sellerProfiles).where(eq(sellerProfiles.userId, user.id));
    const [after] = await tx
      .insert(sellerProfiles)
      .values({ userId: user.id, ...values })
      .onConflictDoUpdate({ target: sellerProfiles.userId, set: { ...values, updatedAt: new Date() } })
      .returning();
    await audit(tx, { actorId: user.id, action: 'seller_profile.save', entityType: 'seller_profile', entityId: user.id, before: before ?? null, after });
    return shopDto(after);
  });
}

const profileDto = (r: ShippingRow) => ({ id: r.id, name: r.name, rules: r.rules, isDefault: r.isDefault, createdAt: r.createdAt.toISOString() });
export type ShippingProfileDto = ReturnType<typeof profileDto>;

function parseRules(rules: unknown) {
  const r = shippingProfileSchema.safeParse(rules);
  if (!r.success) {
    const d = zodDetails(r.error);
    const fieldErrors = Object.fromEntries(Object.entries(d.fieldErrors).map(([k, v]) => [`rules.${k}`, v]));
    if (d.formErrors.length) fieldErrors.rules = d.formErrors;
    throw new AppError(400, 'validation_failed', 'The shipping rules are not valid', { fieldErrors, formErrors: [] });
  }
  return r.data;
}

export async function listShippingProfiles(userId: string): Promise<ShippingProfileDto[]> {
  const rows = await getDb().select().from(shippingProfiles).where(eq(shippingProfiles.sellerId, userId)).orderBy(asc(shippingProfiles.createdAt), asc(shippingProfiles.id));
  return rows.map(profileDto);
}

export async function createShippingProfile(user: SessionUser, input: z.output<typeof shippingProfileInput>): Promise<ShippingProfileDto> {
  const rules = parseRules(input.rules);
  return getDb().transaction(async (tx) => {
    const existing = await tx.select({ id: shippingProfiles.id }).from(shippingProfiles).where(eq(shippingProfiles.sellerId, user.id));
    // The first profile is the default, so a seller always has one to fall back on.
    const isDefault = input.isDefault || existing.length === 0;
    if (isDefault) await tx.update(shippingProfiles).set({ isDefault: false }).where(eq(shippingProfiles.sellerId, user.id));
    const [row] = await tx.insert(shippingProfiles).values({ sellerId: user.id, name: input.name, rules, isDefault }).returning();
    await audit(tx, { actorId: user.id, action: 'shipping_profile.create', entityType: 'shipping_profile', entityId: row.id, after: row });
    return profileDto(row);
  });
}

async function lockProfile(tx: Parameters<Parameters<ReturnType<typeof getDb>['transaction']>[0]>[0], userId: string, id: string) {
  const [row] = await tx.select().from(shippingProfiles).where(and(eq(shippingProfiles.id, id), eq(shippingProfiles.sellerId, userId))).for('update');
  if (!row) throw notFound('Shipping profile');
  return row;
}

export async function updateShippingProfile(user: SessionUser, id: string, input: z.output<typeof updateShippingProfileInput>): Promise<ShippingProfileDto> {
  const rules = input.rules !== undefined ? parseRules(input.rules) : undefined;
  return getDb().transaction(async (tx) => {
    const before = await lockProfile(tx, user.id, id);
    if (input.isDefault === true) await tx.update(shippingProfiles).set({ isDefault: false }).where(and(eq(shippingProfiles.sellerId, user.id), ne(shippingProfiles.id, id)));
    const [after] = await tx
      .update(shippingProfiles)
      .set({ ...(input.name !== undefined ? { name: input.name } : {}), ...(rules ? { rules } : {}), ...(input.isDefault !== undefined ? { isDefault: input.isDefault } : {}) })
      .where(eq(shippingProfiles.id, id))
      .returning();
    await audit(tx, { actorId: user.id, action: 'shipping_profile.update', entityType: 'shipping_profile', entityId: id, before, after });
    return profileDto(after);
  });
}

/** Listings that used the profile keep selling with no profile set (the column is set null by the database). */
export async function deleteShippingProfile(user: SessionUser, id: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const before = await lockProfile(tx, user.id, id);
    await tx.delete(shippingProfiles).where(eq(shippingProfiles.id, id));
    if (before.isDefault) {
      const [next] = await tx.select({ id: shippingProfiles.id }).from(shippingProfiles).where(eq(shippingProfiles.sellerId, user.id)).orderBy(asc(shippingProfiles.createdAt)).limit(1);
      if (next) await tx.update(shippingProfiles).set({ isDefault: true }).where(eq(shippingProfiles.id, next.id));
    }
    await audit(tx, { actorId: user.id, action: 'shipping_profile.delete', entityType: 'shipping_profile', entityId: id, before });
  });
}
