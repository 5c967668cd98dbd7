import { eq } from 'drizzle-orm';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '../../server/db/client';
import { orders, refunds, sellerProfiles, subOrders, transfers } from '../../server/db/schema/index';
import { feeReturnedOnRefund } from '../../server/services/statements';
import {
  addToCart,
  buyer,
  checkout,
  createLiveListing,
  createShop,
  eventually,
  orderRow,
  payOrder,
  startPaymentsHarness,
  type PaymentsHarness,
} from '../factories/orders';
import { ORIGIN, signedInAs, signIn } from '../factories/users';

let h: PaymentsHarness;
let stripe: Stripe;

beforeAll(async () => {
  h = await startPaymentsHarness();
  stripe = h.stripe;
});
afterAll(async () => {
  await h.close();
});

async function sellOne(shopUserId: string, priceCents: number) {
  const listing = await createLiveListing(shopUserId, { quantity: 1, priceCents });
  const customer = await buyer(h.app);
  await addToCart(customer.agent, listing.id, 1);
  const r = await checkout(customer.agent);
  await payOrder(h, r.body.orderId);
  await eventually(() => orderRow(r.body.orderId), (o) => o.state === 'paid');
  const [sub] = await getDb().select().from(subOrders).where(eq(subOrders.orderId, r.body.orderId));
  return { orderId: r.body.orderId as string, sub };
}

/** Follows the onboarding link as a browser would: the stand-in's page, then its Complete onboarding form. */
async function completeOnboardingPage(url: string) {
  const html = await (await fetch(url)).text();
  expect(html).toContain('Complete onboarding');
  const hidden = Object.fromEntries([...html.matchAll(/<input type="hidden" name="([^"]+)" value="([^"]*)">/g)].map((m) => [m[1], m[2].replace(/&amp;/g, '&')]));
  const action = /<form method="post" action="([^"]+)"/.exec(html)?.[1] ?? '';
  const posted = await fetch(`${h.fake.url}${action}`, { method: 'POST', body: new URLSearchParams(hidden), redirect: 'manual' });
  expect(posted.status).toBe(303);
  return posted.headers.get('location');
}

describe('seller payouts', () => {
  it('when a seller sells before onboarding, then nothing is transferred until onboarding completes, and then it is', async () => {
    const shop = await createShop({});
    const seller = await signIn(h.app, shop.user);
    const sale = await sellOne(shop.user.id, 4000);

    const before = await seller.get('/api/seller/payouts');
    expect(before.status).toBe(200);
    expect(before.body.payouts).toEqual({ hasAccount: false, payoutsEnabled: false, transfers: { paidCents: 0, pendingCents: 0, waitingForOnboardingCents: sale.sub.shareCents } });
    expect((await stripe.transfers.list({ transfer_group: `order_${sale.orderId}` })).data).toHaveLength(0);

    const link = await seller.post('/api/seller/payouts/onboarding').set('Origin', ORIGIN).send({});
    expect(link.status).toBe(200);
    expect(link.body.url).toMatch(new RegExp(`^${h.fake.url}/connect/onboarding/acct_`));
    const [profile] = await getDb().select().from(sellerProfiles).where(eq(sellerProfiles.userId, shop.user.id));
    expect(profile.stripeAccountId).toMatch(/^acct_/);
    // a second click reuses the same connected account
    await seller.post('/api/seller/payouts/onboarding').set('Origin', ORIGIN).send({});
    expect((await getDb().select().from(sellerProfiles).where(eq(sellerProfiles.userId, shop.user.id)))[0].stripeAccountId).toBe(profile.stripeAccountId);

    const back = await completeOnboardingPage(link.body.url);
    expect(back).toBe('http://localhost:3000/seller/payouts?onboarding=done');
    await h.fake.waitForDeliveries();
    const [t] = await eventually(() => getDb().select().from(transfers).where(eq(transfers.subOrderId, sale.sub.id)), (rows) => rows[0]?.state === 'paid');
    expect(t).toMatchObject({ state: 'paid', amountCents: sale.sub.shareCents });
    const sent = await stripe.transfers.list({ transfer_group: `order_${sale.orderId}` });
    expect(sent.data).toEqual([expect.objectContaining({ id: t.stripeTransferId, destination: profile.stripeAccountId, amount: sale.sub.shareCents })]);

    const after = await seller.get('/api/seller/payouts');
    expect(after.body.payouts).toMatchObject({ hasAccount: true, payoutsEnabled: true, transfers: { paidCents: sale.sub.shareCents, waitingForOnboardingCents: 0 } });
    expect(after.body.recentTransfers[0]).toMatchObject({ orderId: sale.orderId, state: 'paid' });
    expect((await seller.post('/api/seller/payouts/onboarding').set('Origin', ORIGIN).send({})).status).toBe(409);
  });

  it('when a seller has no shop or a buyer asks, then onboarding is refused', async () => {
    const noShop = await createShop({ withShop: false });
    const agent = await signIn(h.app, noShop.user);
    const r = await agent.post('/api/seller/payouts/onboarding').set('Origin', ORIGIN).send({});
    expect(r.status).toBe(409);
    expect(r.body.error.message).toMatch(/shop profile/);
    const { agent: buyerAgent } = await signedInAs(h.app, ['buyer']);
    expect((await buyerAgent.get('/api/seller/payouts')).status).toBe(403);
  });
});

describe('monthly statements', () => {
  it('when a month has sales and a refund, then the statement lists them and its totals add up to the cent, also as CSV', async () => {
    const shop = await createShop({ shopName: 'Fictional Statement Works' });
    const seller = await signIn(h.app, shop.user);
    const s1 = await sellOne(shop.user.id, 2599);
    const s2 = await sellOne(shop.user.id, 10_001);
    // Put both sales in December 2026 (a fixed month, so other tests' sales cannot land in it).
    for (const [i, s] of [s1, s2].entries()) {
      await getDb().update(orders).set({ paidAt: new Date(Date.UTC(2026, 11, 3 + i, 12)) }).where(eq(orders.id, s.orderId));
    }
    const { agent: admin } = await signedInAs(h.app, ['buyer', 'admin']);
    const r = await admin.post(`/api/admin/orders/${s2.orderId}/refund`).set('Origin', ORIGIN).send({ amountCents: 3000, restock: false, reason: 'Scratched casting' });
    expect(r.status).toBe(200);
    await getDb().update(refunds).set({ createdAt: new Date(Date.UTC(2026, 11, 20)) }).where(eq(refunds.orderId, s2.orderId));

    const st = await seller.get('/api/seller/statements').query({ month: '2026-12' });
    expect(st.status).toBe(200);
    const { lines, totals } = st.body.statement;
    expect(lines.map((l: { kind: string }) => l.kind)).toEqual(['sale', 'sale', 'refund']);
    const feeBack = feeReturnedOnRefund(s2.sub.feeCents, s2.sub.itemsCents + s2.sub.shippingCents, 0, 3000);
    expect(lines[2]).toMatchObject({ refundCents: 3000, feeCents: -feeBack, netCents: feeBack - 3000 });
    expect(totals.salesCents).toBe(2599 + 10_001);
    expect(totals.shippingCents).toBe(1200 + 1200);
    expect(totals.feeCents).toBe(s1.sub.feeCents + s2.sub.feeCents - feeBack);
    expect(totals.netCents).toBe(totals.salesCents + totals.shippingCents - totals.feeCents - totals.refundCents);
    expect(totals.netCents).toBe(s1.sub.shareCents + s2.sub.shareCents - 3000 + feeBack);

    const csv = await seller.get('/api/seller/statements').query({ month: '2026-12', format: 'csv' });
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.headers['content-disposition']).toContain('drabyard-statement-2026-12.csv');
    const rows = csv.text.trim().split('\r\n');
    expect(rows[0]).toBe('date,kind,order_id,sub_order_id,sales,shipping,fee,refund,net');
    expect(rows).toHaveLength(5);
    expect(rows[4]).toBe(`,total,,,126.00,24.00,${(totals.feeCents / 100).toFixed(2)},30.00,${(totals.netCents / 100).toFixed(2)}`);

    expect((await seller.get('/api/seller/statements').query({ month: '2026-13' })).status).toBe(400);
    const empty = await seller.get('/api/seller/statements').query({ month: '2019-01' });
    expect(empty.body.statement).toMatchObject({ lines: [], totals: { netCents: 0 } });
  });

  it('when several partial refunds add up to the whole sale, then the fee returned adds up to the whole fee', () => {
    const fee = 1337;
    const total = 20_001;
    const steps = [1, 4999, 7, 10_000, 4994];
    let before = 0;
    let back = 0;
    for (const s of steps) {
      back += feeReturnedOnRefund(fee, total, before, before + s);
      before += s;
    }
    expect(before).toBe(total);
    expect(back).toBe(fee);
  });
});
