import { and, eq } from 'drizzle-orm';
import Stripe from 'stripe';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '../../server/db/client';
import { cartItems, carts, orderLines, orders, sellerProfiles, stockReservations, subOrders, transfers } from '../../server/db/schema/index';
import { releaseExpiredReservations } from '../../server/jobs/stock-sweeper';
import { resetStripeClient } from '../../server/services/stripe-client';
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
  sessionOf,
  startPaymentsHarness,
  TEST_SHIP_TO,
  type PaymentsHarness,
} from '../factories/orders';
import { createUser, ORIGIN, signIn } from '../factories/users';

let h: PaymentsHarness;
let stripe: Stripe;

beforeAll(async () => {
  h = await startPaymentsHarness();
  stripe = h.stripe;
});
afterAll(async () => {
  await h.close();
});

/** Moves the order's hold into the past (other test files' orders keep theirs, so the sweep leaves them alone). */
const endHold = (orderId: string) => getDb().update(orders).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(orders.id, orderId));

const reservations = (orderId: string) => getDb().select().from(stockReservations).where(eq(stockReservations.orderId, orderId));

describe('checkout', () => {
  it('when a signed-out visitor checks out, then it is a 401; an empty cart is a 400', async () => {
    expect((await request(h.app).post('/api/checkout').set('Origin', ORIGIN).send({ destination: { country: 'US' } })).status).toBe(401);
    const { agent } = await buyer(h.app);
    const r = await checkout(agent);
    expect(r.status).toBe(400);
    expect(r.body.error.message).toMatch(/empty/);
    expect((await agent.post('/api/checkout').set('Origin', ORIGIN).send({ destination: { country: 'usa' } })).status).toBe(400);
  });

  it('when a two-seller cart checks out, then one session carries every line, shipping per seller, the transfer group and the order id, and the stock is held', async () => {
    const a = await createShop({ profile: { kind: 'flat_per_order', amountCents: 1200, shipsTo: ['US'] } });
    const b = await createShop({ profile: { kind: 'per_item', firstItemCents: 800, additionalItemCents: 300, shipsTo: ['*'] } });
    const bolts = await createLiveListing(a.user.id, { quantity: 10, priceCents: 450, category: 'small_hardware', title: 'Fictional hex bolt set' });
    const housing = await createLiveListing(b.user.id, { quantity: 2, priceCents: 18_999, category: 'heavy_bulky', title: 'Fictional axle housing' });
    const { agent } = await buyer(h.app);
    await addToCart(agent, bolts.id, 3);
    await addToCart(agent, housing.id, 2);

    const r = await checkout(agent);
    expect(r.status).toBe(201);
    expect(r.body.url).toMatch(new RegExp(`^${h.fake.url}/pay/cs_test_`));
    const order = await orderRow(r.body.orderId);
    // items 3 x 4.50 + 2 x 189.99; shipping 12.00 + (8.00 + 3.00)
    expect(order).toMatchObject({ state: 'pending_payment', itemsCents: 1350 + 37_998, shippingCents: 1200 + 1100, totalCents: 1350 + 37_998 + 2300 });
    const subs = await getDb().select().from(subOrders).where(eq(subOrders.orderId, order.id));
    expect(subs).toHaveLength(2);
    // fee: 10 % on small hardware (135), 6 % on heavy items (2279.88 -> 2280); shares + fees = charge
    expect(subs.find((s) => s.sellerId === a.user.id)).toMatchObject({ feeCents: 135, shareCents: 1350 + 1200 - 135 });
    expect(subs.find((s) => s.sellerId === b.user.id)).toMatchObject({ feeCents: 2280, shareCents: 37_998 + 1100 - 2280 });
    expect(subs.reduce((x, s) => x + s.shareCents + s.feeCents, 0)).toBe(order.totalCents);
    expect(order.feeCents).toBe(135 + 2280);

    const session = await stripe.checkout.sessions.retrieve(order.checkoutSessionId as string, { expand: ['line_items'] });
    expect(session.amount_total).toBe(order.totalCents);
    expect(session.metadata).toEqual({ orderId: order.id });
    expect(session.success_url).toBe(`http://localhost:3000/orders/${order.id}?paid=1&session_id={CHECKOUT_SESSION_ID}`);
    expect(session.cancel_url).toBe('http://localhost:3000/cart');
    const lines = session.line_items?.data.map((li) => [li.description, li.quantity, li.amount_total]);
    expect(lines).toHaveLength(4);
    expect(lines).toContainEqual([expect.stringMatching(/^Shipping from /), 1, 1200]);
    expect(lines).toContainEqual([expect.stringContaining('Fictional axle housing'), 2, 37_998]);

    expect((await listingRow(bolts.id)).quantity).toBe(7);
    expect((await listingRow(housing.id)).quantity).toBe(0);
    expect((await reservations(order.id)).map((x) => x.state)).toEqual(['held', 'held']);
  });

  it('when the order ships, then the payment page asks for an address in that country only; once paid, the buyer and the seller see it', async () => {
    const shop = await createShop({});
    const other = await createShop({});
    const listing = await createLiveListing(shop.user.id, { quantity: 3, priceCents: 2_500 });
    const { agent } = await buyer(h.app);
    await addToCart(agent, listing.id, 1);
    const r = await checkout(agent, { country: 'CA' });
    expect(r.status).toBe(201);
    const session = await stripe.checkout.sessions.retrieve(await sessionOf(r.body.orderId));
    expect(session.shipping_address_collection).toEqual({ allowed_countries: ['CA'] });

    // The page refuses a missing street or another country before any charge.
    const sessionId = await sessionOf(r.body.orderId);
    const card = { number: '4242424242424242', expiry: '12/40', cvc: '123' };
    expect(h.fake.pay(sessionId, { ...card, shipping: { ...TEST_SHIP_TO, line1: '' } })).toMatchObject({ kind: 'rejected', error: { message: 'Enter the street address.' } });
    expect(h.fake.pay(sessionId, { ...card, shipping: { ...TEST_SHIP_TO, country: 'US' } })).toMatchObject({ kind: 'rejected' });
    await payOrder(h, r.body.orderId);

    const shipTo = { name: TEST_SHIP_TO.name, line1: TEST_SHIP_TO.line1, line2: null, city: TEST_SHIP_TO.city, state: TEST_SHIP_TO.state, postalCode: TEST_SHIP_TO.postal_code, country: 'CA' };
    const order = await eventually(() => agent.get(`/api/orders/${r.body.orderId}`), (x) => x.body.order?.state === 'paid');
    expect(order.body.order.shipTo).toEqual(shipTo);
    const sub = order.body.order.subOrders[0];
    const seller = await signIn(h.app, shop.user);
    expect((await seller.get(`/api/seller/orders/${sub.id}`)).body.subOrder.shipTo).toEqual(shipTo);
    // Another seller cannot read it.
    expect((await (await signIn(h.app, other.user)).get(`/api/seller/orders/${sub.id}`)).status).toBe(404);
  });

  it('when the buyer picks the parts up, then no address is asked for', async () => {
    const shop = await createShop({});
    await getDb().update(sellerProfiles).set({ pickupAtShows: true }).where(eq(sellerProfiles.userId, shop.user.id));
    const listing = await createLiveListing(shop.user.id, { quantity: 3, priceCents: 2_500 });
    const { agent } = await buyer(h.app);
    await addToCart(agent, listing.id, 1);
    const r = await checkout(agent, { pickup: true });
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    const session = await stripe.checkout.sessions.retrieve(await sessionOf(r.body.orderId));
    expect(session.shipping_address_collection).toBeNull();
    await payOrder(h, r.body.orderId);
    const order = await eventually(() => agent.get(`/api/orders/${r.body.orderId}`), (x) => x.body.order?.state === 'paid');
    expect(order.body.order.shipTo).toBeNull();
  });

  it('when the session is paid, then the order is paid, the stock committed, the cart emptied, transfers made in the group and mails sent', async () => {
    const onboarded = await createShop({});
    const acct = await stripe.accounts.create({ type: 'express', email: onboarded.user.email });
    await fetch(`${h.fake.url}/__control/accounts/${acct.id}/onboard`, { method: 'POST' });
    await h.fake.waitForDeliveries();
    await getDb().update(sellerProfiles).set({ stripeAccountId: acct.id, payoutsEnabled: true }).where(eq(sellerProfiles.userId, onboarded.user.id));
    const waiting = await createShop({});
    const l1 = await createLiveListing(onboarded.user.id, { quantity: 1, priceCents: 5_000 });
    const l2 = await createLiveListing(waiting.user.id, { quantity: 4, priceCents: 1_500 });
    const { agent, user } = await buyer(h.app);
    await addToCart(agent, l1.id, 1);
    await addToCart(agent, l2.id, 2);
    const r = await checkout(agent);
    expect(r.status).toBe(201);
    await payOrder(h, r.body.orderId);

    const order = await eventually(() => orderRow(r.body.orderId), (o) => o.state === 'paid');
    expect(order.state).toBe('paid');
    expect(order.paymentIntentId).toMatch(/^pi_/);
    expect((await reservations(order.id)).every((x) => x.state === 'committed')).toBe(true);
    expect((await listingRow(l1.id)).state).toBe('sold_out');
    expect((await listingRow(l2.id))).toMatchObject({ state: 'approved', quantity: 2 });
    const [cart] = await getDb().select().from(carts).where(eq(carts.userId, user.id));
    expect(await getDb().select().from(cartItems).where(eq(cartItems.cartId, cart.id))).toHaveLength(0);
    expect((await getDb().select().from(subOrders).where(eq(subOrders.orderId, order.id))).every((s) => s.state === 'paid')).toBe(true);

    const rows = await eventually(
      () => getDb().select().from(transfers).innerJoin(subOrders, eq(subOrders.id, transfers.subOrderId)).where(eq(subOrders.orderId, order.id)),
      (t) => t.some((x) => x.transfers.state === 'paid'),
    );
    const paid = rows.find((x) => x.transfers.sellerId === onboarded.user.id)?.transfers;
    const held = rows.find((x) => x.transfers.sellerId === waiting.user.id)?.transfers;
    expect(paid).toMatchObject({ state: 'paid' });
    expect(held).toMatchObject({ state: 'waiting_for_onboarding', stripeTransferId: null });
    const stripeTransfers = await stripe.transfers.list({ transfer_group: order.transferGroup });
    expect(stripeTransfers.data).toHaveLength(1);
    expect(stripeTransfers.data[0]).toMatchObject({ destination: acct.id, amount: paid?.amountCents, transfer_group: `order_${order.id}` });

    const buyerMail = await waitForMail(user.email, (m) => m.subject.includes('order confirmed'));
    expect(buyerMail.text).toContain('$104.00'); // 50.00 + 2 x 15.00 + 12.00 shipping from each seller
    await waitForMail(onboarded.user.email, (m) => m.subject.startsWith('New Drabyard order'));
    await waitForMail(waiting.user.email, (m) => m.subject.startsWith('New Drabyard order'));

    const page = await agent.get(`/api/orders/${order.id}`);
    expect(page.status).toBe(200);
    expect(page.body.order).toMatchObject({ state: 'paid', totalCents: 10_400, subOrders: expect.any(Array) });
    expect(page.body.order.subOrders).toHaveLength(2);
  });

  it('when 50 buyers check out the last 3 units at once, then exactly 3 are reserved and 47 are refused clearly', async () => {
    const shop = await createShop({});
    const listing = await createLiveListing(shop.user.id, { quantity: 3, priceCents: 7_500, title: 'Fictional last transfer case' });
    const buyers = await Promise.all(Array.from({ length: 50 }, () => createUser({ roles: ['buyer'] })));
    const agents = [];
    for (const u of buyers) {
      const agent = await signIn(h.app, u);
      await addToCart(agent, listing.id, 1);
      agents.push(agent);
    }
    const replies = await Promise.all(agents.map((agent) => checkout(agent)));
    const ok = replies.filter((r) => r.status === 201);
    const refused = replies.filter((r) => r.status === 409);
    expect(ok).toHaveLength(3);
    expect(refused).toHaveLength(47);
    for (const r of refused) {
      expect(r.body.error.message).toBe('"Fictional last transfer case": you asked for 1 but none are left.');
      expect(r.body.error.details.outOfStock).toEqual([{ listingId: listing.id, title: 'Fictional last transfer case', requested: 1, available: 0 }]);
    }
    expect((await listingRow(listing.id)).quantity).toBe(0);
    const held = await getDb().select().from(stockReservations).where(and(eq(stockReservations.listingId, listing.id), eq(stockReservations.state, 'held')));
    expect(held).toHaveLength(3);
    const pending = await getDb().select().from(orderLines).where(eq(orderLines.listingId, listing.id));
    expect(pending).toHaveLength(3); // refused checkouts leave no order behind
  });

  it('when the session expires unpaid, then the order expires and the stock comes back', async () => {
    const shop = await createShop({});
    const listing = await createLiveListing(shop.user.id, { quantity: 2 });
    const { agent } = await buyer(h.app);
    await addToCart(agent, listing.id, 2);
    const r = await checkout(agent);
    expect((await listingRow(listing.id)).quantity).toBe(0);
    const res = await fetch(`${h.fake.url}/__control/checkout/sessions/${await sessionOf(r.body.orderId)}/expire`, { method: 'POST' });
    expect(res.status).toBe(200);
    await h.fake.waitForDeliveries();
    const order = await eventually(() => orderRow(r.body.orderId), (o) => o.state === 'expired');
    expect(order.state).toBe('expired');
    expect((await listingRow(listing.id)).quantity).toBe(2);
    expect((await reservations(order.id)).map((x) => x.state)).toEqual(['released']);
    // the cart is kept, so the buyer can try again
    expect((await agent.get('/api/cart')).body.groups[0].items[0]).toMatchObject({ listingId: listing.id, quantity: 2 });
  });

  it('when the hold runs out and no webhook came, then the sweeper expires the session at Stripe and releases the stock once', async () => {
    const shop = await createShop({});
    const listing = await createLiveListing(shop.user.id, { quantity: 1 });
    const { agent } = await buyer(h.app);
    await addToCart(agent, listing.id, 1);
    h.fake.pauseDeliveries();
    const r = await checkout(agent);
    await endHold(r.body.orderId);
    const first = await releaseExpiredReservations(new Date());
    expect(first.expired).toBeGreaterThanOrEqual(1);
    expect((await orderRow(r.body.orderId)).state).toBe('expired');
    expect((await listingRow(listing.id)).quantity).toBe(1);
    expect((await stripe.checkout.sessions.retrieve(await sessionOf(r.body.orderId))).status).toBe('expired');
    h.fake.resumeDeliveries();
    await h.fake.waitForDeliveries();
    await releaseExpiredReservations(new Date());
    expect((await listingRow(listing.id)).quantity).toBe(1);
  });

  it('when the sweeper finds a session paid at Stripe whose webhook is late, then the payment wins and the order is paid', async () => {
    const shop = await createShop({});
    const listing = await createLiveListing(shop.user.id, { quantity: 1 });
    const { agent } = await buyer(h.app);
    await addToCart(agent, listing.id, 1);
    const r = await checkout(agent);
    h.fake.pauseDeliveries();
    h.fake.pay(await sessionOf(r.body.orderId), { number: '4242424242424242', expiry: '12/40', cvc: '123', shipping: TEST_SHIP_TO });
    await endHold(r.body.orderId);
    const swept = await releaseExpiredReservations(new Date());
    expect(swept.paid).toBeGreaterThanOrEqual(1);
    expect((await orderRow(r.body.orderId)).state).toBe('paid');
    expect((await listingRow(listing.id))).toMatchObject({ quantity: 0, state: 'sold_out' });
    h.fake.resumeDeliveries();
    await h.fake.waitForDeliveries();
    expect((await orderRow(r.body.orderId)).state).toBe('paid');
  });

  it('when the buyer starts a new checkout, then the older unpaid one is abandoned and its stock released first', async () => {
    const shop = await createShop({});
    const listing = await createLiveListing(shop.user.id, { quantity: 1 });
    const { agent } = await buyer(h.app);
    await addToCart(agent, listing.id, 1);
    const first = await checkout(agent);
    const second = await checkout(agent);
    expect(second.status).toBe(201);
    expect((await orderRow(first.body.orderId)).state).toBe('cancelled');
    expect((await orderRow(second.body.orderId)).state).toBe('pending_payment');
    expect((await listingRow(listing.id)).quantity).toBe(0);
    const s1 = await eventually(() => stripe.checkout.sessions.retrieve(first.body.url.split('/pay/')[1]), (s) => s.status === 'expired');
    expect(s1.status).toBe('expired');
  });

  it('when the buyer comes back without paying and cancels, then the session is expired and the stock released', async () => {
    const shop = await createShop({});
    const listing = await createLiveListing(shop.user.id, { quantity: 3 });
    const { agent } = await buyer(h.app);
    await addToCart(agent, listing.id, 3);
    const r = await checkout(agent);
    const c = await agent.post(`/api/orders/${r.body.orderId}/cancel`).set('Origin', ORIGIN).send({});
    expect(c.status).toBe(200);
    expect(c.body.order.state).toBe('cancelled');
    expect((await listingRow(listing.id)).quantity).toBe(3);
    expect((await agent.post(`/api/orders/${r.body.orderId}/cancel`).set('Origin', ORIGIN).send({})).status).toBe(409);
  });

  it('when Stripe cannot be reached, then the checkout fails with 503 and the reservation is released', async () => {
    const shop = await createShop({});
    const listing = await createLiveListing(shop.user.id, { quantity: 2 });
    const { agent, user } = await buyer(h.app);
    await addToCart(agent, listing.id, 2);
    const port = process.env.STRIPE_API_PORT;
    process.env.STRIPE_API_PORT = '1'; // nothing listens there
    resetStripeClient();
    try {
      const r = await checkout(agent);
      expect(r.status).toBe(503);
      expect(r.body.error.message).toMatch(/back in stock/);
    } finally {
      process.env.STRIPE_API_PORT = port;
      resetStripeClient();
    }
    expect((await listingRow(listing.id)).quantity).toBe(2);
    const mine = await getDb().select().from(orders).where(eq(orders.buyerId, user.id));
    expect(mine.map((o) => o.state)).toEqual(['cancelled']);
  });

  it('when a destination is not served, then checkout is refused naming the seller and nothing is reserved', async () => {
    const shop = await createShop({ shopName: 'Fictional Domestic Only', profile: { kind: 'flat_per_order', amountCents: 900, shipsTo: ['US'] } });
    const listing = await createLiveListing(shop.user.id, { quantity: 2 });
    const { agent } = await buyer(h.app);
    await addToCart(agent, listing.id, 1);
    const r = await checkout(agent, { country: 'DE' });
    expect(r.status).toBe(409);
    expect(r.body.error.message).toBe('Fictional Domestic Only: This seller does not ship to DE.');
    expect((await listingRow(listing.id)).quantity).toBe(2);
  });
});
