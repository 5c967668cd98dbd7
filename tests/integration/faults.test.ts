import { randomUUID } from 'node:crypto';
import { and, eq, inArray, sql } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStripeFake, type StripeFake } from '../../docker-free-fakes/stripe/app';
import { getDb } from '../../server/db/client';
import { orders, stripeEvents } from '../../server/db/schema/index';
import { releaseExpiredReservations } from '../../server/jobs/stock-sweeper';
import { resetStripeClient } from '../../server/services/stripe-client';
import { freePort, startAppProcess, stopAllApps, type AppProcess } from '../faults/app-process';
import { startHttpGate, type HttpGate } from '../faults/http-gate';
import { startTcpProxy, type TcpProxy } from '../faults/tcp-proxy';
import { createLiveListing, createShop, eventually, listingRow, TEST_SHIP_TO } from '../factories/orders';
import { createUser, ORIGIN } from '../factories/users';

/*
 * Fault tests: the app runs as its own process (server/index.ts) so it can be killed, or cut off from its
 * database through a TCP proxy, while the shared test cluster keeps serving the other test files. Stripe is
 * the local stand-in, behind an HTTP gate that can hold the payment-session call; webhooks reach the app
 * through a second gate that can fail deliveries.
 */

type Agent = ReturnType<typeof request.agent>;

let fake: StripeFake;
let stripeGate: HttpGate;
let hookGate: HttpGate;
const webhookSecret = `whsec_faults_${randomUUID().replaceAll('-', '')}`;

beforeAll(async () => {
  hookGate = await startHttpGate(1); // pointed at the app once it runs
  fake = await startStripeFake({
    port: 0,
    webhookSecret,
    webhookUrl: `${hookGate.url}/api/webhooks/stripe`,
    retryDelaysMs: [100, 200, 400, 800, 1600, 3200],
    attemptTimeoutMs: 3000,
    expirySweepMs: 0,
  });
  stripeGate = await startHttpGate(fake.port);
  // This process's own Stripe client (the sweeper called below) talks to the stand-in directly.
  Object.assign(process.env, { STRIPE_API_HOST: '127.0.0.1', STRIPE_API_PORT: String(fake.port), STRIPE_API_PROTOCOL: 'http', STRIPE_WEBHOOK_SECRET: webhookSecret });
  resetStripeClient();
});
afterAll(async () => {
  await stopAllApps();
  await fake?.close();
  await stripeGate?.close();
  await hookGate?.close();
  resetStripeClient();
});

/** Environment of an app process: the Stripe gate, our webhook secret, and a small pool. */
const appEnv = (extra: Record<string, string> = {}) => ({
  STRIPE_API_HOST: '127.0.0.1',
  STRIPE_API_PORT: String(stripeGate.port),
  STRIPE_API_PROTOCOL: 'http',
  STRIPE_WEBHOOK_SECRET: webhookSecret,
  DATABASE_POOL_MAX: '8',
  ...extra,
});

async function signInAt(base: string, user: { email: string; password: string }): Promise<Agent> {
  const agent = request.agent(base);
  const r = await agent.post('/api/auth/login').set('Origin', ORIGIN).send({ email: user.email, password: user.password });
  if (r.status !== 200) throw new Error(`sign-in failed: ${r.status} ${JSON.stringify(r.body)}`);
  return agent;
}

/** Units of a listing by where they are: on the shelf, held for unpaid checkouts, sold. */
async function stockOf(listingId: string) {
  const l = await listingRow(listingId);
  const r = await getDb().execute<{ held: number; committed: number; released: number }>(sql`
    SELECT coalesce(sum(quantity) FILTER (WHERE state = 'held'), 0)::int AS held,
           coalesce(sum(quantity) FILTER (WHERE state = 'committed'), 0)::int AS committed,
           coalesce(sum(quantity) FILTER (WHERE state = 'released'), 0)::int AS released
    FROM stock_reservations WHERE listing_id = ${listingId}`);
  return { shelf: l.quantity, ...r.rows[0] };
}

/** No order holds or sold more than once for the listing, and each reservation belongs to one order. */
async function expectNothingTwice(listingId: string) {
  const rows = await getDb().execute<{ order_id: string; n: number }>(sql`
    SELECT order_id, count(*)::int AS n FROM stock_reservations WHERE listing_id = ${listingId} GROUP BY order_id HAVING count(*) > 1`);
  expect(rows.rows).toEqual([]);
  const lines = await getDb().execute<{ sub_order_id: string; n: number }>(sql`
    SELECT sub_order_id, count(*)::int AS n FROM order_lines WHERE listing_id = ${listingId} GROUP BY sub_order_id HAVING count(*) > 1`);
  expect(lines.rows).toEqual([]);
}

/** The id of the checkout.session.completed event of a session, asked of the stand-in's events API. */
async function completedEventId(sessionId: string): Promise<string> {
  const r = await fetch(`${fake.url}/v1/events?type=checkout.session.completed&limit=100`, { headers: { Authorization: 'Bearer sk_test_faults' } });
  const list = (await r.json()) as { data: Array<{ id: string; data: { object: { id: string } } }> };
  const e = list.data.find((x) => x.data.object.id === sessionId);
  if (!e) throw new Error(`no completed event for ${sessionId}`);
  return e.id;
}
const deliveryOf = (eventId: string) => fake.deliveries().find((d) => d.eventId === eventId && !d.resend);

const pendingOrdersOf = (buyerIds: string[]) =>
  getDb().select().from(orders).where(and(inArray(orders.buyerId, buyerIds), eq(orders.state, 'pending_payment')));

describe('the app killed in the middle of checkouts', () => {
  let app: AppProcess | undefined;
  afterAll(async () => {
    await app?.stop();
  });

  it('when the app is SIGKILLed while checkouts wait on the payment service and is restarted, then no unit is lost or sold twice and the sweeper gives held units back', async () => {
    const port = await freePort();
    app = await startAppProcess({ port, env: appEnv() });
    hookGate.setTarget(port);

    const ORIGINAL = 10;
    const shop = await createShop({ shopName: 'Fictional Fault Yard' });
    const listing = await createLiveListing(shop.user.id, { quantity: ORIGINAL, priceCents: 4_200, title: 'Fictional fault-test winch drum' });
    const people = await Promise.all(Array.from({ length: 10 }, () => createUser({ roles: ['buyer'] })));
    const buyerIds = people.map((p) => p.id);
    const agents: Agent[] = [];
    for (const p of people) {
      const a = await signInAt(app.url, p);
      const c = await a.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: listing.id, quantity: 1 });
      expect(c.status).toBe(201);
      agents.push(a);
    }
    const checkout = (a: Agent) => a.post('/api/checkout').set('Origin', ORIGIN).send({ destination: { country: 'US' } });

    // Wave 1: four checkouts complete; two of them are paid.
    const wave1 = await Promise.all(agents.slice(0, 4).map(checkout));
    expect(wave1.map((r) => r.status)).toEqual([201, 201, 201, 201]);
    for (const r of wave1.slice(0, 2)) {
      const [o] = await getDb().select().from(orders).where(eq(orders.id, r.body.orderId));
      expect(fake.pay(o.checkoutSessionId!, { number: '4242424242424242', expiry: '12/40', cvc: '123', shipping: TEST_SHIP_TO }).kind).toBe('paid');
    }
    await fake.waitForDeliveries(15_000);
    const paidIds = wave1.slice(0, 2).map((r) => r.body.orderId as string);
    await eventually(() => getDb().select().from(orders).where(inArray(orders.id, paidIds)), (os) => os.every((o) => o.state === 'paid'));

    // Wave 2: the payment service answers slowly, so five checkouts hold stock and wait when the app dies.
    stripeGate.setRule((req) => (req.method === 'POST' && req.url?.startsWith('/v1/checkout/sessions') ? { kind: 'forward', delayMs: 20_000 } : { kind: 'forward' }));
    const wave2 = agents.slice(4, 9).map((a) => checkout(a).then((r) => r.status, () => 'killed' as const));
    const wave2Ids = buyerIds.slice(4, 9);
    const waiting = await eventually(() => pendingOrdersOf(wave2Ids), (os) => os.length === 5, 10_000);
    expect(waiting).toHaveLength(5);
    // One more checkout is sent right as the app dies: it may be anywhere, even inside its transaction.
    const last = checkout(agents[9]).then((r) => r.status, () => 'killed' as const);
    await new Promise((r) => setTimeout(r, 15));
    await app.kill();
    expect(await Promise.all(wave2)).toEqual(['killed', 'killed', 'killed', 'killed', 'killed']);
    expect([201, 409, 'killed']).toContain(await last);
    stripeGate.setRule(() => ({ kind: 'forward' }));

    // With the app dead, the database already adds up: every unit is on the shelf, held or sold.
    const dead = await stockOf(listing.id);
    expect(dead.shelf + dead.held + dead.committed).toBe(ORIGINAL);
    expect(dead.committed).toBe(2);
    expect(dead.held).toBeGreaterThanOrEqual(7); // two unpaid of wave 1 + five of wave 2 (+ the last, if it got that far)

    // Restart on the same port: the webhooks and the buyers' sessions find it again.
    app = await startAppProcess({ port, env: appEnv() });
    const alive = await stockOf(listing.id);
    expect(alive).toEqual(dead);
    expect((await agents[4].get('/api/auth/me')).status).toBe(200);

    // A replayed payment event after the restart sells nothing twice.
    const [paid0] = await getDb().select().from(orders).where(eq(orders.id, paidIds[0]));
    const eventId = await completedEventId(paid0.checkoutSessionId!);
    expect((await fetch(`${fake.url}/__control/events/${eventId}/resend`, { method: 'POST' })).status).toBe(200);
    await fake.waitForDeliveries(15_000);
    expect(fake.deliveries().filter((d) => d.eventId === eventId).map((d) => d.state)).toEqual(['delivered', 'delivered']);
    expect((await stockOf(listing.id)).committed).toBe(2);
    expect(await getDb().select().from(stripeEvents).where(eq(stripeEvents.id, eventId))).toHaveLength(1);

    // The holds of the dead checkouts run out: the sweeper expires them and gives every held unit back once.
    // (Their hold is moved into the past rather than sweeping with a future clock, which would also expire
    // the unpaid checkouts of test files running alongside.)
    const pending = await pendingOrdersOf(buyerIds);
    await getDb().update(orders).set({ expiresAt: new Date(Date.now() - 1000) }).where(inArray(orders.id, pending.map((o) => o.id)));
    // Other test files sweep too, so which call expired these orders varies: check the orders and the stock.
    await releaseExpiredReservations(new Date());
    expect(pending.length).toBeGreaterThan(0);
    expect(await pendingOrdersOf(buyerIds)).toEqual([]);
    const after = await stockOf(listing.id);
    expect(after).toMatchObject({ shelf: ORIGINAL - 2, held: 0, committed: 2 });
    // A second sweep gives nothing back twice.
    await releaseExpiredReservations(new Date());
    expect(await stockOf(listing.id)).toMatchObject({ shelf: ORIGINAL - 2, held: 0, committed: 2 });
    await expectNothingTwice(listing.id);

    // What is left can be bought, and not one unit more.
    const late = await signInAt(app.url, await createUser({ roles: ['buyer'] }));
    const tooMany = await late.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: listing.id, quantity: 9 });
    expect(tooMany.status).toBe(201);
    expect(JSON.stringify(tooMany.body)).toMatch(/"quantity":8/); // capped to what is on the shelf
    expect((await checkout(late)).status).toBe(201);
    expect(await stockOf(listing.id)).toMatchObject({ shelf: 0, held: 8, committed: 2 });
    const nobody = await signInAt(app.url, await createUser({ roles: ['buyer'] }));
    const refused = await nobody.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: listing.id, quantity: 1 });
    expect(refused.status).toBeGreaterThanOrEqual(400);
  }, 60_000);
});

describe('PostgreSQL unreachable for a few seconds', () => {
  let app: AppProcess | undefined;
  let proxy: TcpProxy | undefined;
  afterAll(async () => {
    await app?.stop();
    await proxy?.close();
  });

  it('when the database is cut, then API calls answer 503 with a clear message and /api/health says so; when it is back, the same process serves again', async () => {
    const db = new URL(process.env.DATABASE_URL!);
    proxy = await startTcpProxy({ host: db.hostname, port: Number(db.port || 5432) });
    const viaProxy = new URL(db.toString());
    viaProxy.hostname = '127.0.0.1';
    viaProxy.port = String(proxy.port);
    app = await startAppProcess({ env: appEnv({ DATABASE_URL: viaProxy.toString() }) });
    const pid = app.child.pid;
    const user = await createUser({ roles: ['buyer'] });
    const agent = await signInAt(app.url, user);
    expect((await request(app.url).get('/api/vehicles')).status).toBe(200);
    expect((await agent.get('/api/orders')).status).toBe(200);

    const expect503 = async (r: request.Response, what: string) => {
      expect(r.status, `${what}: ${r.status} ${JSON.stringify(r.body)}`).toBe(503);
      expect(r.body.error.code, what).toBe('service_unavailable');
      expect(r.body.error.message, what).toMatch(/database is unavailable/i);
      expect(r.headers['retry-after'], what).toBe('5');
    };

    for (const mode of ['refuse', 'blackhole'] as const) {
      await proxy.cut(mode);
      const t0 = Date.now();
      await expect503(await request(app.url).get('/api/vehicles'), `${mode}: catalog`);
      // A hung network costs each request the pool's connect timeout (3 s), so it gets the short list.
      if (mode === 'refuse') {
        await expect503(await request(app.url).get('/api/parts/resolve').query({ number: 'KV-000001-A' }), `${mode}: resolve`);
        await expect503(await request(app.url).post('/api/auth/login').set('Origin', ORIGIN).send({ email: user.email, password: user.password }), `${mode}: sign-in`);
      }
      await expect503(await agent.get('/api/orders'), `${mode}: a signed-in read (the session store is down too)`);
      const health = await request(app.url).get('/api/health');
      expect(health.status).toBe(503);
      expect(health.body).toMatchObject({ ok: false, db: 'down', message: expect.stringMatching(/not reachable/) });
      // Answers come within the pool's connect timeout (3 s) each, not after a hang.
      expect(Date.now() - t0, mode).toBeLessThan(20_000);

      await proxy.restore();
      const back = await eventually(() => request(app!.url).get('/api/vehicles'), (r) => r.status === 200, 15_000);
      expect(back.status, mode).toBe(200);
      expect((await request(app.url).get('/api/health')).body).toEqual({ ok: true, db: 'up' });
      // Sessions live in the database: the signed-in buyer is still signed in once it is back.
      expect((await agent.get('/api/orders')).status, mode).toBe(200);
    }
    expect(app.child.exitCode).toBeNull();
    expect(app.child.pid).toBe(pid);
    expect(app.output()).not.toMatch(/uncaught|unhandled/i);
  }, 60_000);
});

describe('webhook deliveries that fail', () => {
  let app: AppProcess | undefined;
  afterAll(async () => {
    await app?.stop();
    hookGate.setRule(() => ({ kind: 'forward' }));
  });

  // webhooks.test.ts covers replays of a delivered event; this covers deliveries that fail first.
  it('when the endpoint answers 500 twice, then the stand-in retries and the payment lands exactly once', async () => {
    app = await startAppProcess({ env: appEnv() });
    hookGate.setTarget(app.port);
    const shop = await createShop();
    const listing = await createLiveListing(shop.user.id, { quantity: 3, title: 'Fictional retried hub cap' });
    const agent = await signInAt(app.url, await createUser({ roles: ['buyer'] }));
    await agent.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: listing.id, quantity: 1 });
    const co = await agent.post('/api/checkout').set('Origin', ORIGIN).send({ destination: { country: 'US' } });
    expect(co.status).toBe(201);
    const [o] = await getDb().select().from(orders).where(eq(orders.id, co.body.orderId));

    let failures = 0;
    hookGate.setRule((req, body) => {
      if (req.url?.startsWith('/api/webhooks/stripe') && body.includes('checkout.session.completed') && body.includes(o.id) && failures < 2) {
        failures += 1;
        return { kind: 'answer', status: 500, body: '{"error":"deliberate"}' };
      }
      return { kind: 'forward' };
    });
    expect(fake.pay(o.checkoutSessionId!, { number: '4242424242424242', expiry: '12/40', cvc: '123', shipping: TEST_SHIP_TO }).kind).toBe('paid');
    await fake.waitForDeliveries(20_000);
    const d = deliveryOf(await completedEventId(o.checkoutSessionId!));
    expect(failures).toBe(2);
    expect(d?.state).toBe('delivered');
    expect(d!.attempts.map((a) => a.status)).toEqual([500, 500, 200]);
    await eventually(async () => (await getDb().select().from(orders).where(eq(orders.id, o.id)))[0], (x) => x.state === 'paid');
    expect(await getDb().select().from(stripeEvents).where(eq(stripeEvents.id, d!.eventId))).toHaveLength(1);
    expect(await stockOf(listing.id)).toMatchObject({ shelf: 2, held: 0, committed: 1 });
  }, 60_000);

  it('when the app is down while a payment comes in, then the delivery is retried after the restart and lands once', async () => {
    const port = await freePort();
    app = await startAppProcess({ port, env: appEnv() });
    hookGate.setTarget(port);
    const shop = await createShop();
    const listing = await createLiveListing(shop.user.id, { quantity: 2, title: 'Fictional outage tail lamp' });
    const agent = await signInAt(app.url, await createUser({ roles: ['buyer'] }));
    await agent.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: listing.id, quantity: 1 });
    const co = await agent.post('/api/checkout').set('Origin', ORIGIN).send({ destination: { country: 'US' } });
    expect(co.status).toBe(201);
    const [o] = await getDb().select().from(orders).where(eq(orders.id, co.body.orderId));

    await app.kill();
    expect(fake.pay(o.checkoutSessionId!, { number: '4242424242424242', expiry: '12/40', cvc: '123', shipping: TEST_SHIP_TO }).kind).toBe('paid');
    const eventId = await completedEventId(o.checkoutSessionId!);
    // The first attempts fail (nothing listens; the gate answers 502), then the app comes back.
    await eventually(async () => deliveryOf(eventId), (x) => (x?.attempts.length ?? 0) >= 2, 10_000);
    app = await startAppProcess({ port, env: appEnv() });
    await fake.waitForDeliveries(20_000);
    await eventually(async () => (await getDb().select().from(orders).where(eq(orders.id, o.id)))[0], (x) => x.state === 'paid', 10_000);
    const d = deliveryOf(eventId);
    expect(d?.state).toBe('delivered');
    expect(d!.attempts.length).toBeGreaterThanOrEqual(3);
    expect(d!.attempts.at(-1)!.status).toBe(200);
    expect(await getDb().select().from(stripeEvents).where(eq(stripeEvents.id, d!.eventId))).toHaveLength(1);
    expect(await stockOf(listing.id)).toMatchObject({ shelf: 1, held: 0, committed: 1 });
  }, 60_000);
});
