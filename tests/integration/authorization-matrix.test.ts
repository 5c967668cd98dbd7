import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '../../server/db/client';
import { garageVehicles, listings, orders, shippingProfiles, subOrders } from '../../server/db/schema/index';
import type { Guard } from '../../server/auth/require-role';
import { allMounts } from '../../server/routes/index';
import { listRoutes, type RouteInfo } from '../../server/routes/route-table';
import type { Role } from '../../shared/schemas/auth';
import { createVehicleWithAssembly } from '../factories/catalog';
import { addToCart, checkout, createLiveListing, eventually, payOrder, createShop, startPaymentsHarness, type Agent, type PaymentsHarness } from '../factories/orders';
import { createListingVia } from '../factories/seller';
import { createUser, ORIGIN, signIn } from '../factories/users';

/*
 * The authorisation matrix. Every route of the router table is called by five actors (anonymous, buyer,
 * seller, another seller, administrator) with an empty body and our Origin, and the answer is checked
 * against the guard the route declares. The list comes from listRoutes(allMounts()), so a route added
 * tomorrow is in the matrix without anyone touching this file. A second table walks the routes of owned
 * things (listings, shipping profiles, sub-orders, orders, garage vehicles, alerts) with real ids of
 * someone else's thing.
 */

type ActorName = 'anonymous' | 'buyer' | 'seller' | 'otherSeller' | 'admin';
const ACTORS: ActorName[] = ['anonymous', 'buyer', 'seller', 'otherSeller', 'admin'];
const ROLES: Record<ActorName, Role[]> = {
  anonymous: [],
  buyer: ['buyer'],
  seller: ['buyer', 'seller'],
  otherSeller: ['buyer', 'seller'],
  admin: ['buyer', 'admin'],
};

/**
 * Public routes that still answer 401 to a visitor by design (the handler, not a guard, decides).
 * Each entry needs a reason; anything else public that answers 401/403 fails the matrix.
 */
const PUBLIC_BUT_PERSONAL: Record<string, string> = {
  'GET /api/auth/me': 'tells the client who is signed in; a visitor is "Not signed in" (401)',
};

/** Routes that end the caller's session: each actor uses a throwaway sign-in for them. */
const ENDS_SESSION = new Set(['POST /api/auth/logout']);

let h: PaymentsHarness;
const users: Partial<Record<ActorName, { id: string; email: string; password: string }>> = {};
const agents: Partial<Record<ActorName, Agent>> = {};

beforeAll(async () => {
  h = await startPaymentsHarness();
  users.buyer = await createUser({ roles: ROLES.buyer });
  users.seller = (await createShop({ shopName: 'Fictional Matrix Yard A' })).user;
  users.otherSeller = (await createShop({ shopName: 'Fictional Matrix Yard B' })).user;
  users.admin = await createUser({ roles: ROLES.admin });
  for (const a of ['buyer', 'seller', 'otherSeller', 'admin'] as const) agents[a] = await signIn(h.app, users[a]!);
});
afterAll(async () => {
  await h?.close();
});

const key = (r: { method: string; path: string }) => `${r.method} ${r.path}`;

/** Fills every path parameter: a slug for :slug, a fresh uuid for the rest (guards run before any lookup). */
function fill(path: string, given: Record<string, string> = {}): string {
  return path.replace(/:(\w+)/g, (_m, name: string) => given[name] ?? (name === 'slug' ? 'no-such-model-matrix' : randomUUID()));
}

async function send(actor: ActorName, method: string, path: string, body: unknown = {}) {
  let client: Agent | ReturnType<typeof request> = request(h.app);
  if (actor !== 'anonymous') {
    client = ENDS_SESSION.has(`${method} ${path}`) ? await signIn(h.app, users[actor]!) : agents[actor]!;
  }
  const m = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  const req = (client as ReturnType<typeof request>)[m](path).set('Origin', ORIGIN).set('Accept', 'application/json');
  return method === 'GET' || method === 'HEAD' ? req : req.send(body as object);
}

interface Answer {
  status: number;
  code?: string;
  message?: string;
}
const answerOf = (r: { status: number; body?: { error?: { code?: string; message?: string } } }): Answer => ({
  status: r.status,
  code: r.body?.error?.code,
  message: r.body?.error?.message,
});

/** The guards' own refusals, told apart from a handler's 403 (e.g. someone else's live listing). */
const refusedBySignIn = (a: Answer) => a.status === 401 && a.code === 'unauthenticated';
const refusedByRole = (a: Answer) => a.status === 403 && a.code === 'forbidden' && /^This needs the /.test(a.message ?? '');

/** What the guard must answer to this actor; returns a failure text or null. */
function judge(route: RouteInfo, actor: ActorName, a: Answer): string | null {
  const g = route.guard as Guard | null;
  const where = `${key(route)} as ${actor}: ${a.status} ${a.code ?? ''} ${a.message ?? ''}`.trim();
  if (a.status >= 500) return `${where} (a server error: the route must answer an empty body with a 4xx)`;
  if (a.code === 'cross_site_refused') return `${where} (the Origin was ours)`;
  if (!g) return `${where} (no guard declared)`;
  switch (g.kind) {
    case 'public':
      if (actor === 'anonymous' && PUBLIC_BUT_PERSONAL[key(route)]) return a.status === 401 ? null : `${where} (expected the documented 401)`;
      if (a.status === 401 || refusedByRole(a)) return `${where} (public route refused a caller)`;
      return null;
    case 'user':
      if (actor === 'anonymous') return refusedBySignIn(a) ? null : `${where} (expected 401 for a visitor)`;
      if (refusedBySignIn(a) || refusedByRole(a)) return `${where} (a signed-in user was refused by the guard)`;
      return null;
    case 'role': {
      if (actor === 'anonymous') return refusedBySignIn(a) ? null : `${where} (expected 401 for a visitor)`;
      const holds = g.roles.some((r) => ROLES[actor].includes(r));
      if (!holds) return refusedByRole(a) ? null : `${where} (expected the guard's 403: needs ${g.roles.join('/')})`;
      if (refusedBySignIn(a) || refusedByRole(a)) return `${where} (holds ${g.roles.join('/')} but was refused)`;
      return null;
    }
    case 'signature':
      // No session opens a signed route: without a Stripe-Signature everyone gets the same 400.
      return a.status === 400 ? null : `${where} (an unsigned request must be a 400)`;
    default:
      return `${where} (unknown guard ${JSON.stringify(g)})`;
  }
}

describe('authorisation matrix over the router table', () => {
  const routes = listRoutes(allMounts());

  it('when the router table is read, then every route has a guard the matrix knows', () => {
    expect(routes.length).toBeGreaterThan(90);
    const unknown = routes.filter((r) => !r.guard || !['public', 'user', 'role', 'signature'].includes(r.guard.kind)).map(key);
    expect(unknown).toEqual([]);
  });

  it('when every route is called by anonymous, buyer, seller, another seller and admin, then each answer fits its guard', async () => {
    const failures: string[] = [];
    let calls = 0;
    for (const route of routes) {
      const path = fill(route.path);
      for (const actor of ACTORS) {
        const r = await send(actor, route.method, path);
        calls += 1;
        const f = judge(route, actor, answerOf(r));
        if (f) failures.push(f);
      }
    }
    expect(failures).toEqual([]);
    expect(calls).toBe(routes.length * ACTORS.length);
  });

  it('when a signed-in actor calls a route, then the session is still the same actor afterwards', async () => {
    // The matrix must not have signed anyone out or in as someone else (it uses throwaway sessions for logout).
    for (const a of ['buyer', 'seller', 'otherSeller', 'admin'] as const) {
      const me = await agents[a]!.get('/api/auth/me');
      expect(me.status, a).toBe(200);
      expect(me.body.user.id, a).toBe(users[a]!.id);
    }
  });
});

// --- ownership: someone else's things, by real id -------------------------------------------------------

interface Owned {
  /** The route prefix whose first parameter is the owned thing's id. */
  prefix: string;
  param: string;
  id: () => string;
  /** Who tries: never the owner. */
  intruders: ActorName[];
  /** Expected status for a GET and for a state-changing call. */
  read: number[];
  write: number[];
}

describe('ownership over the router table', () => {
  const routes = listRoutes(allMounts());
  const ids: Record<string, string> = {};

  beforeAll(async () => {
    const seller = agents.seller!;
    ids.draft = (await createListingVia(seller, { title: 'Fictional matrix draft of seller A' })).id;
    const live = await createLiveListing(users.seller!.id, { quantity: 4, title: 'Fictional matrix live listing of seller A' });
    ids.live = live.id;
    const [profile] = await getDb().select().from(shippingProfiles).where(eq(shippingProfiles.sellerId, users.seller!.id));
    ids.profile = profile.id;
    // An order of the buyer with a sub-order of seller A.
    await addToCart(agents.buyer!, live.id, 1);
    const co = await checkout(agents.buyer!);
    if (co.status !== 201) throw new Error(`checkout failed: ${co.status} ${JSON.stringify(co.body)}`);
    ids.order = co.body.orderId;
    // Paid, so the seller sees the sub-order (unpaid ones stay hidden from sellers).
    await payOrder(h, ids.order);
    await eventually(async () => (await getDb().select().from(orders).where(eq(orders.id, ids.order)))[0], (o) => o.state === 'paid');
    const [sub] = await getDb().select().from(subOrders).where(eq(subOrders.orderId, ids.order));
    ids.subOrder = sub.id;
    // A garage vehicle and an alert of the buyer.
    const { vehicle: model } = await createVehicleWithAssembly();
    const v = await agents.buyer!
      .post('/api/garage/vehicles')
      .set('Origin', ORIGIN)
      .send({ vehicleSlug: model.slug, serial: 'MX-01200', originalityTarget: 'as_built', nickname: 'Fictional matrix truck' });
    if (v.status !== 201) throw new Error(`garage vehicle failed: ${v.status} ${JSON.stringify(v.body)}`);
    ids.vehicle = v.body.vehicle.id;
    const al = await agents.buyer!.post('/api/alerts').set('Origin', ORIGIN).send({ partId: live.partId });
    if (al.status !== 201) throw new Error(`alert failed: ${al.status} ${JSON.stringify(al.body)}`);
    ids.alert = al.body.alert.id;
  });

  const owned: Owned[] = [
    { prefix: '/api/listings/:id', param: 'id', id: () => ids.draft, intruders: ['otherSeller', 'buyer'], read: [404], write: [404] },
    // A live listing is public to read; another seller changing it is refused by the service.
    { prefix: '/api/listings/:id', param: 'id', id: () => ids.live, intruders: ['otherSeller', 'buyer'], read: [200], write: [403, 404] },
    { prefix: '/api/me/shipping-profiles/:id', param: 'id', id: () => ids.profile, intruders: ['otherSeller', 'buyer', 'admin'], read: [404], write: [404] },
    { prefix: '/api/seller/orders/:subOrderId', param: 'subOrderId', id: () => ids.subOrder, intruders: ['otherSeller', 'buyer', 'admin'], read: [404], write: [404] },
    { prefix: '/api/orders/:id', param: 'id', id: () => ids.order, intruders: ['otherSeller', 'seller'], read: [404], write: [404] },
    { prefix: '/api/garage/vehicles/:id', param: 'id', id: () => ids.vehicle, intruders: ['otherSeller', 'seller', 'admin'], read: [404], write: [404] },
    { prefix: '/api/alerts/:id', param: 'id', id: () => ids.alert, intruders: ['otherSeller', 'seller', 'admin'], read: [404], write: [404] },
  ];

  /** Bodies that pass validation, so the answer shows the ownership check rather than the schema's 400. */
  const VALID_BODY: Record<string, unknown> = {
    'PATCH /api/listings/:id': { priceCents: 1 },
    'PUT /api/listings/:id/photos/order': { photoIds: [randomUUID()] },
    'PATCH /api/me/shipping-profiles/:id': { name: 'Taken over' },
    'POST /api/seller/orders/:subOrderId/ship': { carrier: 'Fictional Freight', tracking: 'FF-0001' },
    'PATCH /api/garage/vehicles/:id': { nickname: 'Taken over' },
    'PUT /api/garage/vehicles/:id/teardown/:bomLineId': { status: 'replace' },
    'POST /api/garage/vehicles/:id/log': { text: 'Not my truck' },
    'POST /api/garage/vehicles/:id/wants': { partId: randomUUID(), quantity: 1 },
    'DELETE /api/garage/vehicles/:id/wants': { wantId: randomUUID() },
    'POST /api/garage/vehicles/:id/plan': { destination: { country: 'US' } },
    'POST /api/garage/vehicles/:id/plan/to-cart': { destination: { country: 'US' } },
  };

  it("when another seller or buyer calls every route of someone else's thing by its real id, then 404 (or 403 on a live listing) and nothing changes", async () => {
    const failures: string[] = [];
    let calls = 0;
    for (const o of owned) {
      const matching = routes.filter((r) => r.path === o.prefix || r.path.startsWith(`${o.prefix}/`));
      expect(matching.length, o.prefix).toBeGreaterThan(0);
      for (const route of matching) {
        const path = fill(route.path, { [o.param]: o.id() });
        for (const intruder of o.intruders) {
          // An actor without the route's role is stopped by the guard; everyone else by the ownership check.
          const r = await send(intruder, route.method, path, VALID_BODY[key(route)] ?? {});
          calls += 1;
          const a = answerOf(r);
          const wanted = route.method === 'GET' ? o.read : o.write;
          const isSellerRoute = route.guard?.kind === 'role' && !ROLES[intruder].some((x) => (route.guard as { roles: Role[] }).roles.includes(x));
          const ok = isSellerRoute ? refusedByRole(a) : wanted.includes(a.status);
          if (!ok) failures.push(`${key(route)} [${o.id()}] as ${intruder}: ${a.status} ${a.code ?? ''} ${a.message ?? ''} (wanted ${isSellerRoute ? 'guard 403' : wanted.join('/')})`);
        }
      }
    }
    expect(failures).toEqual([]);
    expect(calls).toBeGreaterThan(40);

    // Nothing of the owners' changed.
    const [draft] = await getDb().select().from(listings).where(eq(listings.id, ids.draft));
    expect(draft).toMatchObject({ state: 'draft', priceCents: 2500, sellerId: users.seller!.id });
    const [live] = await getDb().select().from(listings).where(eq(listings.id, ids.live));
    expect(live).toMatchObject({ state: 'approved', priceCents: 2500, quantity: 3 });
    const [profile] = await getDb().select().from(shippingProfiles).where(eq(shippingProfiles.id, ids.profile));
    expect(profile.name).not.toBe('Taken over');
    const [order] = await getDb().select().from(orders).where(eq(orders.id, ids.order));
    expect(order.state).toBe('paid');
    const [vehicle] = await getDb().select().from(garageVehicles).where(eq(garageVehicles.id, ids.vehicle));
    expect(vehicle.nickname).toBe('Fictional matrix truck');
    expect((await agents.buyer!.get('/api/alerts')).body.alerts.map((x: { id: string }) => x.id)).toContain(ids.alert);
  });

  it('when the owner or an administrator reads the same things, then they are found (the 404s above are about ownership)', async () => {
    expect((await agents.seller!.get(`/api/listings/${ids.draft}`)).status).toBe(200);
    expect((await agents.seller!.get(`/api/seller/orders/${ids.subOrder}`)).status).toBe(200);
    expect((await agents.buyer!.get(`/api/orders/${ids.order}`)).status).toBe(200);
    expect((await agents.buyer!.get(`/api/garage/vehicles/${ids.vehicle}`)).status).toBe(200);
    expect((await agents.admin!.get(`/api/orders/${ids.order}`)).status).toBe(200);
    expect((await agents.admin!.get(`/api/listings/${ids.draft}`)).status).toBe(200);
    // An administrator sees any order but is no seller: another seller's sub-order stays behind the role.
    expect(refusedByRole(answerOf(await agents.admin!.get(`/api/seller/orders/${ids.subOrder}`)))).toBe(true);
  });
});
