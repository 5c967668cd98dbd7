import { and, asc, eq, lte } from 'drizzle-orm';
import type Stripe from 'stripe';
import { getDb } from '../db/client';
import { orders } from '../db/schema/index';
import { logger } from '../lib/logger';
import { closePendingOrder, expireStripeSession } from '../services/checkout';
import { payPendingTransfers, reverseOverpaidTransfers } from '../services/payouts';
import { processCompletedSession } from '../services/stripe-webhooks';

/*
 * The sweeper: checkouts left unpaid past their hold are expired (at Stripe first, so the session can no
 * longer be paid, then here, giving the stock back), and transfers that failed for a passing reason are
 * tried again. Several app servers may run it at once: each order is taken with FOR UPDATE SKIP LOCKED.
 */

const BATCH = 100;

export interface SweepResult {
  expired: number;
  /** Orders found paid at Stripe whose webhook had not arrived; processed now. */
  paid: number;
}

/** Expires every unpaid order whose hold ended at or before `now`, releasing its stock. */
export async function releaseExpiredReservations(now: Date = new Date()): Promise<SweepResult> {
  const db = getDb();
  const result: SweepResult = { expired: 0, paid: 0 };
  const skip = new Set<string>();
  for (let i = 0; i < BATCH; i++) {
    const outcome = await db.transaction(async (tx) => {
      const candidates = await tx
        .select({ id: orders.id, sessionId: orders.checkoutSessionId })
        .from(orders)
        .where(and(eq(orders.state, 'pending_payment'), lte(orders.expiresAt, now)))
        .orderBy(asc(orders.expiresAt))
        .limit(skip.size + 1)
        .for('update', { skipLocked: true });
      const order = candidates.find((c) => !skip.has(c.id));
      if (!order) return null;
      if (order.sessionId) {
        const stripe = await expireStripeSession(order.sessionId);
        if (stripe.status === 'complete' && stripe.session) return { kind: 'complete' as const, id: order.id, session: stripe.session };
        if (stripe.status !== 'expired') return { kind: 'skip' as const, id: order.id };
      }
      await closePendingOrder(tx, order.id, 'expired');
      return { kind: 'expired' as const, id: order.id };
    });
    if (!outcome) break;
    if (outcome.kind === 'expired') result.expired += 1;
    if (outcome.kind === 'skip') skip.add(outcome.id);
    if (outcome.kind === 'complete') {
      skip.add(outcome.id);
      await processCompletedSession(outcome.session as Stripe.Checkout.Session);
      result.paid += 1;
    }
  }
  return result;
}

export interface StockSweeper {
  stop(): Promise<void>;
  /** Runs one sweep now (waits for a running one first). */
  runOnce(): Promise<void>;
}

/** Starts the sweeper every `intervalMs` (no overlapping runs); `stop()` waits for a running sweep. */
export function startStockSweeper(intervalMs: number): StockSweeper {
  let running: Promise<void> | null = null;
  const sweep = () => {
    running ??= (async () => {
      try {
        const r = await releaseExpiredReservations();
        if (r.expired || r.paid) logger.info(r, 'stock sweeper: expired checkouts');
        await payPendingTransfers({ all: true });
        await reverseOverpaidTransfers({ all: true });
      } catch (err) {
        logger.error({ err }, 'stock sweeper failed; will try again');
      } finally {
        running = null;
      }
    })();
    return running;
  };
  const timer = intervalMs > 0 ? setInterval(() => void sweep(), intervalMs) : undefined;
  timer?.unref();
  return {
    async stop() {
      if (timer) clearInterval(timer);
      await running;
    },
    runOnce: async () => {
      await running;
      await sweep();
    },
  };
}
