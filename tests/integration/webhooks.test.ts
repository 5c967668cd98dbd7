import { eq } from 'drizzle-orm';
import Stripe from 'stripe';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '../../server/db/client';
import { sellerProfiles, stockReservations, stripeEvents, subOrders, transfers } from '../../server/db/schema/index';
import {
  addToCart,
  buyer,
  checkout,
  createLiveListing,
  createShop,
  eventually,
  listingRow,
  orderRow,
  payOrder,
  sessionOf,
  startPaymentsHarness,
  TEST_SHIP_TO,
  type PaymentsHarness,
} from '../factories/orders';

let h: PaymentsHarness;
let stripe: Stripe;

beforeAll(async () => {
  h = await startPaymentsHarness();
  stripe = h.stripe;
});
afterAll(async () => {
  await h.close();
});

function post(body: string, signature?: string) {
  const r = request(h.app).post('/api/webhooks/stripe').set('Content-Type', 'application/json');
  return (signature === undefined ? r : r.set('Stripe-Signature', signature)).send(body);
}

const sign = (body: string, secret = h.webhookSecret, timestamp = Math.floor(Date.now() / 1000)) =>
  stripe.webhooks.generateTestHeaderString({ payload: body, secret, timestamp });

const eventRow = async (id: string) => (await getDb().select().from(stripeEvents).where(eq(stripeEvents.id, id)))[0];

/** A pending order of one unit, not yet paid. */
async function pendingOrder(quantity = 3) {
  const shop = await createShop({});
  const listing = await createLiveListing(shop.user.id, { quantity });
  const { agent } = await buyer(h.app);
  await addToCart(agent, listing.id, 1);
  const r = await checkout(agent);
  expect(r.status).toBe(201);
  return { shop, listing, agent, orderId: r.body.orderId as string, sessionId: await sessionOf(r.body.orderId) };
}

function completedEvent(id: string, orderId: string, sessionId: string, amount: number) {
  return JSON.stringify({
    id,
    object: 'event',
    type: 'checkout.session.completed',
    created: Math.floor(Date.now() / 1000),
    data: { object: { id: sessionId, object: 'checkout.session', payment_status: 'paid', status: 'complete', amount_total: amount, metadata: { orderId }, payment_intent: 'pi_forged' } },
  });
}

describe('webhook signature', () => {
  it('when the signature is forged with another secret, then it is a 400 and nothing changes', async () => {
    const { orderId, sessionId, listing } = await pendingOrder();
    const body = completedEvent('evt_forged_1', orderId, sessionId, (await orderRow(orderId)).totalCents);
    const r = await post(body, sign(body, 'whsec_not_ours'));
    expect(r.status).toBe(400);
    expect(r.body.error.message).toMatch(/signature/);
    expect((await orderRow(orderId)).state).toBe('pending_payment');
    expect(await eventRow('evt_forged_1')).toBeUndefined();
    expect((await listingRow(listing.id)).quantity).toBe(2);
  });

  it('when a correctly signed event is stale (10 minutes old), then it is a 400 and nothing changes', async () => {
    const { orderId, sessionId } = await pendingOrder();
    const body = completedEvent('evt_stale_1', orderId, sessionId, (await orderRow(orderId)).totalCents);
    const r = await post(body, sign(body, h.webhookSecret, Math.floor(Date.now() / 1000) - 600));
    expect(r.status).toBe(400);
    expect((await orderRow(orderId)).state).toBe('pending_payment');
    expect(await eventRow('evt_stale_1')).toBeUndefined();
  });

  it('when the header is missing or the body was changed after signing, then it is a 400', async () => {
    const { orderId, sessionId } = await pendingOrder();
    const body = completedEvent('evt_tampered_1', orderId, sessionId, 1);
    expect((await post(body)).status).toBe(400);
    const signed = sign(body);
    expect((await post(body.replace('"amount_total":1', '"amount_total":2'), signed)).status).toBe(400);
    expect((await orderRow(orderId)).state).toBe('pending_payment');
  });

  it('when an event of a type we do not use arrives, then it is accepted and recorded once', async () => {
    const body = JSON.stringify({ id: 'evt_unknown_type_1', object: 'event', type: 'customer.created', data: { object: { id: 'cus_1', object: 'customer' } } });
    const r = await post(body, sign(body));
    expect(r.status).toBe(200);
    expect(r.body).toEqual({ received: true, duplicate: false, type: 'customer.created' });
    expect(await eventRow('evt_unknown_type_1')).toMatchObject({ type: 'customer.created' });
  });
});

describe('replays and out-of-order deliveries', () => {
  it('when a completed event is delivered again, then it is processed once', async () => {
    const { orderId, listing, shop } = await pendingOrder();
    const acct = await stripe.accounts.create({ type: 'express' });
    await fetch(`${h.fake.url}/__control/accounts/${acct.id}/onboard`, { method: 'POST' });
    await getDb().update(sellerProfiles).set({ stripeAccountId: acct.id, payoutsEnabled: true }).where(eq(sellerProfiles.userId, shop.user.id));
    await payOrder(h, orderId);
    await eventually(() => orderRow(orderId), (o) => o.state === 'paid');
    const completed = (await stripe.events.list({ type: 'checkout.session.completed', limit: 100 })).data.find(
      (e) => (e.data.object as Stripe.Checkout.Session).metadata?.orderId === orderId,
    );
    expect(completed).toBeDefined();
    const eventId = (completed as Stripe.Event).id;
    const transfersOf = () => getDb().select().from(transfers).innerJoin(subOrders, eq(subOrders.id, transfers.subOrderId)).where(eq(subOrders.orderId, orderId));
    await eventually(transfersOf, (t) => t[0]?.transfers.state === 'paid');

    const resend = await fetch(`${h.fake.url}/__control/events/${eventId}/resend`, { method: 'POST' });
    expect(resend.status).toBe(200);
    await h.fake.waitForDeliveries();
    // the same bytes posted again by hand are recognised too
    const event = await stripe.events.retrieve(eventId);
    const body = JSON.stringify(event);
    const again = await post(body, sign(body));
    expect(again.status).toBe(200);
    expect(again.body.duplicate).toBe(true);

    expect(await getDb().select().from(stripeEvents).where(eq(stripeEvents.id, eventId))).toHaveLength(1);
    expect((await transfersOf()).map((t) => t.transfers.state)).toEqual(['paid']);
    expect((await stripe.transfers.list({ transfer_group: `order_${orderId}` })).data).toHaveLength(1);
    expect((await listingRow(listing.id)).quantity).toBe(2);
    const rs = await getDb().select().from(stockReservations).where(eq(stockReservations.orderId, orderId));
    expect(rs.map((x) => x.state)).toEqual(['committed']);
  });

  it('when an expiry event for a paid session arrives late, then the order stays paid and no stock comes back', async () => {
    const { orderId, sessionId, listing } = await pendingOrder(1);
    await payOrder(h, orderId);
    await eventually(() => orderRow(orderId), (o) => o.state === 'paid');
    const body = JSON.stringify({
      id: `evt_late_expiry_${orderId.slice(0, 8)}`,
      object: 'event',
      type: 'checkout.session.expired',
      data: { object: { id: sessionId, object: 'checkout.session', status: 'expired', payment_status: 'unpaid', metadata: { orderId } } },
    });
    const r = await post(body, sign(body));
    expect(r.status).toBe(200);
    expect((await orderRow(orderId)).state).toBe('paid');
    expect(await listingRow(listing.id)).toMatchObject({ quantity: 0, state: 'sold_out' });
  });

  it('when the refund event comes before the payment event, then it is refused for a retry and the totals end up right', async () => {
    const { orderId, sessionId } = await pendingOrder();
    h.fake.pauseDeliveries();
    const paid = h.fake.pay(sessionId, { number: '4242424242424242', expiry: '12/40', cvc: '123', shipping: TEST_SHIP_TO });
    if (paid.kind !== 'paid') throw new Error('payment failed');
    await stripe.refunds.create({ payment_intent: paid.paymentIntent.id, amount: 500 });
    const refundedEvent = (await stripe.events.list({ type: 'charge.refunded', limit: 5 })).data.find((e) => (e.data.object as Stripe.Charge).payment_intent === paid.paymentIntent.id);
    expect(refundedEvent).toBeDefined();
    const body = JSON.stringify(refundedEvent);
    const early = await post(body, sign(body));
    expect(early.status).toBe(503);
    expect(await eventRow((refundedEvent as Stripe.Event).id)).toBeUndefined();
    h.fake.resumeDeliveries();
    await h.fake.waitForDeliveries(15_000);
    const order = await eventually(() => orderRow(orderId), (o) => o.state === 'partially_refunded');
    expect(order).toMatchObject({ state: 'partially_refunded', refundedCents: 500 });
  });

  it('when an old account snapshot says payouts are off, then the current account at Stripe decides', async () => {
    const shop = await createShop({});
    const acct = await stripe.accounts.create({ type: 'express' });
    await getDb().update(sellerProfiles).set({ stripeAccountId: acct.id }).where(eq(sellerProfiles.userId, shop.user.id));
    await fetch(`${h.fake.url}/__control/accounts/${acct.id}/onboard`, { method: 'POST' });
    await h.fake.waitForDeliveries();
    const enabled = await eventually(
      async () => (await getDb().select().from(sellerProfiles).where(eq(sellerProfiles.userId, shop.user.id)))[0],
      (p) => p.payoutsEnabled,
    );
    expect(enabled.payoutsEnabled).toBe(true);
    const body = JSON.stringify({
      id: `evt_old_account_${acct.id}`,
      object: 'event',
      type: 'account.updated',
      account: acct.id,
      data: { object: { id: acct.id, object: 'account', payouts_enabled: false, details_submitted: false, charges_enabled: false } },
    });
    expect((await post(body, sign(body))).status).toBe(200);
    const [p] = await getDb().select().from(sellerProfiles).where(eq(sellerProfiles.userId, shop.user.id));
    expect(p.payoutsEnabled).toBe(true);
  });
});
