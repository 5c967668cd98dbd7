import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { eq, sql } from 'drizzle-orm';
import Stripe from 'stripe';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '../../server/db/client';
import { garageVehicles, listings, sellerProfiles, users } from '../../server/db/schema/index';
import { allMounts } from '../../server/routes/index';
import { listRoutes } from '../../server/routes/route-table';
import { createVehicleWithAssembly } from '../factories/catalog';
import { waitForMail } from '../factories/mail';
import { addToCart, createLiveListing, createShop, startPaymentsHarness, type Agent, type PaymentsHarness } from '../factories/orders';
import { createListingVia, jpeg, mediaDir, photoRows, storedFiles } from '../factories/seller';
import { createUser, ORIGIN, signIn, TEST_PASSWORD, uniqueEmail } from '../factories/users';

/*
 * The attack suite at the API level, in one place. Where another suite already covers an attack in depth
 * (upload refusals in listing-uploads, webhook signatures in webhooks, ownership in authorization-matrix),
 * this file re-checks it briefly and adds the cases those suites leave out. Every request goes to the app
 * in-process or on loopback.
 */

let h: PaymentsHarness;
let buyerAgent: Agent;
let sellerAgent: Agent;
let sellerId: string;

beforeAll(async () => {
  h = await startPaymentsHarness();
  buyerAgent = await signIn(h.app, await createUser({ roles: ['buyer'] }));
  const shop = await createShop({ shopName: 'Fictional Attack Yard' });
  sellerId = shop.user.id;
  sellerAgent = await signIn(h.app, shop.user);
});
afterAll(async () => {
  await h?.close();
});

const routes = listRoutes(allMounts());
const fill = (p: string) => p.replace(/:(\w+)/g, (_m, n: string) => (n === 'slug' ? 'no-such-model' : '00000000-0000-4000-8000-000000000000'));

// --- injection --------------------------------------------------------------------------------------

/** SQL, full-text query syntax, quoting, escapes, control characters and oversize input. */
const PAYLOADS: string[] = [
  "' OR '1'='1",
  "'; DROP TABLE parts; --",
  '" OR ""="',
  "1); SELECT pg_sleep(3); --",
  "' UNION SELECT password_hash, email FROM users --",
  'brake & !cylinder',
  'brake | cylinder',
  'brake <-> cylinder',
  'brake <2> shoe',
  'bra:*',
  'brake:A',
  '!',
  '&',
  '|',
  '<->',
  ':*',
  '!!!&&&|||',
  '((((',
  '))',
  "'",
  '"',
  "''",
  '\\',
  "\\'",
  'a\\',
  '\u0000',
  'a\u0000b',
  '\u0001\u0002\u001f\u007f',
  '%',
  '_',
  '%_%',
  '*',
  '\u202e\u200bbrake',
  '\ud83d\ude00 brake',
  '\ud800',
  '<script>alert(1)</script>',
  '$1',
  '${7*7}{{7*7}}',
  '   ',
  '--',
  '/* */',
  'x'.repeat(10_000),
  'brake '.repeat(2_000),
];

/** Percent-encodes a path segment; a lone surrogate (not encodable) goes as invalid UTF-8 bytes instead. */
const encodePath = (p: string) => {
  try {
    return encodeURIComponent(p);
  } catch {
    return '%ED%A0%80';
  }
};

const show = (p: string) => JSON.stringify(p.length > 40 ? `${p.slice(0, 40)}... (${p.length} chars)` : p);

/** The same judgement as a failure text (null when safe), so one run lists every unsafe answer. */
function unsafeAnswer(r: request.Response, what: string, ms: number): string | null {
  try {
    expectSafe(r, what, ms);
    return null;
  } catch (e) {
    return (e as Error).message.split('\n')[0];
  }
}

/** An answer to hostile input: a clear 4xx or a normal 200, in our JSON shape, quickly; never a 500. */
function expectSafe(r: request.Response, what: string, ms: number) {
  expect(r.status, `${what}: ${r.status} ${JSON.stringify(r.body).slice(0, 300)}`).toBeLessThan(500);
  expect([200, 201, 400, 404, 409, 413, 414, 431], what).toContain(r.status);
  if (r.status >= 400 && r.status !== 414 && r.status !== 431) expect(r.body.error?.code, what).toBeTruthy();
  // pg_sleep must never run: every answer comes well under its 3 s.
  expect(ms, `${what} took ${ms} ms`).toBeLessThan(2500);
}

async function timed<T>(fn: () => Promise<T>): Promise<[T, number]> {
  const t = Date.now();
  const v = await fn();
  return [v, Date.now() - t];
}

const tableCounts = async () => {
  const r = await getDb().execute<{ parts: number; users: number; listings: number }>(
    sql`SELECT (SELECT count(*) FROM parts)::int AS parts, (SELECT count(*) FROM users)::int AS users, (SELECT count(*) FROM listings)::int AS listings`,
  );
  return r.rows[0];
};

/** Other test files add rows meanwhile, so the check is that nothing went away (a DROP or DELETE would). */
function expectNothingDropped(before: Awaited<ReturnType<typeof tableCounts>>, after: Awaited<ReturnType<typeof tableCounts>>) {
  expect(after.parts).toBeGreaterThanOrEqual(before.parts);
  expect(after.users).toBeGreaterThanOrEqual(before.users);
  expect(after.listings).toBeGreaterThanOrEqual(before.listings);
}

describe('injection through query parameters and body fields', () => {
  it('when hostile strings go into every text query parameter of search, suggest, resolve, vehicles and the dashboard, then the answer is a safe 200 or 400, never 500', async () => {
    const before = await tableCounts();
    const targets: Array<[string, (p: string) => request.Test]> = [
      ['search q', (p) => request(h.app).get('/api/search').query({ q: p })],
      ['search q as listings', (p) => request(h.app).get('/api/search').query({ q: p, type: 'listing', sort: 'price_asc' })],
      ['suggest q', (p) => request(h.app).get('/api/search/suggest').query({ q: p })],
      ['resolve number', (p) => request(h.app).get('/api/parts/resolve').query({ number: p })],
      ['vehicle slug', (p) => request(h.app).get(`/api/vehicles/${encodePath(p)}`)],
      ['listings partId', (p) => request(h.app).get('/api/listings').query({ partId: p })],
      ['my listings q', (p) => sellerAgent.get('/api/me/listings').query({ q: p })],
      ['my listings sort', (p) => sellerAgent.get('/api/me/listings').query({ sort: p })],
    ];
    const unsafe: string[] = [];
    for (const p of PAYLOADS) {
      for (const [name, call] of targets) {
        const [r, ms] = await timed(() => call(p));
        const f = unsafeAnswer(r, `${name} = ${show(p)}`, ms);
        if (f) unsafe.push(f);
      }
    }
    // The facet and paging parameters take a shorter list: they are validated by pattern before any SQL.
    for (const p of [...PAYLOADS.slice(0, 12), '\u0000', 'a\u0000b']) {
      for (const param of ['vehicle', 'system', 'assembly', 'seller', 'condition', 'originality', 'price', 'shipsTo', 'cursor', 'sort', 'limit', 'priceMin']) {
        const [r, ms] = await timed(() => request(h.app).get('/api/search').query({ q: 'brake', [param]: p }));
        const f = unsafeAnswer(r, `search ${param} = ${show(p)}`, ms);
        if (f) unsafe.push(f);
      }
    }
    expect(unsafe).toEqual([]);
    expectNothingDropped(before, await tableCounts());
  }, 120_000);

  it('when an injection string matches nothing, then it finds nothing rather than everything', async () => {
    const all = await request(h.app).get('/api/parts/resolve').query({ number: "' OR '1'='1" });
    expect([200, 404]).toContain(all.status);
    if (all.status === 200) expect(JSON.stringify(all.body)).not.toMatch(/password|hash/i);
    const s = await request(h.app).get('/api/search').query({ q: "zzqx' OR '1'='1" });
    expect(s.status).toBe(200);
    expect(JSON.stringify(s.body)).not.toMatch(/password_hash|passwordHash/);
  });

  it('when hostile strings go into body fields (listing, alert, garage vehicle, sign-in), then the answer is safe and text is stored verbatim', async () => {
    const { vehicle: model } = await createVehicleWithAssembly();
    const before = await tableCounts();
    let stored = 0;
    const unsafe: string[] = [];
    const check = (r: request.Response, what: string, ms: number) => {
      const f = unsafeAnswer(r, what, ms);
      if (f) unsafe.push(f);
    };
    for (const p of PAYLOADS) {
      const [l, ms1] = await timed(() =>
        sellerAgent.post('/api/listings').set('Origin', ORIGIN).send({ title: p, description: `Fictional ${p}`, condition: 'reproduction', quantity: 1, priceCents: 500 }),
      );
      check(l, `listing title = ${show(p)}`, ms1);
      if (l.status === 201) {
        stored += 1;
        // What was accepted comes back exactly as sent (trimmed), never rewritten or escaped in the JSON.
        const back = await sellerAgent.get(`/api/listings/${l.body.listing.id}`);
        expect(back.body.listing.title, show(p)).toBe(p.trim());
      }
      const [a, ms2] = await timed(() => buyerAgent.post('/api/alerts').set('Origin', ORIGIN).send({ number: p }));
      check(a, `alert number = ${show(p)}`, ms2);
      const [g, ms3] = await timed(() =>
        buyerAgent.post('/api/garage/vehicles').set('Origin', ORIGIN).send({ vehicleSlug: model.slug, serial: p, nickname: p, originalityTarget: 'as_built' }),
      );
      check(g, `garage serial/nickname = ${show(p)}`, ms3);
      const [s, ms4] = await timed(() => request(h.app).post('/api/auth/login').set('Origin', ORIGIN).send({ email: p, password: p }));
      check(s, `login email = ${show(p)}`, ms4);
      expect(s.status, show(p)).not.toBe(200);
    }
    expect(unsafe).toEqual([]);
    expect(stored).toBeGreaterThan(5);
    expectNothingDropped(before, await tableCounts());
  }, 120_000);

  it('when a password is an injection string, then sign-in is simply refused', async () => {
    const u = await createUser();
    const r = await request(h.app).post('/api/auth/login').set('Origin', ORIGIN).send({ email: u.email, password: "' OR '1'='1' --" });
    expect(r.status).toBe(401);
  });

  it('when parameters are repeated, nested or shaped as operators, then 400, not 500', async () => {
    const cases = [
      '/api/search?q=a&q=b',
      '/api/parts/resolve?number[]=x',
      '/api/parts/resolve?number[$ne]=1',
      '/api/search?q[toString]=1',
      '/api/search?__proto__[x]=1&q=brake',
      '/api/search?constructor[prototype][x]=1',
      '/api/listings?partId[0]=1&partId[1]=2',
    ];
    for (const c of cases) {
      const r = await request(h.app).get(c);
      expect(r.status, `${c}: ${JSON.stringify(r.body)}`).toBeLessThan(500);
    }
    expect(({} as Record<string, unknown>).x).toBeUndefined();
  });

  it('when a JSON body pollutes the prototype, nests very deep or is too large, then it is refused or ignored, never a 500', async () => {
    const shop = await createShop();
    const live = await createLiveListing(shop.user.id, { quantity: 3 });
    const polluted = await buyerAgent
      .post('/api/cart/items')
      .set('Origin', ORIGIN)
      .set('Content-Type', 'application/json')
      .send(`{"listingId":"${live.id}","quantity":1,"__proto__":{"isAdmin":true,"roles":["admin"]},"constructor":{"prototype":{"polluted":1}}}`);
    expect(polluted.status).toBeLessThan(500);
    expect(({} as Record<string, unknown>).isAdmin).toBeUndefined();
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    const deep = await request(h.app).post('/api/auth/login').set('Origin', ORIGIN).set('Content-Type', 'application/json').send(`${'['.repeat(100_000)}${']'.repeat(100_000)}`);
    expect([400, 413]).toContain(deep.status);
    const big = await request(h.app).post('/api/auth/login').set('Origin', ORIGIN).set('Content-Type', 'application/json').send(`{"email":"${'a'.repeat(1_100_000)}"}`);
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe('payload_too_large');
  });
});

// --- mass assignment ---------------------------------------------------------------------------------

describe('fields a caller may not set', () => {
  it('when a registration asks for the admin role or a verified address, then the account is a plain unverified buyer', async () => {
    const email = uniqueEmail('massassign');
    const r = await request(h.app)
      .post('/api/auth/register')
      .set('Origin', ORIGIN)
      .send({ email, password: TEST_PASSWORD, displayName: 'Fictional Climber', roles: ['admin', 'seller'], emailVerifiedAt: new Date().toISOString(), id: '00000000-0000-4000-8000-000000000001' });
    expect([201, 400]).toContain(r.status);
    const [u] = await getDb().select().from(users).where(eq(users.email, email));
    if (r.status === 201) {
      expect(u.roles).toEqual(['buyer']);
      expect(u.emailVerifiedAt).toBeNull();
      expect(u.id).not.toBe('00000000-0000-4000-8000-000000000001');
    } else expect(u).toBeUndefined();
  });

  it('when a listing is created or patched with state, seller or flags, then they are not taken from the body', async () => {
    const other = await createShop();
    const r = await sellerAgent
      .post('/api/listings')
      .set('Origin', ORIGIN)
      .send({ title: 'Fictional mass-assignment lamp', description: 'A fictional lamp described in plenty of words.', condition: 'reproduction', quantity: 1, priceCents: 900, state: 'approved', sellerId: other.user.id, approvedAt: new Date().toISOString() });
    if (r.status === 201) {
      const [row] = await getDb().select().from(listings).where(eq(listings.id, r.body.listing.id));
      expect(row).toMatchObject({ state: 'draft', sellerId });
      expect(row.approvedAt).toBeNull();
      const p = await sellerAgent.patch(`/api/listings/${row.id}`).set('Origin', ORIGIN).send({ state: 'approved', sellerId: other.user.id });
      expect(p.status).toBeLessThan(500);
      const [again] = await getDb().select().from(listings).where(eq(listings.id, row.id));
      expect(again).toMatchObject({ state: 'draft', sellerId });
    } else {
      expect(r.status).toBe(400);
    }
  });

  it('when a shop is saved with payout fields or a garage vehicle with another owner, then those fields are ignored or refused', async () => {
    const shop = await sellerAgent.put('/api/me/shop').set('Origin', ORIGIN).send({ shopName: 'Fictional Attack Yard', shipsTo: ['US'], payoutsEnabled: true, stripeAccountId: 'acct_forged' });
    expect(shop.status).toBeLessThan(500);
    const [profile] = await getDb().select().from(sellerProfiles).where(eq(sellerProfiles.userId, sellerId));
    expect(profile.payoutsEnabled).toBe(false);
    expect(profile.stripeAccountId).not.toBe('acct_forged');

    const { vehicle: model } = await createVehicleWithAssembly();
    const victim = await createUser();
    const v = await buyerAgent.post('/api/garage/vehicles').set('Origin', ORIGIN).send({ vehicleSlug: model.slug, serial: 'MA-00100', originalityTarget: 'as_built', userId: victim.id, ownerId: victim.id });
    expect(v.status).toBeLessThan(500);
    if (v.status === 201) {
      const [row] = await getDb().select().from(garageVehicles).where(eq(garageVehicles.id, v.body.vehicle.id));
      expect(Object.values(row)).not.toContain(victim.id);
    }
  });
});

// --- cross-site requests -----------------------------------------------------------------------------

describe('cross-site requests', () => {
  const changing = routes.filter((r) => !['GET', 'HEAD', 'OPTIONS'].includes(r.method) && r.guard?.kind !== 'signature');

  it('when any state-changing route of the router table is called without our Origin, then 403 cross_site_refused, signed in or not', async () => {
    expect(changing.length).toBeGreaterThan(50);
    const variants: Array<[string, Record<string, string>]> = [
      ['no Origin', {}],
      ['another site', { Origin: 'https://evil.example' }],
      ['our origin as a prefix', { Origin: `${ORIGIN}.evil.example` }],
      ['Origin null', { Origin: 'null' }],
      ['cross-site fetch', { 'Sec-Fetch-Site': 'cross-site' }],
      ['same-site fetch', { 'Sec-Fetch-Site': 'same-site' }],
      ['Referer only', { Referer: `${ORIGIN}/cart` }],
    ];
    const failures: string[] = [];
    for (const route of changing) {
      for (const [name, headers] of variants) {
        for (const client of [buyerAgent, sellerAgent, request(h.app)] as const) {
          const m = route.method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
          let req = (client as ReturnType<typeof request>)[m](fill(route.path));
          for (const [k, v] of Object.entries(headers)) req = req.set(k, v);
          const r = await req.send({});
          if (r.status !== 403 || r.body.error?.code !== 'cross_site_refused') failures.push(`${route.method} ${route.path} (${name}): ${r.status} ${r.body.error?.code ?? ''}`);
        }
      }
    }
    expect(failures).toEqual([]);
  }, 60_000);

  it('when a cross-site form posts to the cart of a signed-in buyer, then nothing is added', async () => {
    const shop = await createShop();
    const live = await createLiveListing(shop.user.id, { quantity: 2 });
    const r = await buyerAgent.post('/api/cart/items').type('form').set('Origin', 'https://evil.example').send({ listingId: live.id, quantity: '1' });
    expect(r.status).toBe(403);
    const cart = await buyerAgent.get('/api/cart');
    expect(JSON.stringify(cart.body)).not.toContain(live.id);
  });

  it('when the webhook is posted without Origin, then the signature check answers, not the origin check', async () => {
    const r = await request(h.app).post('/api/webhooks/stripe').set('Content-Type', 'application/json').send('{}');
    expect(r.status).toBe(400);
    expect(r.body.error.code).not.toBe('cross_site_refused');
  });
});

// --- sessions and sign-in ------------------------------------------------------------------------------

const sid = (r: request.Response) => ([] as string[]).concat(r.headers['set-cookie'] ?? []).find((c) => c.startsWith('drabyard.sid='))?.split(';')[0];

describe('sessions and sign-in', () => {
  it('when someone signs in on a browser that already holds a session, then a new id is issued and the old one opens nothing', async () => {
    const first = await createUser();
    const second = await createUser();
    const agent = request.agent(h.app);
    const a = await agent.post('/api/auth/login').set('Origin', ORIGIN).send({ email: first.email, password: first.password });
    const b = await agent.post('/api/auth/login').set('Origin', ORIGIN).send({ email: second.email, password: second.password });
    const idA = sid(a);
    const idB = sid(b);
    expect(idA).toBeTruthy();
    expect(idB).toBeTruthy();
    expect(idB).not.toBe(idA);
    expect((await agent.get('/api/auth/me')).body.user.id).toBe(second.id);
    // The first session was regenerated away: its cookie opens nothing any more.
    expect((await request(h.app).get('/api/auth/me').set('Cookie', idA!)).status).toBe(401);
  });

  it('when a visitor plants a made-up session cookie and signs in, then the server issues its own id', async () => {
    const u = await createUser();
    const planted = 'drabyard.sid=s%3Aattacker-chosen-id.invalidsignature';
    const r = await request(h.app).post('/api/auth/login').set('Origin', ORIGIN).set('Cookie', planted).send({ email: u.email, password: u.password });
    expect(r.status).toBe(200);
    expect(sid(r)).toBeTruthy();
    expect(sid(r)).not.toBe(planted);
  });

  it('when a user signs out, then the old cookie is dead on the server too (not only cleared in the browser)', async () => {
    const u = await createUser();
    const agent = request.agent(h.app);
    const login = await agent.post('/api/auth/login').set('Origin', ORIGIN).send({ email: u.email, password: u.password });
    const cookie = sid(login)!;
    expect((await request(h.app).get('/api/auth/me').set('Cookie', cookie)).status).toBe(200);
    expect((await agent.post('/api/auth/logout').set('Origin', ORIGIN).send({})).status).toBe(204);
    expect((await request(h.app).get('/api/auth/me').set('Cookie', cookie)).status).toBe(401);
    expect((await request(h.app).get('/api/orders').set('Cookie', cookie)).status).toBe(401);
  });

  it('when a session cookie is tampered with, then it is ignored', async () => {
    const u = await createUser();
    const login = await request(h.app).post('/api/auth/login').set('Origin', ORIGIN).send({ email: u.email, password: u.password });
    const cookie = sid(login)!;
    const tampered = cookie.replace(/.$/, (c) => (c === 'A' ? 'B' : 'A'));
    expect((await request(h.app).get('/api/auth/me').set('Cookie', tampered)).status).toBe(401);
  });

  it('when one account gets five wrong passwords, then it is throttled with 429 and Retry-After, while another account still signs in', async () => {
    const target = await createUser();
    const bystander = await createUser();
    for (let i = 0; i < 5; i++) {
      const r = await request(h.app).post('/api/auth/login').set('Origin', ORIGIN).send({ email: target.email, password: `wrong-${i}-password` });
      expect(r.status).toBe(401);
    }
    const locked = await request(h.app).post('/api/auth/login').set('Origin', ORIGIN).send({ email: target.email, password: target.password });
    expect(locked.status).toBe(429);
    expect(locked.body.error.code).toBe('rate_limited');
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
    // Upper case or spaces do not make a fresh account name for the counter.
    const variant = await request(h.app).post('/api/auth/login').set('Origin', ORIGIN).send({ email: ` ${target.email.toUpperCase()} `, password: target.password });
    expect([400, 429]).toContain(variant.status);
    expect((await request(h.app).post('/api/auth/login').set('Origin', ORIGIN).send({ email: bystander.email, password: bystander.password })).status).toBe(200);
  });
});

// --- uploads (the full set lives in listing-uploads.test.ts) ----------------------------------------

describe('upload attacks not covered elsewhere', () => {
  const upload = (id: string, buffer: Buffer, filename: string, contentType = 'image/jpeg') =>
    sellerAgent.post(`/api/listings/${id}/photos`).set('Origin', ORIGIN).attach('photos', buffer, { filename, contentType });

  it('when a JPEG carries an HTML/script payload after its end, then only the re-encoded picture is stored', async () => {
    const l = await createListingVia(sellerAgent);
    const payload = '<html><script>alert(document.cookie)</script></html>';
    const r = await upload(l.id, Buffer.concat([await jpeg(11), Buffer.from(payload)]), 'polyglot.jpg');
    expect(r.status).toBe(201);
    const files = storedFiles(l.id);
    expect(files.length).toBeGreaterThan(0);
    for (const f of files) {
      const bytes = readFileSync(path.join(mediaDir(), 'listings', l.id, f));
      expect(bytes.includes(Buffer.from('<script'))).toBe(false);
      expect(f).toMatch(/\.webp$/);
    }
  });

  it('when the filename tries to climb out of the media folder, then the file is stored under our own key', async () => {
    const l = await createListingVia(sellerAgent);
    const r = await upload(l.id, await jpeg(12), '../../../../tmp/drabyard-escape.jpg');
    expect(r.status).toBe(201);
    expect(existsSync('/tmp/drabyard-escape.jpg')).toBe(false);
    const rows = await photoRows(l.id);
    expect(rows).toHaveLength(1);
    expect(JSON.stringify(rows[0])).not.toContain('..');
    for (const f of storedFiles(l.id)) expect(f).not.toContain('escape');
  });

  it('when HTML is sent as image/png or an SVG comes to a garage teardown line, then 415 and nothing is stored', async () => {
    const l = await createListingVia(sellerAgent);
    const html = await upload(l.id, Buffer.from('<!doctype html><script>alert(1)</script>'), 'pic.png', 'image/png');
    expect(html.status).toBe(415);
    expect(storedFiles(l.id)).toEqual([]);
    const { vehicle: model, assembly } = await createVehicleWithAssembly();
    const v = await buyerAgent.post('/api/garage/vehicles').set('Origin', ORIGIN).send({ vehicleSlug: model.slug, serial: 'UP-00100', originalityTarget: 'as_built' });
    const check = await buyerAgent.get(`/api/garage/vehicles/${v.body.vehicle.id}/assemblies/${assembly.id}`);
    const line = check.body.lines?.[0];
    if (line) {
      const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>');
      const r = await buyerAgent
        .post(`/api/garage/vehicles/${v.body.vehicle.id}/teardown/${line.bomLineId ?? line.id}/photos`)
        .set('Origin', ORIGIN)
        .attach('photos', svg, { filename: 'tag.svg', contentType: 'image/svg+xml' });
      expect([400, 415]).toContain(r.status);
    }
  });

  it('when a media path climbs out of the media folder, then it is refused and no file outside is served', async () => {
    for (const p of ['/media/..%2f..%2fpackage.json', '/media/%2e%2e/%2e%2e/package.json', '/media/listings/..%2F..%2F..%2Fpackage.json', '/media/.env', '/media/listings/%00.webp']) {
      const r = await request(h.app).get(p);
      expect(r.status, p).toBeGreaterThanOrEqual(400);
      expect(r.status, p).toBeLessThan(500);
      expect(r.text ?? '', p).not.toContain('"name": "drabyard"');
    }
    expect(readdirSync(mediaDir()).length).toBeGreaterThan(0);
  });
});

// --- webhooks (signatures and replays are in webhooks.test.ts) ---------------------------------------

describe('webhook forgery not covered elsewhere', () => {
  const post = (body: string | Buffer, signature?: string, type = 'application/json') => {
    const r = request(h.app).post('/api/webhooks/stripe').set('Content-Type', type);
    return (signature ? r.set('Stripe-Signature', signature) : r).send(body);
  };
  const stripe = new Stripe('sk_test_attacks', { host: '127.0.0.1', port: 1, protocol: 'http' });
  const sign = (body: string, secret: string, timestamp = Math.floor(Date.now() / 1000)) => stripe.webhooks.generateTestHeaderString({ payload: body, secret, timestamp });

  it('when the signature uses only an unknown scheme, an empty secret or is garbage, then 400', async () => {
    const body = JSON.stringify({ id: 'evt_attack_1', object: 'event', type: 'checkout.session.completed', data: { object: {} } });
    const t = Math.floor(Date.now() / 1000);
    for (const s of [`t=${t},v0=deadbeef`, `t=${t}`, 'v1=', sign(body, ''), 'garbage', `t=${t},v1=${'0'.repeat(64)}`]) {
      const r = await post(body, s);
      expect(r.status, s).toBe(400);
      expect(r.body.error.message).toMatch(/signature/);
    }
  });

  it('when the body is signed but not JSON, is a form post, or is over 1 MB, then it is refused without a 500', async () => {
    const notJson = 'this is not json';
    expect((await post(notJson, sign(notJson, h.webhookSecret))).status).toBe(400);
    expect((await post('type=checkout.session.completed', undefined, 'application/x-www-form-urlencoded')).status).toBe(400);
    const big = `{"pad":"${'x'.repeat(1_100_000)}"}`;
    expect((await post(big, sign(big, h.webhookSecret))).status).toBe(413);
  });

  it('when the webhook path is read with GET, then there is nothing there', async () => {
    expect((await request(h.app).get('/api/webhooks/stripe')).status).toBe(404);
  });
});

// --- open redirects ----------------------------------------------------------------------------------

const EVIL = ['https://evil.example/steal', '//evil.example', '/\\evil.example', 'http:evil.example', '\\\\evil.example', 'javascript:alert(1)'];
const REDIRECT_PARAMS = ['next', 'redirect', 'returnTo', 'return_to', 'continue', 'url', 'redirect_uri'];

function expectNoOffsiteRedirect(r: request.Response, what: string) {
  const loc = r.headers.location as string | undefined;
  if (r.status >= 300 && r.status < 400) {
    expect(loc, what).toBeDefined();
    // Only a path on this site: not protocol-relative, no scheme, no backslash tricks.
    expect(loc!, `${what} -> ${loc}`).toMatch(/^\/(?![/\\])/);
    expect(new URL(loc!, ORIGIN).origin, `${what} -> ${loc}`).toBe(ORIGIN);
  } else {
    expect(loc, what).toBeUndefined();
  }
}

describe('open redirects', () => {
  it('when any GET route of the router table or the app shell gets a next/redirect/returnTo pointing off-site, then nobody is redirected', async () => {
    const paths = [...routes.filter((r) => r.method === 'GET').map((r) => fill(r.path)), '/', '/sign-in', '/register', '/cart', '/checkout/done', '/orders/x'];
    for (const p of paths) {
      for (const target of EVIL) {
        const q = Object.fromEntries(REDIRECT_PARAMS.map((k) => [k, target]));
        const r = await buyerAgent.get(p).query(q).redirects(0);
        expectNoOffsiteRedirect(r, `${p}?next=${target}`);
      }
    }
  }, 60_000);

  it('when the shell is asked for /sign-in?next=https://evil.example, then it is the app shell with 200 and no Location', async () => {
    const r = await request(h.app).get('/sign-in').query({ next: 'https://evil.example' }).redirects(0);
    if (!existsSync(path.resolve('dist/client/index.html'))) return; // the shell exists once the client is built (npm test builds it)
    expect(r.status).toBe(200);
    expect(r.headers['content-type']).toMatch(/text\/html/);
    expect(r.headers.location).toBeUndefined();
    expect(r.text).not.toContain('evil.example');
  });

  it('when sign-in, sign-out or registration carry a next parameter, then the answer is JSON and never a redirect', async () => {
    const u = await createUser();
    const login = await request(h.app).post('/api/auth/login?next=https://evil.example').set('Origin', ORIGIN).send({ email: u.email, password: u.password, next: 'https://evil.example' }).redirects(0);
    expect(login.status).toBe(200);
    expect(login.headers.location).toBeUndefined();
    const out = await request(h.app).post('/api/auth/logout?returnTo=//evil.example').set('Origin', ORIGIN).send({}).redirects(0);
    expect(out.status).toBe(204);
    expect(out.headers.location).toBeUndefined();
  });

  it('when a path looks protocol-relative or points at a folder, then any redirect stays on this site', async () => {
    for (const p of ['//evil.example/', '//evil.example/%2e%2e', '/%2F%2Fevil.example', '/%5Cevil.example', '/assets', '/assets//evil.example/..', '/media', '/media//evil.example', '///evil.example']) {
      const r = await request(h.app).get(p).redirects(0);
      expectNoOffsiteRedirect(r, p);
    }
  });
});

// --- security headers and rendered text -------------------------------------------------------------

function cspDirectives(csp: string) {
  return Object.fromEntries(
    csp
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((d) => d[0])
      .map(([name, ...values]) => [name, values]),
  ) as Record<string, string[]>;
}

describe('security headers', () => {
  const shellBuilt = existsSync(path.resolve('dist/client/index.html'));

  for (const [name, p] of [
    ['the HTML shell', '/garage'],
    ['an API reply', '/api/vehicles'],
    ['an API error', '/api/nothing-here'],
    ['the API docs page', '/api/docs'],
  ] as const) {
    it(`when ${name} is served, then the CSP allows no inline or eval script and the usual headers are set`, async () => {
      if (name === 'the HTML shell' && !shellBuilt) return;
      const r = await request(h.app).get(p);
      const csp = cspDirectives(r.headers['content-security-policy'] ?? '');
      const scripts = csp['script-src'] ?? csp['default-src'];
      expect(scripts, p).toBeDefined();
      expect(scripts).not.toContain("'unsafe-inline'");
      expect(scripts).not.toContain("'unsafe-eval'");
      expect(scripts.some((s) => s === '*' || s === 'data:' || s === 'http:' || s === 'https:')).toBe(false);
      expect(csp['object-src']).toEqual(["'none'"]);
      expect(csp['frame-ancestors']).toEqual(["'none'"]);
      expect(csp['base-uri']).toEqual(["'self'"]);
      expect(r.headers['x-content-type-options']).toBe('nosniff');
      expect(r.headers['x-frame-options']).toMatch(/DENY|SAMEORIGIN/);
      expect(r.headers['referrer-policy']).toBeTruthy();
      expect(r.headers['strict-transport-security']).toMatch(/max-age=\d+/);
      expect(r.headers['cross-origin-opener-policy']).toBe('same-origin');
      expect(r.headers['x-powered-by']).toBeUndefined();
    });
  }

  it('when the shell HTML is read, then every script is an external file, so the strict CSP does not break the app', async () => {
    if (!shellBuilt) return;
    const r = await request(h.app).get('/');
    const scripts = [...r.text.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)];
    expect(scripts.length).toBeGreaterThan(0);
    for (const [, attrs, body] of scripts) {
      expect(attrs).toMatch(/\bsrc=/);
      expect(body.trim()).toBe('');
    }
    expect(r.text).not.toMatch(/\son\w+\s*=/i);
  });

  it('when an API error is returned, then it is our JSON shape without stack traces or SQL', async () => {
    for (const p of ['/api/parts/not-a-uuid', '/api/assemblies/00000000-0000-4000-8000-000000000000', '/api/search?limit=-1']) {
      const r = await request(h.app).get(p);
      expect(r.status).toBeGreaterThanOrEqual(400);
      expect(r.headers['content-type']).toMatch(/application\/json/);
      expect(Object.keys(r.body)).toEqual(['error']);
      expect(JSON.stringify(r.body)).not.toMatch(/at \w+ \(|node_modules|SELECT |syntax error/);
    }
  });

  it('when signed in, then the session cookie is HttpOnly and SameSite=Lax, and personal replies are not cached by shared caches', async () => {
    const u = await createUser();
    const login = await request(h.app).post('/api/auth/login').set('Origin', ORIGIN).send({ email: u.email, password: u.password });
    const cookie = ([] as string[]).concat(login.headers['set-cookie'] ?? []).find((c) => c.startsWith('drabyard.sid='))!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const orders = await request(h.app).get('/api/orders').set('Cookie', cookie.split(';')[0]);
    expect(orders.status).toBe(200);
    expect(orders.headers['cache-control'] ?? '').not.toMatch(/\bpublic\b/);
  });
});

describe('text stored verbatim, HTML escaped where the server renders it', () => {
  it('when a listing description carries script, event handlers and javascript: links, then the stored HTML has none and the markdown is kept as typed', async () => {
    const md = 'Fictional lamp <script>alert(1)</script> <img src=x onerror=alert(2)> [click](javascript:alert(3)) <a href="https://evil.example" onclick="x()">x</a> **bold**';
    const l = await createListingVia(sellerAgent, { description: md, descriptionFormat: 'markdown' });
    const [row] = await getDb().select().from(listings).where(eq(listings.id, l.id));
    expect(row.descriptionMd).toBe(md);
    const html = row.descriptionHtml ?? '';
    // No script or image tag, no handler attribute on any tag, no javascript: link (escaped text may mention them).
    expect(html).not.toMatch(/<script|<img/i);
    expect(html).not.toMatch(/<[a-z][^>]*\son\w+\s*=/i);
    expect(html).not.toMatch(/href\s*=\s*["']?\s*javascript:/i);
    expect(html).toContain('&lt;script&gt;');
    expect(html).toContain('<strong>bold</strong>');
    const page = await request(h.app).get(`/api/listings/${l.id}`);
    for (const [k, v] of Object.entries(page.body.listing ?? {})) {
      if (typeof v === 'string' && /html/i.test(k)) expect(v, k).not.toMatch(/<script|<img|<[a-z][^>]*\son\w+\s*=/i);
    }
  });

  it('when a display name carries HTML, then the mail to that person shows it escaped', async () => {
    const email = uniqueEmail('htmlname');
    const name = '<img src=x onerror=alert(1)> Fictional';
    const r = await request(h.app).post('/api/auth/register').set('Origin', ORIGIN).send({ email, password: TEST_PASSWORD, displayName: name });
    expect(r.status).toBe(201);
    expect(r.body.user.displayName).toBe(name);
    const mail = await waitForMail(email);
    expect(mail.html).not.toContain('<img src=x');
    expect(mail.html).toContain('&lt;img src=x onerror=alert(1)&gt;');
  });

  it('when a cart line is added with a hostile listing id, then the reply is a 400 naming the field', async () => {
    const r = await addToCart(buyerAgent, '<script>', 1).catch((e: Error) => e);
    expect(r).toBeInstanceOf(Error);
    expect(String(r)).toMatch(/400/);
  });
});
