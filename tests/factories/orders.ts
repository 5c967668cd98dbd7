import { randomUUID } from 'node:crypto';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { eq } from 'drizzle-orm';
import type { Express } from 'express';
import request from 'supertest';
import Stripe from 'stripe';
import { startStripeFake, type StripeFake } from '../../docker-free-fakes/stripe/app';
import { createApp } from '../../server/app';
import { getDb } from '../../server/db/client';
import { listings, orders, sellerProfiles, shippingProfiles } from '../../server/db/schema/index';
import type { ShippingProfileInput } from '../../server/domain/shipping';
import { shippingProfileSchema } from '../../server/domain/shipping';
import { resetStripeClient } from '../../server/services/stripe-client';
import { createPart } from './catalog';
import { createUser, ORIGIN, signIn } from './users';

/*
 * Direct inserts for the payment tests (shops, shipping profiles, live listings) and a harness: the app
 * listening on port 0 as the webhook target of a Stripe stand-in of its own, with the app's Stripe client
 * pointed at it. All names are fictional.
 */

export type Agent = ReturnType<typeof request.agent>;

export interface PaymentsHarness {
  app: Express;
  fake: StripeFake;
  /** The official SDK pointed at the stand-in, for the tests' own checks of Stripe's side. */
  stripe: Stripe;
  webhookSecret: string;
  close(): Promise<void>;
}

export async function startPaymentsHarness(): Promise<PaymentsHarness> {
  const webhookSecret = `whsec_test_${randomUUID().replaceAll('-', '')}`;
  const app = createApp();
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  const fake = await startStripeFake({
    port: 0,
    webhookSecret,
    webhookUrl: `http://127.0.0.1:${port}/api/webhooks/stripe`,
    retryDelaysMs: [50, 100, 200, 400],
    expirySweepMs: 0,
  });
  Object.assign(process.env, {
    STRIPE_API_HOST: '127.0.0.1',
    STRIPE_API_PORT: String(fake.port),
    STRIPE_API_PROTOCOL: 'http',
    STRIPE_WEBHOOK_SECRET: webhookSecret,
  });
  resetStripeClient();
  return {
    app,
    fake,
    stripe: new Stripe('sk_test_drabyard_harness', { host: '127.0.0.1', port: fake.port, protocol: 'http' }),
    webhookSecret,
    async close() {
      await fake.close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      resetStripeClient();
    },
  };
}

const flatProfile: ShippingProfileInput = { kind: 'flat_per_order', amountCents: 1200, shipsTo: ['US', 'CA'], pickupAvailable: true };

/** A seller (buyer + seller roles) with a shop and a default shipping profile. */
export async function createShop(
  opts: { shopName?: string; shipsTo?: string[]; profile?: ShippingProfileInput; payoutsEnabled?: boolean; stripeAccountId?: string | null; withShop?: boolean } = {},
) {
  const user = await createUser({ roles: ['buyer', 'seller'], displayName: opts.shopName ?? 'Fictional Seller' });
  if (opts.withShop !== false) {
    await getDb()
      .insert(sellerProfiles)
      .values({
        userId: user.id,
        shopName: opts.shopName ?? `Fictional Surplus ${randomUUID().slice(0, 4)}`,
        shipsTo: opts.shipsTo ?? ['*'],
        payoutsEnabled: opts.payoutsEnabled ?? false,
        stripeAccountId: opts.stripeAccountId ?? null,
      });
  }
  const profile = await createShippingProfile(user.id, opts.profile ?? flatProfile, true);
  return { user, profile };
}

export async function createShippingProfile(sellerId: string, rules: ShippingProfileInput, isDefault = false) {
  const [p] = await getDb()
    .insert(shippingProfiles)
    .values({ sellerId, name: `Profile ${rules.kind}`, rules: shippingProfileSchema.parse(rules), isDefault })
    .returning();
  return p;
}

/** An approved (live) listing of a fictional part. */
export async function createLiveListing(
  sellerId: string,
  over: { quantity?: number; priceCents?: number; category?: string; title?: string; shippingProfileId?: string | null; weightGrams?: number; lengthMm?: number; widthMm?: number; heightMm?: number } = {},
) {
  const part = await createPart({ category: over.category ?? 'generic' });
  const [l] = await getDb()
    .insert(listings)
    .values({
      sellerId,
      partId: part.id,
      title: over.title ?? `Fictional ${part.name}`,
      condition: 'reproduction',
      quantity: over.quantity ?? 5,
      priceCents: over.priceCents ?? 2500,
      weightGrams: over.weightGrams ?? 500,
      lengthMm: over.lengthMm ?? 100,
      widthMm: over.widthMm ?? 100,
      heightMm: over.heightMm ?? 100,
      shippingProfileId: over.shippingProfileId ?? null,
      state: 'approved',
      approvedAt: new Date(),
    })
    .returning();
  return l;
}

export async function listingRow(id: string) {
  const [l] = await getDb().select().from(listings).where(eq(listings.id, id));
  return l;
}

export async function orderRow(id: string) {
  const [o] = await getDb().select().from(orders).where(eq(orders.id, id));
  return o;
}

/** A signed-in buyer. */
export async function buyer(app: Express) {
  const user = await createUser({ roles: ['buyer'], displayName: 'Fictional Restorer' });
  return { user, agent: await signIn(app, user) };
}

export async function addToCart(agent: Agent, listingId: string, quantity = 1) {
  const r = await agent.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId, quantity });
  if (r.status !== 201) throw new Error(`add to cart failed: ${r.status} ${JSON.stringify(r.body)}`);
  return r.body;
}

export async function checkout(agent: Agent, destination: { country: string } | { pickup: true } = { country: 'US' }) {
  return agent.post('/api/checkout').set('Origin', ORIGIN).send({ destination });
}

/** The Checkout Session id of an order (set once the session exists). */
export async function sessionOf(orderId: string): Promise<string> {
  const o = await orderRow(orderId);
  if (!o?.checkoutSessionId) throw new Error('order has no checkout session');
  return o.checkoutSessionId;
}

/** An invented shipping address, as a buyer types it on the payment page. */
export const TEST_SHIP_TO = { name: 'Ada Fenner', line1: '7 Tannery Row', city: 'Hollin Ford', state: 'OH', postal_code: '45999' };

/** Pays the order's session with a test card (and the test address when it ships) and waits for the webhooks. */
export async function payOrder(h: PaymentsHarness, orderId: string) {
  const outcome = h.fake.pay(await sessionOf(orderId), { number: '4242424242424242', expiry: '12/40', cvc: '123', shipping: TEST_SHIP_TO });
  if (outcome.kind !== 'paid') throw new Error(`payment did not go through: ${outcome.kind}`);
  await h.fake.waitForDeliveries(15_000);
  return outcome;
}

/** Waits until `check` holds (polls), for effects that run after a webhook's commit. */
export async function eventually<T>(check: () => Promise<T>, ok: (v: T) => boolean, timeoutMs = 8000): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const v = await check();
    if (ok(v) || Date.now() > until) return v;
    await new Promise((r) => setTimeout(r, 50));
  }
}
