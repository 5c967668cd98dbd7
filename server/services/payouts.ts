import { and, desc, eq, inArray, isNotNull, sql } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { PayoutState } from '../../shared/schemas/orders';
import type { SessionUser } from '../auth/require-role';
import { getDb } from '../db/client';
import { orders, sellerProfiles, subOrders, transfers } from '../db/schema/index';
import { loadEnv } from '../env';
import { AppError, invalidState } from '../errors';
import { logger } from '../lib/logger';
import type { Tx } from './stock';
import { getStripe, stripeErrorInfo } from './stripe-client';

/*
 * Paying sellers: a Stripe connected account per seller, onboarded on Stripe's page; after each payment one
 * transfer per sub-order (separate charges and transfers, tied together by the order's transfer group).
 * Nothing is transferred before the seller's onboarding is complete: the transfer waits and goes out when
 * Stripe tells us (account.updated) that payouts are enabled.
 */

/** An account can be paid once its details are in and Stripe enabled payouts. */
export function accountCanBePaid(account: Pick<Stripe.Account, 'payouts_enabled' | 'details_submitted'>): boolean {
  return account.payouts_enabled === true && account.details_submitted === true;
}

/** At payment (inside its transaction): one transfer row per sub-order, waiting when the seller is not onboarded. */
export async function createTransferRows(tx: Tx, orderId: string): Promise<void> {
  const subs = await tx
    .select({ id: subOrders.id, sellerId: subOrders.sellerId, shareCents: subOrders.shareCents, payoutsEnabled: sellerProfiles.payoutsEnabled, account: sellerProfiles.stripeAccountId })
    .from(subOrders)
    .leftJoin(sellerProfiles, eq(sellerProfiles.userId, subOrders.sellerId))
    .where(eq(subOrders.orderId, orderId));
  if (!subs.length) return;
  await tx
    .insert(transfers)
    .values(
      subs.map((s) => ({
        subOrderId: s.id,
        sellerId: s.sellerId,
        amountCents: s.shareCents,
        state: s.payoutsEnabled && s.account ? ('pending' as const) : ('waiting_for_onboarding' as const),
      })),
    )
    .onConflictDoNothing();
}

/** When a seller's onboarding completes: their waiting transfers become due. Returns how many. */
export async function releaseWaitingTransfers(tx: Tx, sellerId: string): Promise<number> {
  const rows = await tx
    .update(transfers)
    .set({ state: 'pending' })
    .where(and(eq(transfers.sellerId, sellerId), eq(transfers.state, 'waiting_for_onboarding')))
    .returning({ id: transfers.id });
  return rows.length;
}

/**
 * Records what Stripe says about a connected account (inside the webhook's transaction). Returns the seller
 * id when their payouts just became possible, so the caller sends their waiting transfers after commit.
 */
export async function applyAccountState(tx: Tx, account: Stripe.Account): Promise<string | null> {
  const enabled = accountCanBePaid(account);
  const [before] = await tx
    .select({ userId: sellerProfiles.userId, payoutsEnabled: sellerProfiles.payoutsEnabled })
    .from(sellerProfiles)
    .where(eq(sellerProfiles.stripeAccountId, account.id))
    .for('update');
  if (!before) return null;
  if (before.payoutsEnabled !== enabled) {
    await tx.update(sellerProfiles).set({ payoutsEnabled: enabled }).where(eq(sellerProfiles.userId, before.userId));
  }
  if (!enabled) return null;
  const released = await releaseWaitingTransfers(tx, before.userId);
  return released > 0 || !before.payoutsEnabled ? before.userId : null;
}

async function chargeIdFor(order: { id: string; chargeId: string | null; paymentIntentId: string | null }): Promise<string | null> {
  if (order.chargeId) return order.chargeId;
  if (!order.paymentIntentId) return null;
  const intent = await getStripe().paymentIntents.retrieve(order.paymentIntentId);
  const charge = typeof intent.latest_charge === 'string' ? intent.latest_charge : (intent.latest_charge?.id ?? null);
  if (charge) await getDb().update(orders).set({ chargeId: charge }).where(eq(orders.id, order.id));
  return charge;
}

/**
 * Sends every due ('pending') transfer of an order, or of a seller. Safe to call again and from several
 * places at once: the idempotency key is the transfer row's id, so Stripe makes each transfer once.
 * Network or Stripe-side failures leave the row pending for the sweeper to retry.
 */
export async function payPendingTransfers(scope: { orderId: string } | { sellerId: string } | { all: true }): Promise<number> {
  const db = getDb();
  const where = [eq(transfers.state, 'pending')];
  if ('orderId' in scope) where.push(eq(subOrders.orderId, scope.orderId));
  if ('sellerId' in scope) where.push(eq(transfers.sellerId, scope.sellerId));
  const due = await db
    .select({
      id: transfers.id,
      subOrderId: transfers.subOrderId,
      amountCents: transfers.amountCents,
      account: sellerProfiles.stripeAccountId,
      payoutsEnabled: sellerProfiles.payoutsEnabled,
      order: { id: orders.id, chargeId: orders.chargeId, paymentIntentId: orders.paymentIntentId, transferGroup: orders.transferGroup, currency: orders.currency },
    })
    .from(transfers)
    .innerJoin(subOrders, eq(subOrders.id, transfers.subOrderId))
    .innerJoin(orders, eq(orders.id, subOrders.orderId))
    .leftJoin(sellerProfiles, eq(sellerProfiles.userId, transfers.sellerId))
    .where(and(...where))
    .limit(200);
  let paid = 0;
  for (const t of due) {
    if (!t.account || !t.payoutsEnabled) {
      await db.update(transfers).set({ state: 'waiting_for_onboarding' }).where(and(eq(transfers.id, t.id), eq(transfers.state, 'pending')));
      continue;
    }
    if (t.amountCents <= 0) {
      // Refunded in full before it went out: nothing is owed.
      await db.update(transfers).set({ state: 'paid' }).where(and(eq(transfers.id, t.id), eq(transfers.state, 'pending')));
      continue;
    }
    try {
      const charge = await chargeIdFor(t.order);
      const tr = await getStripe().transfers.create(
        {
          amount: t.amountCents,
          currency: t.order.currency,
          destination: t.account,
          transfer_group: t.order.transferGroup,
          ...(charge ? { source_transaction: charge } : {}),
          metadata: { orderId: t.order.id, subOrderId: t.subOrderId },
        },
        { idempotencyKey: `transfer-${t.id}` },
      );
      await db.transaction(async (tx) => {
        await tx.update(transfers).set({ state: 'paid', stripeTransferId: tr.id, sentCents: t.amountCents }).where(eq(transfers.id, t.id));
        await tx.update(subOrders).set({ transferId: tr.id }).where(eq(subOrders.id, t.subOrderId));
      });
      paid += 1;
    } catch (err) {
      const info = stripeErrorInfo(err);
      logger.warn({ err: info ?? err, transferId: t.id }, 'transfer to seller failed');
      if (info?.code === 'insufficient_capabilities_for_transfer') {
        // Stripe says the account cannot receive money after all: wait for the next account.updated.
        await db.transaction(async (tx) => {
          await tx.update(transfers).set({ state: 'waiting_for_onboarding' }).where(eq(transfers.id, t.id));
          await tx.update(sellerProfiles).set({ payoutsEnabled: false }).where(eq(sellerProfiles.stripeAccountId, t.account as string));
        });
      } else if (info && info.status !== undefined && info.status >= 400 && info.status < 500 && info.status !== 429) {
        await db.update(transfers).set({ state: 'failed' }).where(eq(transfers.id, t.id));
      }
    }
  }
  return paid;
}

/**
 * Takes back from sellers' accounts what refunds made after their transfer went out: a paid transfer that sent
 * more than the seller is now owed (`amount_cents`, lowered by each refund) is reversed by the difference.
 * Stripe's own record of the transfer is the truth (re-read first), and the idempotency key names the transfer
 * and what Stripe had reversed before, so a retry after a lost answer repeats the same step and a later refund
 * makes a new one. Failures stay due for the next call (the sweeper calls it too).
 */
export async function reverseOverpaidTransfers(scope: { orderId: string } | { all: true }): Promise<number> {
  const db = getDb();
  const where = [eq(transfers.state, 'paid'), isNotNull(transfers.stripeTransferId), sql`${transfers.sentCents} - ${transfers.reversedCents} > ${transfers.amountCents}`];
  if ('orderId' in scope) where.push(eq(subOrders.orderId, scope.orderId));
  const due = await db
    .select({ id: transfers.id, stripeTransferId: transfers.stripeTransferId, amountCents: transfers.amountCents, orderId: subOrders.orderId, subOrderId: transfers.subOrderId })
    .from(transfers)
    .innerJoin(subOrders, eq(subOrders.id, transfers.subOrderId))
    .where(and(...where))
    .limit(200);
  let reversed = 0;
  for (const t of due) {
    const stripeId = t.stripeTransferId as string;
    try {
      const at = await getStripe().transfers.retrieve(stripeId);
      const owed = at.amount - at.amount_reversed - t.amountCents;
      if (owed > 0) {
        await getStripe().transfers.createReversal(
          stripeId,
          { amount: owed, metadata: { orderId: t.orderId, subOrderId: t.subOrderId } },
          { idempotencyKey: `reversal-${t.id}-${at.amount_reversed}` },
        );
        reversed += 1;
      }
      await db.update(transfers).set({ sentCents: at.amount, reversedCents: at.amount_reversed + Math.max(owed, 0) }).where(eq(transfers.id, t.id));
    } catch (err) {
      logger.warn({ err: stripeErrorInfo(err) ?? err, transferId: t.id }, 'taking a refund back from the seller failed; it stays due');
    }
  }
  return reversed;
}

async function sellerProfileOf(userId: string) {
  const [p] = await getDb().select().from(sellerProfiles).where(eq(sellerProfiles.userId, userId));
  return p;
}

/** Payout onboarding state and money in transfers; asks Stripe again while onboarding is not complete. */
export async function payoutState(seller: SessionUser): Promise<PayoutState> {
  let profile = await sellerProfileOf(seller.id);
  if (profile?.stripeAccountId && !profile.payoutsEnabled) {
    // The seller may come straight back from the onboarding page, before the webhook: ask Stripe.
    try {
      const account = await getStripe().accounts.retrieve(profile.stripeAccountId);
      const becameEnabled = await getDb().transaction((tx) => applyAccountState(tx, account));
      if (becameEnabled) await payPendingTransfers({ sellerId: seller.id });
      profile = await sellerProfileOf(seller.id);
    } catch (err) {
      logger.warn({ err: stripeErrorInfo(err) ?? err }, 'could not refresh the connected account');
    }
  }
  const sums = await getDb()
    .select({ state: transfers.state, cents: sql<number>`coalesce(sum(${transfers.amountCents}), 0)`.mapWith(Number) })
    .from(transfers)
    .where(and(eq(transfers.sellerId, seller.id), inArray(transfers.state, ['paid', 'pending', 'waiting_for_onboarding'])))
    .groupBy(transfers.state);
  const sum = (s: string) => sums.find((r) => r.state === s)?.cents ?? 0;
  return {
    hasAccount: Boolean(profile?.stripeAccountId),
    payoutsEnabled: Boolean(profile?.payoutsEnabled),
    transfers: { paidCents: sum('paid'), pendingCents: sum('pending'), waitingForOnboardingCents: sum('waiting_for_onboarding') },
  };
}

/** Makes the seller's connected account when missing and returns a fresh onboarding link (single use, short-lived). */
export async function startOnboarding(seller: SessionUser): Promise<{ url: string }> {
  const profile = await sellerProfileOf(seller.id);
  if (!profile) throw invalidState('Set up your shop profile before payouts.');
  if (profile.payoutsEnabled) throw invalidState('Payouts are already set up for your shop.');
  const stripe = getStripe();
  let accountId = profile.stripeAccountId;
  if (!accountId) {
    const account = await stripe.accounts.create(
      {
        type: 'express',
        email: seller.email,
        country: profile.country,
        capabilities: { card_payments: { requested: true }, transfers: { requested: true } },
        business_profile: { name: profile.shopName },
        metadata: { userId: seller.id },
      },
      { idempotencyKey: `connected-account-${seller.id}` },
    );
    // Only the first writer keeps its account id: a concurrent second click reuses it (same idempotency key anyway).
    await getDb()
      .update(sellerProfiles)
      .set({ stripeAccountId: sql`coalesce(${sellerProfiles.stripeAccountId}, ${account.id})` })
      .where(eq(sellerProfiles.userId, seller.id));
    accountId = (await sellerProfileOf(seller.id))?.stripeAccountId ?? account.id;
  }
  const origin = loadEnv(process.env).APP_ORIGIN;
  try {
    const link = await stripe.accountLinks.create({
      account: accountId,
      type: 'account_onboarding',
      refresh_url: `${origin}/seller/payouts?onboarding=refresh`,
      return_url: `${origin}/seller/payouts?onboarding=done`,
    });
    return { url: link.url };
  } catch (err) {
    logger.error({ err: stripeErrorInfo(err) ?? err }, 'creating the onboarding link failed');
    throw new AppError(503, 'service_unavailable', 'The onboarding page is not available right now; please try again.');
  }
}

/** The seller's latest transfers, newest first (for the payouts page). */
export async function recentTransfers(sellerId: string, limit = 50) {
  const rows = await getDb()
    .select({ id: transfers.id, subOrderId: transfers.subOrderId, amountCents: transfers.amountCents, state: transfers.state, createdAt: transfers.createdAt, orderId: subOrders.orderId })
    .from(transfers)
    .innerJoin(subOrders, eq(subOrders.id, transfers.subOrderId))
    .where(eq(transfers.sellerId, sellerId))
    .orderBy(desc(transfers.createdAt))
    .limit(limit);
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}
