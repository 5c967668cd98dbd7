import { randomBytes } from 'node:crypto';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import type { Request, Response } from 'express';
import type { CartGroup, CartItem, CartReply, CartWarning, Destination, ShippingRefusalReason } from '../../shared/schemas/orders';
import { getDb } from '../db/client';
import { cartItems, carts, listingPhotos, listings, parts, sellerProfiles, shippingProfiles, users } from '../db/schema/index';
import { shippingForSeller, shippingProfileSchema, type ShippingItem, type ShippingProfile } from '../domain/shipping';
import { AppError, notFound } from '../errors';
import { createPhotoStorage } from '../lib/photos/create-photo-storage';
import { logger } from '../lib/logger';
import type { Tx } from './stock';

/*
 * The cart: one per signed-in user, or per browser (a random token in a cookie) until sign-in merges it.
 * Prices, stock and shipping are always read fresh; totals are computed here, on the server, in cents.
 */

export const CART_COOKIE = 'drabyard.cart';
const CART_COOKIE_MAX_AGE_MS = 30 * 24 * 3600_000;

export type CartOwner = { userId: string } | { anonToken: string };

// ---------- who owns the cart ----------

function readCookie(req: Request, name: string): string | undefined {
  const header = req.headers.cookie;
  if (!header) return undefined;
  for (const part of header.split(';')) {
    const eq = part.indexOf('=');
    if (eq === -1) continue;
    if (part.slice(0, eq).trim() === name) {
      const value = part.slice(eq + 1).trim();
      // Our tokens are base64url; anything else is not ours and is ignored.
      return /^[A-Za-z0-9_-]{32,64}$/.test(value) ? value : undefined;
    }
  }
  return undefined;
}

function setCartCookie(req: Request, res: Response, token: string) {
  // Secure whenever the request came over HTTPS (directly or, with TRUST_PROXY, through a proxy), like the session cookie.
  res.cookie(CART_COOKIE, token, { httpOnly: true, sameSite: 'lax', secure: req.secure, maxAge: CART_COOKIE_MAX_AGE_MS, path: '/' });
}

/** The signed-in user, or this browser's anonymous token (made and set as a cookie when `create`). */
export function cartOwner(req: Request, res: Response, create: boolean): CartOwner | null {
  if (req.user) return { userId: req.user.id };
  const token = readCookie(req, CART_COOKIE);
  if (token) return { anonToken: token };
  if (!create) return null;
  const fresh = randomBytes(32).toString('base64url');
  setCartCookie(req, res, fresh);
  return { anonToken: fresh };
}

async function findCartId(owner: CartOwner): Promise<string | null> {
  const where = 'userId' in owner ? eq(carts.userId, owner.userId) : eq(carts.anonToken, owner.anonToken);
  const [row] = await getDb().select({ id: carts.id }).from(carts).where(where);
  return row?.id ?? null;
}

async function ensureCartId(owner: CartOwner): Promise<string> {
  const existing = await findCartId(owner);
  if (existing) return existing;
  const values = 'userId' in owner ? { userId: owner.userId } : { anonToken: owner.anonToken };
  // Two first adds at once: the unique index keeps one cart, the loser reads it back.
  const [row] = await getDb().insert(carts).values(values).onConflictDoNothing().returning({ id: carts.id });
  return row?.id ?? ((await findCartId(owner)) as string);
}

// ---------- reading and pricing ----------

export interface CartLine {
  listingId: string;
  title: string;
  quantity: number;
  priceCentsAtAdd: number;
  unitPriceCents: number;
  listingState: string;
  listingQuantity: number;
  sellerId: string;
  sellerName: string;
  shopShipsTo: string[] | null;
  partId: string | null;
  category: string;
  weightGrams: number;
  lengthMm: number;
  widthMm: number;
  heightMm: number;
  profileId: string | null;
  profileRules: unknown;
  thumbKey: string | null;
  addedAt: Date;
}

/** Every line of a cart with its listing, seller, category, shipping profile (own or the seller's default) and first photo. */
export async function loadCartLines(cartId: string): Promise<CartLine[]> {
  const defaultProfile = getDb()
    .select({ sellerId: shippingProfiles.sellerId, id: sql<string>`min(${shippingProfiles.id}::text)::uuid`.as('default_id') })
    .from(shippingProfiles)
    .where(eq(shippingProfiles.isDefault, true))
    .groupBy(shippingProfiles.sellerId)
    .as('default_profile');
  const rows = await getDb()
    .select({
      listingId: listings.id,
      title: listings.title,
      quantity: cartItems.quantity,
      priceCentsAtAdd: cartItems.priceCentsAtAdd,
      unitPriceCents: listings.priceCents,
      listingState: listings.state,
      listingQuantity: listings.quantity,
      sellerId: listings.sellerId,
      sellerDisplayName: users.displayName,
      shopName: sellerProfiles.shopName,
      shopShipsTo: sellerProfiles.shipsTo,
      partId: listings.partId,
      category: parts.category,
      weightGrams: listings.weightGrams,
      lengthMm: listings.lengthMm,
      widthMm: listings.widthMm,
      heightMm: listings.heightMm,
      profileId: shippingProfiles.id,
      profileRules: shippingProfiles.rules,
      thumbKey: sql<string | null>`(select ${listingPhotos.thumbKey} from ${listingPhotos} where ${listingPhotos.listingId} = ${listings.id} order by ${listingPhotos.position} limit 1)`,
      addedAt: cartItems.addedAt,
    })
    .from(cartItems)
    .innerJoin(listings, eq(listings.id, cartItems.listingId))
    .innerJoin(users, eq(users.id, listings.sellerId))
    .leftJoin(sellerProfiles, eq(sellerProfiles.userId, listings.sellerId))
    .leftJoin(parts, eq(parts.id, listings.partId))
    .leftJoin(defaultProfile, eq(defaultProfile.sellerId, listings.sellerId))
    .leftJoin(shippingProfiles, sql`${shippingProfiles.id} = coalesce(${listings.shippingProfileId}, ${defaultProfile.id})`)
    .where(eq(cartItems.cartId, cartId))
    .orderBy(asc(cartItems.addedAt), asc(listings.id));
  return rows.map((r) => ({
    ...r,
    sellerName: r.shopName ?? r.sellerDisplayName,
    shopShipsTo: r.shopShipsTo ?? null,
    // Listings not yet linked to the catalog pay the default fee.
    category: r.category ?? 'unlinked',
  }));
}

export interface PricedSeller {
  sellerId: string;
  sellerName: string;
  shippingCents: number;
  shippingExplanation: string;
  lines: CartLine[];
}

export interface PricedCart {
  reply: CartReply;
  /** Every seller whose shipping is quoted, with what checkout charges them. */
  sellers: PricedSeller[];
  /** Sellers whose shipping could not be quoted for the destination. */
  shippingProblems: Array<{ sellerId: string; sellerName: string; reason: ShippingRefusalReason; explanation: string }>;
}

type Quote = { ok: true; amountCents: number; explanation: string } | { ok: false; reason: ShippingRefusalReason; explanation: string };

const parsedProfiles = new WeakMap<object, ShippingProfile | null>();
function parseProfile(rules: unknown): ShippingProfile | null {
  if (typeof rules !== 'object' || rules === null) return null;
  if (!parsedProfiles.has(rules)) {
    const parsed = shippingProfileSchema.safeParse(rules);
    if (!parsed.success) logger.warn({ issues: parsed.error.issues }, 'stored shipping profile does not parse');
    parsedProfiles.set(rules, parsed.success ? parsed.data : null);
  }
  return parsedProfiles.get(rules) ?? null;
}

/**
 * One seller's shipping for these lines: items sharing a profile are quoted together by the domain rules,
 * and the quotes of different profiles add up. The shop's own ships-to list is honoured on top of the profile's.
 */
export function quoteSellerShipping(lines: readonly CartLine[], destination: Destination | null): Quote {
  if (!destination) return { ok: false, reason: 'destination_needed', explanation: 'Choose a destination country or pickup to see shipping.' };
  if ('country' in destination) {
    const shop = lines[0]?.shopShipsTo;
    if (shop && !shop.includes('*') && !shop.includes(destination.country)) {
      return { ok: false, reason: 'does_not_ship_to', explanation: `This seller does not ship to ${destination.country}.` };
    }
  }
  const byProfile = new Map<string, CartLine[]>();
  for (const l of lines) {
    if (!l.profileId) return { ok: false, reason: 'no_shipping_profile', explanation: `"${l.title}" has no shipping set up yet; ask the seller.` };
    byProfile.set(l.profileId, [...(byProfile.get(l.profileId) ?? []), l]);
  }
  let amountCents = 0;
  const explanations: string[] = [];
  for (const group of byProfile.values()) {
    const profile = parseProfile(group[0].profileRules);
    if (!profile) return { ok: false, reason: 'no_shipping_profile', explanation: "This seller's shipping settings need fixing; ask the seller." };
    const items: ShippingItem[] = group.map((l) => ({
      listingId: l.listingId,
      quantity: l.quantity,
      unitPriceCents: l.unitPriceCents,
      weightGrams: l.weightGrams,
      lengthMm: l.lengthMm,
      widthMm: l.widthMm,
      heightMm: l.heightMm,
    }));
    const q = shippingForSeller(profile, items, destination);
    if (!q.ok) return { ok: false, reason: q.reason, explanation: q.explanation };
    amountCents += q.amountCents;
    explanations.push(q.explanation);
  }
  return { ok: true, amountCents, explanation: explanations.join(' + ') };
}

function available(l: CartLine): number {
  return l.listingState === 'approved' ? l.listingQuantity : 0;
}

let storage: ReturnType<typeof createPhotoStorage> | undefined;
function thumbUrl(key: string | null): string | null {
  if (!key) return null;
  storage ??= createPhotoStorage(process.env);
  return storage.url(key);
}

/** Groups the lines by seller, quotes shipping and adds everything up. */
export function priceCart(lines: readonly CartLine[], destination: Destination | null): PricedCart {
  const warnings: CartWarning[] = [];
  const bySeller = new Map<string, CartLine[]>();
  for (const l of lines) bySeller.set(l.sellerId, [...(bySeller.get(l.sellerId) ?? []), l]);
  const groups: CartGroup[] = [];
  const sellers: PricedSeller[] = [];
  const shippingProblems: PricedCart['shippingProblems'] = [];
  let canCheckout = lines.length > 0;
  let itemsTotal = 0;
  let shippingTotal = 0;
  for (const [sellerId, sellerLines] of bySeller) {
    const items: CartItem[] = sellerLines.map((l) => {
      const avail = available(l);
      if (avail === 0) {
        warnings.push({ code: 'not_available', listingId: l.listingId, message: `"${l.title}" is no longer available; remove it to check out.` });
        canCheckout = false;
      } else if (l.quantity > avail) {
        warnings.push({ code: 'quantity_capped', listingId: l.listingId, message: `"${l.title}": only ${avail} left; lower the quantity to check out.` });
        canCheckout = false;
      }
      if (l.unitPriceCents !== l.priceCentsAtAdd) {
        warnings.push({ code: 'price_changed', listingId: l.listingId, message: `"${l.title}" now costs ${money(l.unitPriceCents)} (was ${money(l.priceCentsAtAdd)} when you added it).` });
      }
      return {
        listingId: l.listingId,
        title: l.title,
        quantity: l.quantity,
        available: avail,
        unitPriceCents: l.unitPriceCents,
        priceCentsAtAdd: l.priceCentsAtAdd,
        priceChanged: l.unitPriceCents !== l.priceCentsAtAdd,
        lineCents: l.quantity * l.unitPriceCents,
        thumbnailUrl: thumbUrl(l.thumbKey),
      };
    });
    const itemsCents = items.reduce((a, i) => a + i.lineCents, 0);
    const shipping = quoteSellerShipping(sellerLines, destination);
    if (!shipping.ok) {
      canCheckout = false;
      shippingProblems.push({ sellerId, sellerName: sellerLines[0].sellerName, reason: shipping.reason, explanation: shipping.explanation });
      if (shipping.reason !== 'destination_needed') {
        warnings.push({ code: 'shipping_unavailable', sellerId, message: `${sellerLines[0].sellerName}: ${shipping.explanation}` });
      }
    }
    itemsTotal += itemsCents;
    if (shipping.ok) {
      shippingTotal += shipping.amountCents;
      sellers.push({ sellerId, sellerName: sellerLines[0].sellerName, shippingCents: shipping.amountCents, shippingExplanation: shipping.explanation, lines: sellerLines });
    }
    groups.push({ seller: { id: sellerId, name: sellerLines[0].sellerName }, items, itemsCents, shipping });
  }
  return {
    reply: {
      groups,
      destination,
      itemsCents: itemsTotal,
      shippingCents: shippingTotal,
      totalCents: itemsTotal + shippingTotal,
      canCheckout,
      warnings,
    },
    sellers,
    shippingProblems,
  };
}

const money = (cents: number) => `$${(cents / 100).toFixed(2)}`;

const emptyCart = (destination: Destination | null): CartReply => ({
  groups: [],
  destination,
  itemsCents: 0,
  shippingCents: 0,
  totalCents: 0,
  canCheckout: false,
  warnings: [],
});

export async function viewCart(owner: CartOwner | null, destination: Destination | null, extraWarnings: CartWarning[] = []): Promise<CartReply> {
  const cartId = owner ? await findCartId(owner) : null;
  if (!cartId) return { ...emptyCart(destination), warnings: extraWarnings };
  const priced = priceCart(await loadCartLines(cartId), destination);
  return { ...priced.reply, warnings: [...extraWarnings, ...priced.reply.warnings] };
}

/** The signed-in buyer's cart id and lines (for checkout); null when there is no cart. */
export async function userCart(userId: string): Promise<{ cartId: string; lines: CartLine[] } | null> {
  const cartId = await findCartId({ userId });
  if (!cartId) return null;
  return { cartId, lines: await loadCartLines(cartId) };
}

// ---------- changing ----------

async function liveListing(listingId: string) {
  const [l] = await getDb()
    .select({ id: listings.id, title: listings.title, state: listings.state, quantity: listings.quantity, priceCents: listings.priceCents, sellerId: listings.sellerId })
    .from(listings)
    .where(eq(listings.id, listingId));
  if (!l || (l.state !== 'approved' && l.state !== 'sold_out')) throw notFound('Listing');
  return l;
}

function capped(title: string, listingId: string, wanted: number, avail: number): { quantity: number; warning?: CartWarning } {
  if (avail <= 0) throw new AppError(409, 'conflict', `"${title}" is sold out.`, { listingId, available: 0 });
  if (wanted <= avail) return { quantity: wanted };
  return {
    quantity: avail,
    warning: { code: 'quantity_capped', listingId, message: `"${title}": only ${avail} available, so your cart holds ${avail}.` },
  };
}

/** Adds units of a listing (on top of what the cart holds), capped by stock; the price is remembered as of now. */
export async function addItem(owner: CartOwner, listingId: string, quantity: number): Promise<CartWarning[]> {
  const l = await liveListing(listingId);
  if ('userId' in owner && owner.userId === l.sellerId) throw new AppError(409, 'conflict', 'This is your own listing; you cannot buy it.');
  const cartId = await ensureCartId(owner);
  const [current] = await getDb().select({ quantity: cartItems.quantity }).from(cartItems).where(and(eq(cartItems.cartId, cartId), eq(cartItems.listingId, listingId)));
  const c = capped(l.title, listingId, (current?.quantity ?? 0) + quantity, l.state === 'approved' ? l.quantity : 0);
  await getDb()
    .insert(cartItems)
    .values({ cartId, listingId, quantity: c.quantity, priceCentsAtAdd: l.priceCents })
    .onConflictDoUpdate({ target: [cartItems.cartId, cartItems.listingId], set: { quantity: c.quantity, priceCentsAtAdd: l.priceCents } });
  await touch(cartId);
  return c.warning ? [c.warning] : [];
}

/** Sets the quantity of a line already in the cart, capped by stock. */
export async function setItemQuantity(owner: CartOwner, listingId: string, quantity: number): Promise<CartWarning[]> {
  const cartId = await findCartId(owner);
  const [line] = cartId
    ? await getDb().select({ quantity: cartItems.quantity }).from(cartItems).where(and(eq(cartItems.cartId, cartId), eq(cartItems.listingId, listingId)))
    : [];
  if (!cartId || !line) throw notFound('Cart item');
  const l = await liveListing(listingId);
  const c = capped(l.title, listingId, quantity, l.state === 'approved' ? l.quantity : 0);
  await getDb().update(cartItems).set({ quantity: c.quantity }).where(and(eq(cartItems.cartId, cartId), eq(cartItems.listingId, listingId)));
  await touch(cartId);
  return c.warning ? [c.warning] : [];
}

export async function removeItem(owner: CartOwner, listingId: string): Promise<void> {
  const cartId = await findCartId(owner);
  if (!cartId) throw notFound('Cart item');
  const removed = await getDb().delete(cartItems).where(and(eq(cartItems.cartId, cartId), eq(cartItems.listingId, listingId))).returning({ listingId: cartItems.listingId });
  if (!removed.length) throw notFound('Cart item');
  await touch(cartId);
}

async function touch(cartId: string) {
  await getDb().update(carts).set({ updatedAt: new Date() }).where(eq(carts.id, cartId));
}

/**
 * At sign-in: moves this browser's anonymous cart into the user's cart (quantities add up, capped by stock;
 * the user's own listings are dropped), deletes the anonymous cart and clears its cookie.
 */
export async function mergeAnonymousCart(req: Request, res: Response, userId: string): Promise<void> {
  const token = readCookie(req, CART_COOKIE);
  if (!token) return;
  res.clearCookie(CART_COOKIE, { path: '/' });
  const db = getDb();
  await db.transaction(async (tx) => {
    const [anon] = await tx.select({ id: carts.id }).from(carts).where(eq(carts.anonToken, token)).for('update');
    if (!anon) return;
    const items = await tx.select().from(cartItems).where(eq(cartItems.cartId, anon.id));
    if (items.length) {
      await tx.insert(carts).values({ userId }).onConflictDoNothing();
      const [mine] = await tx.select({ id: carts.id }).from(carts).where(eq(carts.userId, userId));
      const stock = await tx
        .select({ id: listings.id, quantity: listings.quantity, state: listings.state, sellerId: listings.sellerId })
        .from(listings)
        .where(inArray(listings.id, items.map((i) => i.listingId)));
      const byId = new Map(stock.map((s) => [s.id, s]));
      for (const item of items) {
        const s = byId.get(item.listingId);
        if (!s || s.sellerId === userId || s.state !== 'approved' || s.quantity <= 0) continue;
        await tx
          .insert(cartItems)
          .values({ cartId: mine.id, listingId: item.listingId, quantity: Math.min(item.quantity, s.quantity), priceCentsAtAdd: item.priceCentsAtAdd })
          .onConflictDoUpdate({
            target: [cartItems.cartId, cartItems.listingId],
            set: { quantity: sql`least(${cartItems.quantity} + ${item.quantity}, ${s.quantity})` },
          });
      }
    }
    await tx.delete(carts).where(eq(carts.id, anon.id));
  });
}

/** After payment: the bought listings leave the buyer's cart (items added since stay). */
export async function removeBoughtItems(tx: Tx, buyerId: string, listingIds: string[]): Promise<void> {
  if (!listingIds.length) return;
  await tx.execute(sql`
    DELETE FROM cart_items ci USING carts c
    WHERE ci.cart_id = c.id AND c.user_id = ${buyerId} AND ci.listing_id IN (${sql.join(listingIds.map((id) => sql`${id}::uuid`), sql`, `)})`);
}
