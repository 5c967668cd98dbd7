import { eq } from 'drizzle-orm';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '../../server/db/client';
import { orderLines, sellerProfiles, subOrders, transfers } from '../../server/db/schema/index';
import { reverseOverpaidTransfers } from '../../server/services/payouts';
import { waitForMail } from '../factories/mail';
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
  startPaymentsHarness,
  type Agent,
  type PaymentsHarness,
} from '../factories/orders';
import { ORIGIN, signedInAs, signIn } from '../factories/users';

let h: PaymentsHarness;
let stripe: Stripe;
let admin: Agent;

beforeAll(async () => {
  h = await startPaymentsHarness();
  stripe = h.stripe;
  admin = (await signedInAs(h.app, ['buyer', 'admin'])).agent;
});
afterAll(async () => {
  await h.close();
});

/** Two sellers, one paid order: seller A sells 3 x 20.00 (flat 12.00 shipping), seller B 1 x 50.00 (flat 12.00). */
async function paidOrder() {
  const a = await createShop({});
  const b = await createShop({});
  const la = await createLiveListing(a.user.id, { quantity: 5, priceCents: 2000 });
  const lb = await createLiveListing(b.user.id, { quantity: 1, priceCents: 5000 });
  const customer = await buyer(h.app);
  await addToCart(customer.agent, la.id, 3);
  await addToCart(customer.agent, lb.id, 1);
  const r = await checkout(customer.agent);
  expect(r.status).toBe(201);
  await payOrder(h, r.body.orderId);
  await eventually(() => orderRow(r.body.orderId), (o) => o.state === 'paid');
  const subs = await getDb().select().from(subOrders).where(eq(subOrders.orderId, r.body.orderId));
  const subA = subs.find((s) => s.sellerId === a.user.id)!;
  const subB = subs.find((s) => s.sellerId === b.user.id)!;
  const [lineA] = await getDb().select().from(orderLines).where(eq(orderLines.subOrderId, subA.id));
  return { a, b, la, lb, customer, orderId: r.body.orderId as string, subA, subB, lineA };
}

const refund = (orderId: string, body: Record<string, unknown>) => admin.post(`/api/admin/orders/${orderId}/refund`).set('Origin', ORIGIN).send(body);

describe('refunds', () => {
  it('when units of one line are refunded with restock, then Stripe refunds their price, the stock comes back and both sides are told', async () => {
    const o = await paidOrder();
    const r = await refund(o.orderId, { lines: [{ lineId: o.lineA.id, quantity: 2 }], restock: true, reason: 'Two bolts arrived cracked' });
    expect(r.status).toBe(200);
    expect(r.body.order).toMatchObject({ state: 'partially_refunded', refundedCents: 4000 });
    expect(r.body.order.refunds).toEqual([expect.objectContaining({ subOrderId: o.subA.id, amountCents: 4000, restock: true })]);
    expect((await listingRow(o.la.id)).quantity).toBe(2 + 2);
    const [line] = await getDb().select().from(orderLines).where(eq(orderLines.id, o.lineA.id));
    expect(line.refundedQuantity).toBe(2);
    const [sub] = await getDb().select().from(subOrders).where(eq(subOrders.id, o.subA.id));
    expect(sub).toMatchObject({ refundedCents: 4000, state: 'paid' });

    const pi = (await orderRow(o.orderId)).paymentIntentId as string;
    const stripeRefunds = await stripe.refunds.list({ payment_intent: pi });
    expect(stripeRefunds.data.map((x) => x.amount)).toEqual([4000]);
    await h.fake.waitForDeliveries();
    // the charge.refunded webhook agrees and changes nothing
    expect(await orderRow(o.orderId)).toMatchObject({ refundedCents: 4000, state: 'partially_refunded' });
    await waitForMail(o.customer.user.email, (m) => m.subject === 'Drabyard refund of $40.00');
    await waitForMail(o.a.user.email, (m) => m.subject.startsWith('Refund on a Drabyard sale'));
  });

  it('when a partial amount is refunded, then the seller money not yet sent shrinks by the refund less the fee returned', async () => {
    const o = await paidOrder();
    const [before] = await getDb().select().from(transfers).where(eq(transfers.subOrderId, o.subB.id));
    expect(before.state).toBe('waiting_for_onboarding');
    const r = await refund(o.orderId, { subOrderId: o.subB.id, amountCents: 1200, restock: false, reason: 'Shipping overcharged' });
    expect(r.status).toBe(200);
    const [after] = await getDb().select().from(transfers).where(eq(transfers.subOrderId, o.subB.id));
    // sale 62.00 with a 4.00 fee (8 % of 50.00); 12.00 of 62.00 refunded returns round(4.00 x 12/62) = 0.77 of fee
    expect(o.subB.feeCents).toBe(400);
    expect(after.amountCents).toBe(before.amountCents - (1200 - 77));
    expect((await listingRow(o.lb.id)).quantity).toBe(0);
  });

  it('when a refund comes after the seller was paid, then what the seller gives back is taken back from the transfer, once', async () => {
    const shop = await createShop({});
    const acct = await stripe.accounts.create({ type: 'express', email: shop.user.email });
    await fetch(`${h.fake.url}/__control/accounts/${acct.id}/onboard`, { method: 'POST' });
    await h.fake.waitForDeliveries();
    await getDb().update(sellerProfiles).set({ stripeAccountId: acct.id, payoutsEnabled: true }).where(eq(sellerProfiles.userId, shop.user.id));
    const listing = await createLiveListing(shop.user.id, { quantity: 1, priceCents: 5000 });
    const customer = await buyer(h.app);
    await addToCart(customer.agent, listing.id, 1);
    const r = await checkout(customer.agent);
    await payOrder(h, r.body.orderId);
    const [sub] = await getDb().select().from(subOrders).where(eq(subOrders.orderId, r.body.orderId));
    const transferOf = async () => (await getDb().select().from(transfers).where(eq(transfers.subOrderId, sub.id)))[0];
    const paid = await eventually(transferOf, (t) => t?.state === 'paid');
    expect(paid.sentCents).toBe(paid.amountCents);
    const stripeId = paid.stripeTransferId as string;

    // 12.00 of a 62.00 sale: the seller gives back 12.00 less the 0.77 of fee returned (as above).
    expect((await refund(r.body.orderId, { subOrderId: sub.id, amountCents: 1200, restock: false, reason: 'Shipping overcharged' })).status).toBe(200);
    let at = await stripe.transfers.retrieve(stripeId);
    expect(at.amount_reversed).toBe(1200 - 77);
    expect(await transferOf()).toMatchObject({ amountCents: paid.sentCents - 1123, reversedCents: 1123, sentCents: paid.sentCents });

    // A reversal that fails stays due and goes through on the next sweep.
    await getDb().update(transfers).set({ stripeTransferId: 'tr_missing_at_stripe' }).where(eq(transfers.subOrderId, sub.id));
    expect((await refund(r.body.orderId, { restock: false, reason: 'Arrived broken' })).status).toBe(200);
    expect((await transferOf()).reversedCents).toBe(1123);
    await getDb().update(transfers).set({ stripeTransferId: stripeId }).where(eq(transfers.subOrderId, sub.id));
    expect(await reverseOverpaidTransfers({ all: true })).toBeGreaterThanOrEqual(1);
    at = await stripe.transfers.retrieve(stripeId);
    // Everything refunded: the whole fee came back, so the seller keeps nothing and the transfer is reversed in full.
    expect(at).toMatchObject({ amount_reversed: paid.sentCents, reversed: true });
    expect(await transferOf()).toMatchObject({ amountCents: 0, reversedCents: paid.sentCents });
    // Nothing more is due: running again changes nothing at Stripe.
    await reverseOverpaidTransfers({ orderId: r.body.orderId });
    expect((await stripe.transfers.listReversals(stripeId)).data.map((x) => x.amount).sort((x, y) => x - y)).toEqual([1123, paid.sentCents - 1123].sort((x, y) => x - y));
  });

  it('when the whole order is refunded with restock, then every seller part is refunded at Stripe and the order is refunded', async () => {
    const o = await paidOrder();
    const r = await refund(o.orderId, { restock: true, reason: 'Buyer cancelled before shipping' });
    expect(r.status).toBe(200);
    expect(r.body.order).toMatchObject({ state: 'refunded', refundedCents: 6000 + 1200 + 5000 + 1200 });
    expect(r.body.order.subOrders.map((s: { state: string }) => s.state)).toEqual(['refunded', 'refunded']);
    expect((await listingRow(o.la.id)).quantity).toBe(5);
    expect(await listingRow(o.lb.id)).toMatchObject({ quantity: 1, state: 'approved' });
    const pi = (await orderRow(o.orderId)).paymentIntentId as string;
    expect((await stripe.paymentIntents.retrieve(pi, { expand: ['latest_charge'] })).latest_charge).toMatchObject({ refunded: true });
    const again = await refund(o.orderId, { restock: false, reason: 'Once more' });
    expect(again.status).toBe(409);
  });

  it('when a refund asks for more than is left, names a foreign line, or restocks an amount, then it is refused and nothing moves', async () => {
    const o = await paidOrder();
    expect((await refund(o.orderId, { amountCents: 999_999, restock: false, reason: 'Too much' })).status).toBe(400);
    expect((await refund(o.orderId, { lines: [{ lineId: o.lineA.id, quantity: 4 }], restock: false, reason: 'Too many' })).status).toBe(400);
    expect((await refund(o.orderId, { lines: [{ lineId: '00000000-0000-4000-8000-000000000000', quantity: 1 }], restock: false, reason: 'Foreign' })).status).toBe(400);
    const restockAmount = await refund(o.orderId, { amountCents: 100, restock: true, reason: 'Mixed up' });
    expect(restockAmount.status).toBe(400);
    expect(restockAmount.body.error.details.fieldErrors.restock).toBeDefined();
    expect(await orderRow(o.orderId)).toMatchObject({ refundedCents: 0, state: 'paid' });
    const asBuyer = await o.customer.agent.post(`/api/admin/orders/${o.orderId}/refund`).set('Origin', ORIGIN).send({ restock: false, reason: 'Me' });
    expect(asBuyer.status).toBe(403);
  });
});

describe('orders after payment', () => {
  it('when the seller ships and delivers, then the buyer sees carrier and tracking and gets an e-mail', async () => {
    const o = await paidOrder();
    const seller = await signIn(h.app, o.a.user);
    const list = await seller.get('/api/seller/orders');
    expect(list.status).toBe(200);
    expect(list.body.subOrders.map((s: { id: string }) => s.id)).toEqual([o.subA.id]);
    expect(list.body.subOrders[0]).toMatchObject({ buyer: { name: 'Fictional Restorer' }, shareCents: o.subA.shareCents, feeCents: o.subA.feeCents, transfer: { state: 'waiting_for_onboarding' } });

    expect((await seller.post(`/api/seller/orders/${o.subA.id}/deliver`).set('Origin', ORIGIN).send({})).status).toBe(409);
    const shipped = await seller.post(`/api/seller/orders/${o.subA.id}/ship`).set('Origin', ORIGIN).send({ carrier: 'Fictional Freight', tracking: 'FF 1234-5678' });
    expect(shipped.status).toBe(200);
    expect(shipped.body.subOrder).toMatchObject({ state: 'shipped', carrier: 'Fictional Freight', tracking: 'FF 1234-5678' });
    expect((await seller.post(`/api/seller/orders/${o.subA.id}/ship`).set('Origin', ORIGIN).send({ carrier: 'Fictional Freight', tracking: 'F1' })).status).toBe(400);
    expect((await seller.post(`/api/seller/orders/${o.subA.id}/ship`).set('Origin', ORIGIN).send({ carrier: 'Fictional Freight', tracking: 'FF 1234-5678' })).status).toBe(409);
    const mail = await waitForMail(o.customer.user.email, (m) => m.subject.includes('on their way'));
    expect(mail.text).toContain('FF 1234-5678');

    const delivered = await seller.post(`/api/seller/orders/${o.subA.id}/deliver`).set('Origin', ORIGIN).send({});
    expect(delivered.body.subOrder.state).toBe('delivered');
    const page = await o.customer.agent.get(`/api/orders/${o.orderId}`);
    const mine = page.body.order.subOrders.find((s: { id: string }) => s.id === o.subA.id);
    expect(mine).toMatchObject({ state: 'delivered', carrier: 'Fictional Freight', tracking: 'FF 1234-5678' });
    expect((await o.customer.agent.get('/api/orders')).body.orders[0]).toMatchObject({ id: o.orderId, sellerCount: 2, itemCount: 4 });
  });

  it('when someone else asks for an order, then a buyer or seller sees only their own, and an admin sees any', async () => {
    const o = await paidOrder();
    const other = await buyer(h.app);
    expect((await other.agent.get(`/api/orders/${o.orderId}`)).status).toBe(404);
    expect((await other.agent.get('/api/orders')).body.orders).toEqual([]);
    const sellerB = await signIn(h.app, o.b.user);
    expect((await sellerB.get(`/api/seller/orders/${o.subA.id}`)).status).toBe(404);
    expect((await sellerB.post(`/api/seller/orders/${o.subA.id}/ship`).set('Origin', ORIGIN).send({ carrier: 'Fictional Freight', tracking: 'AB-1234' })).status).toBe(404);
    expect((await sellerB.get(`/api/seller/orders/${o.subB.id}`)).body.subOrder.lines).toHaveLength(1);
    expect((await o.customer.agent.get('/api/seller/orders')).status).toBe(403);
    expect((await admin.get(`/api/orders/${o.orderId}`)).status).toBe(200);
  });
});
