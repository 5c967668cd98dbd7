import { and, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { listingEvents, listings, stockReservations } from '../db/schema/index';
import { AppError } from '../errors';

/*
 * Stock held for checkouts. listings.quantity is what can be bought now: a checkout takes units off it with
 * one conditional UPDATE (never below zero, so two buyers cannot both get the last unit), records a 'held'
 * reservation, and either commits it at payment or gives the units back at expiry. Each step moves a
 * reservation out of 'held' in the same statement that touches the stock, so running it twice does nothing.
 */

export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

export interface StockRequest {
  listingId: string;
  quantity: number;
  title?: string;
}

export interface StockRefusal {
  listingId: string;
  title: string;
  requested: number;
  available: number;
}

/** Thrown when a listing has fewer units than asked; details name the listing and what is left. */
export function outOfStock(refusal: StockRefusal): AppError {
  const left = refusal.available === 0 ? 'none are left' : `only ${refusal.available} ${refusal.available === 1 ? 'is' : 'are'} left`;
  return new AppError(409, 'conflict', `"${refusal.title}": you asked for ${refusal.requested} but ${left}.`, { outOfStock: [refusal] });
}

/**
 * Takes the units off the listings and records 'held' reservations for the order, all or nothing (the caller's
 * transaction rolls back on the thrown refusal). Listings are taken in id order so two carts sharing listings
 * lock them in the same order and cannot deadlock.
 */
export async function reserveStock(tx: Tx, orderId: string, requests: readonly StockRequest[]): Promise<void> {
  const sorted = [...requests].sort((a, b) => (a.listingId < b.listingId ? -1 : a.listingId > b.listingId ? 1 : 0));
  for (const r of sorted) {
    const [taken] = await tx
      .update(listings)
      .set({ quantity: sql`${listings.quantity} - ${r.quantity}` })
      .where(and(eq(listings.id, r.listingId), eq(listings.state, 'approved'), sql`${listings.quantity} >= ${r.quantity}`))
      .returning({ id: listings.id });
    if (!taken) {
      const [now] = await tx.select({ quantity: listings.quantity, state: listings.state, title: listings.title }).from(listings).where(eq(listings.id, r.listingId));
      throw outOfStock({
        listingId: r.listingId,
        title: now?.title ?? r.title ?? 'This listing',
        requested: r.quantity,
        available: now && now.state === 'approved' ? now.quantity : 0,
      });
    }
  }
  if (sorted.length) {
    await tx.insert(stockReservations).values(sorted.map((r) => ({ orderId, listingId: r.listingId, quantity: r.quantity, state: 'held' as const })));
  }
}

/**
 * At payment: the held units are sold. A listing left with no units becomes 'sold_out' (the life cycle's
 * system action). Returns how many reservations moved, 0 when they were not held any more.
 */
export async function commitReservations(tx: Tx, orderId: string): Promise<number> {
  const moved = await tx
    .update(stockReservations)
    .set({ state: 'committed' })
    .where(and(eq(stockReservations.orderId, orderId), eq(stockReservations.state, 'held')))
    .returning({ listingId: stockReservations.listingId });
  if (moved.length) await markSoldOut(tx, [...new Set(moved.map((m) => m.listingId))]);
  return moved.length;
}

async function markSoldOut(tx: Tx, listingIds: string[]): Promise<void> {
  const soldOut = await tx
    .update(listings)
    .set({ state: 'sold_out' })
    .where(and(inArray(listings.id, listingIds), eq(listings.state, 'approved'), eq(listings.quantity, 0)))
    .returning({ id: listings.id });
  if (soldOut.length) {
    await tx.insert(listingEvents).values(soldOut.map((l) => ({ listingId: l.id, actorId: null, action: 'sell_out', fromState: 'approved', toState: 'sold_out' })));
  }
}

/**
 * Gives the held units of an order back, in one statement: only 'held' rows are released, so a replayed
 * expiry or a second sweeper adds nothing. A sold-out listing that gets units back is live again.
 * Returns the units released per listing.
 */
export async function releaseReservations(tx: Tx, orderId: string): Promise<Array<{ listingId: string; quantity: number }>> {
  const result = await tx.execute<{ listing_id: string; quantity: number; restocked: boolean }>(sql`
    WITH released AS (
      UPDATE stock_reservations SET state = 'released'
      WHERE order_id = ${orderId} AND state = 'held'
      RETURNING listing_id, quantity
    ), per_listing AS (
      SELECT listing_id, sum(quantity)::int AS quantity FROM released GROUP BY listing_id
    )
    UPDATE listings l
    SET quantity = l.quantity + p.quantity,
        state = CASE WHEN l.state = 'sold_out' THEN 'approved' ELSE l.state END,
        updated_at = now()
    FROM per_listing p, listings old
    WHERE l.id = p.listing_id AND old.id = l.id
    RETURNING l.id AS listing_id, p.quantity, (old.state = 'sold_out') AS restocked`);
  await logRestocks(tx, result.rows.filter((r) => r.restocked).map((r) => r.listing_id));
  return result.rows.map((r) => ({ listingId: r.listing_id, quantity: Number(r.quantity) }));
}

/** Puts refunded units back on a listing (restock on refund). A sold-out listing is live again. */
export async function restockUnits(tx: Tx, listingId: string, quantity: number): Promise<void> {
  if (quantity <= 0) return;
  const result = await tx.execute<{ restocked: boolean }>(sql`
    UPDATE listings l
    SET quantity = l.quantity + ${quantity},
        state = CASE WHEN l.state = 'sold_out' THEN 'approved' ELSE l.state END,
        updated_at = now()
    FROM listings old
    WHERE l.id = ${listingId} AND old.id = l.id
    RETURNING (old.state = 'sold_out') AS restocked`);
  if (result.rows[0]?.restocked) await logRestocks(tx, [listingId]);
}

async function logRestocks(tx: Tx, listingIds: string[]): Promise<void> {
  if (!listingIds.length) return;
  await tx.insert(listingEvents).values(listingIds.map((id) => ({ listingId: id, actorId: null, action: 'restock', fromState: 'sold_out', toState: 'approved' })));
}
