import { randomInt } from 'node:crypto';
import { eq, sql } from 'drizzle-orm';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { getDb } from '../../server/db/client';
import { listingPhotos, listings, parts, sellerProfiles, systems } from '../../server/db/schema/index';
import { conditionCodes, type Condition } from '../../server/domain/conditions';
import { FIXED_VALUES, originalityOf, priceBandOf, PRICE_BANDS } from '../../server/services/search-codes';
import type { FacetName, SearchHit, SearchReply } from '../../shared/schemas/search';
import { addLine, createPart, createVehicleWithAssembly, supersede } from '../factories/catalog';
import { createListingRow, createSellerProfile } from '../factories/listings';

const app = createApp();

/** A word of letters only, unique to one test, so rows made by other tests never match. */
const word = () => `zq${Array.from({ length: 7 }, () => String.fromCharCode(97 + randomInt(26))).join('')}`;
const digits = (n: number) => Array.from({ length: n }, () => String(randomInt(2, 10))).join('');

function qs(params: Record<string, string | number | string[] | undefined>) {
  const u = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) {
    if (v === undefined) continue;
    for (const x of Array.isArray(v) ? v : [v]) u.append(k, String(x));
  }
  return u.toString();
}
const get = (params: Record<string, string | number | string[] | undefined>) => request(app).get(`/api/search?${qs(params)}`);
async function find(params: Record<string, string | number | string[] | undefined>): Promise<SearchReply> {
  const r = await get(params);
  expect(r.status, JSON.stringify(r.body)).toBe(200);
  return r.body as SearchReply;
}
const hitOf = (reply: SearchReply, id: string) => reply.hits.find((h: SearchHit) => h.id === id);

describe('search: part numbers in any shape', () => {
  it('when a number is typed with other hyphens, spaces, case, O for 0, I for 1 or without its leading zeros, then the part is found', async () => {
    const body = `${digits(2)}01${digits(2)}`;
    const printed = `QX-${body}-B7`;
    const part = await createPart({ numbers: [{ number: printed }, { number: `007-${digits(5)}`, kind: 'ordnance' }] });
    const ordnance = (await getDb().execute<{ printed: string }>(sql`SELECT printed FROM part_numbers WHERE part_id = ${part.id} AND kind = 'ordnance'`)).rows[0].printed;
    const shapes = [
      printed,
      printed.toLowerCase(),
      printed.replace(/-/g, ''),
      printed.replace(/-/g, ' '),
      printed.replace(/-/g, '/').toLowerCase(),
      printed.replace('0', 'O'),
      printed.replace('1', 'I').toLowerCase(),
      ordnance.replace(/^0+/, ''),
      `  ${printed}  `,
    ];
    for (const shape of shapes) {
      const r = await find({ q: shape });
      expect(r.matchMode, shape).toBe('number');
      expect(hitOf(r, part.id), `shape ${shape}`).toBeDefined();
    }
    const exact = await find({ q: printed.toLowerCase() });
    expect(hitOf(exact, part.id)).toMatchObject({ type: 'part', matchedNumber: printed, fitNote: null });
    const folded = await find({ q: printed.replace('0', 'O') });
    expect(hitOf(folded, part.id)?.fitNote).toContain('read alike');
  });

  it('when a number has one mistyped character or is cut short, then the part is found and the typo is named', async () => {
    const printed = `WX-${digits(6)}-K3`;
    const part = await createPart({ numbers: [{ number: printed }] });
    const typo = await find({ q: printed.replace(/3$/, '8') });
    expect(hitOf(typo, part.id)?.fitNote).toBe(`closest number to what you typed: ${printed}`);
    const prefix = await find({ q: printed.slice(0, 8) });
    expect(hitOf(prefix, part.id)?.matchedNumber).toBe(printed);
  });

  it('when a character is dropped, added, mistyped or swapped anywhere, then the part is found as the closest number', async () => {
    const printed = `JN-${digits(6)}-T4`;
    const part = await createPart({ numbers: [{ number: printed }] });
    const key = printed.replace(/-/g, '');
    const typos = [
      key.slice(1), // the first character dropped
      key.slice(0, 4) + key.slice(5),
      key.slice(0, -1), // the last dropped: also a prefix of nothing else, so found as a typo or a prefix
      `J${key}`, // one added in front
      key.slice(0, 5) + '3' + key.slice(5),
      key.slice(0, 3) + (key[3] === '2' ? '9' : '2') + key.slice(4), // a digit for a digit
      key.slice(0, 6) + 'K' + key.slice(7), // a letter for a digit (among the less likely typos)
      key.slice(0, 3) + key[4] + key[3] + key.slice(5), // two swapped
    ];
    for (const typo of typos) {
      const r = await find({ q: typo });
      expect(hitOf(r, part.id)?.matchedNumber, typo).toBe(printed);
    }
  });

  it('when a typo could be a likely slip for one number and a less likely one for another, then only the likely one is offered', async () => {
    const body = digits(6);
    const likely = await createPart({ numbers: [{ number: `HP-${body}-2` }] });
    const other = await createPart({ numbers: [{ number: `HP-${body}-K` }] });
    // HP…-7: a digit for a digit away from -2, a digit for a letter away from -K.
    const r = await find({ q: `HP-${body}-7` });
    expect(hitOf(r, likely.id)?.fitNote).toContain('closest number');
    expect(hitOf(r, other.id)).toBeUndefined();
  });

  it('when the database folds a key into its deletions, then it gives what the application computes', async () => {
    const { keyDeletions } = await import('../../server/services/search-text');
    for (const k of ['BW280338B', 'AAB', '2920008062759', 'A', 'QQQQ']) {
      const rows = (await getDb().execute<{ d: string[] }>(sql`SELECT number_key_deletions(${k}) AS d`)).rows;
      expect(new Set(rows[0].d), k).toEqual(new Set(keyDeletions(k)));
    }
  });

  it('when an O is typed for a 0 and a digit is wrong besides, then the right number is still proposed as close', async () => {
    const body = digits(5);
    const printed = `KN-20${body}-R`;
    const part = await createPart({ numbers: [{ number: printed }] });
    // Two edits from the number (a wrong digit, a dropped letter), typed with an O for the 0.
    const r = await find({ q: `KN-2O${body.slice(0, 4)}${body[4] === '9' ? '1' : '9'}` });
    expect(r.total).toBe(0);
    expect(r.didYouMean).toContainEqual({ number: printed, partId: part.id });
  });

  it('when nothing is close enough, then there are no hits and close numbers are proposed', async () => {
    const printed = `VR-${digits(6)}-M2`;
    const part = await createPart({ numbers: [{ number: printed }] });
    // Two characters changed: past the one-typo lookup, still close by trigrams.
    const garbled = `${printed.slice(0, 6)}ZZ${printed.slice(8)}`;
    const r = await find({ q: garbled });
    expect(r.total).toBe(0);
    expect(r.hits).toEqual([]);
    expect(r.didYouMean).toContainEqual({ number: printed, partId: part.id });
  });
});

describe('search: supersessions', () => {
  it('when an old number is replaced two-way, then each number finds the other and the hit says how', async () => {
    const old = await createPart({ numbers: [{ number: `TW-${digits(6)}-A` }] });
    const neu = await createPart({ numbers: [{ number: `TW-${digits(6)}-B` }] });
    await supersede(old, neu, 'two_way');
    const { user } = await createSellerProfile();
    const listing = await createListingRow(user.id, { partId: neu.id, title: 'Clamp, brake line' });

    const byOld = await find({ q: old.number });
    expect(hitOf(byOld, old.id)).toMatchObject({ fitNote: null, matchedNumber: old.number });
    expect(hitOf(byOld, listing.id)).toMatchObject({
      type: 'listing',
      matchedNumber: neu.number,
      fitNote: `listed under replacement number ${neu.number}, two-way interchangeable`,
    });
    const byNew = await find({ q: neu.number });
    expect(hitOf(byNew, old.id)?.fitNote).toBe(`listed under earlier number ${old.number}, two-way interchangeable`);
  });

  it('when an old number is replaced one-way, then the old number finds the new part but the new number never finds the old one', async () => {
    const old = await createPart({ numbers: [{ number: `OW-${digits(6)}-A` }] });
    const neu = await createPart({ numbers: [{ number: `OW-${digits(6)}-B` }] });
    await supersede(old, neu, 'one_way');
    const { user } = await createSellerProfile();
    const oldListing = await createListingRow(user.id, { partId: old.id });
    const newListing = await createListingRow(user.id, { partId: neu.id });

    const byOld = await find({ q: old.number });
    expect(hitOf(byOld, oldListing.id)).toBeDefined();
    expect(hitOf(byOld, newListing.id)?.fitNote).toMatch(/^listed under replacement number .*, one-way/);
    const byNew = await find({ q: neu.number });
    expect(hitOf(byNew, newListing.id)).toBeDefined();
    expect(hitOf(byNew, old.id)).toBeUndefined();
    expect(hitOf(byNew, oldListing.id)).toBeUndefined();
    expect(byNew.total).toBe(2);
  });

  it('when a number is replaced by a kit, then each kit part is found with a note naming the kit', async () => {
    const old = await createPart({ numbers: [{ number: `KT-${digits(6)}-A` }] });
    const a = await createPart({ numbers: [{ number: `KT-${digits(6)}-B` }] });
    const b = await createPart({ numbers: [{ number: `KT-${digits(6)}-C` }] });
    await supersede(old, a, 'one_way');
    await supersede(old, b, 'one_way');
    const r = await find({ q: old.number });
    for (const p of [a, b]) expect(hitOf(r, p.id)?.fitNote).toContain(`one of 2 parts of the kit that replaces ${old.number}`);
  });
});

describe('search: words, facets and pages', () => {
  it('when words are typed, then numbers rank above names above descriptions, and a typo is corrected', async () => {
    const w = word();
    const { user } = await createSellerProfile();
    const inName = await createListingRow(user.id, { title: `Bracket ${w} rear` });
    const inDescription = await createListingRow(user.id, { title: 'Bracket, rear', descriptionMd: `Came off a ${w} truck.` });
    const r = await find({ q: w });
    expect(r.matchMode).toBe('all');
    expect(r.hits.map((h) => h.id)).toEqual([inName.id, inDescription.id]);
    expect(r.hits[0].score).toBeGreaterThan(r.hits[1].score);
    const typo = await find({ q: w.slice(0, 4) + w.slice(5) });
    expect(typo.corrections).toContainEqual({ from: w.slice(0, 4) + w.slice(5), to: w });
    expect(hitOf(typo, inName.id)).toBeDefined();
    const any = await find({ q: `${w} zqnothinghere` });
    expect(any.matchMode).toBe('any');
    expect(hitOf(any, inName.id)).toBeDefined();
  });

  it('when filters are active, then every facet counts what all the other filters let through (brute force over the same rows)', async () => {
    // The rows are told apart from everyone else's by a word in their names, so every facet can be checked.
    const w = word();
    const { vehicle, assembly } = await createVehicleWithAssembly();
    const [system] = await getDb().select().from(systems).where(eq(systems.id, assembly.systemId));
    const p1 = await createPart({ name: `Lever ${w}` });
    const p2 = await createPart({ name: `Shaft ${w}` });
    await addLine(assembly.id, p1.id);
    await addLine(assembly.id, p2.id, { callout: '2' });
    const a = await createSellerProfile({ shipsTo: ['US', 'CA'], pickupAtShows: true });
    const b = await createSellerProfile({ shipsTo: ['GB'] });
    const plan: Array<{ part: typeof p1; seller: typeof a; condition: Condition; price: number; photos: number; quantity: number }> = [];
    const prices = [500, 1500, 4999, 5000, 19999, 25000, 99999, 150000];
    conditionCodes.forEach((condition, i) => {
      for (let j = 0; j < 3; j++) {
        plan.push({ part: (i + j) % 2 ? p1 : p2, seller: (i * 3 + j) % 3 ? a : b, condition, price: prices[(i * 3 + j) % prices.length], photos: j % 2, quantity: (i + j) % 4 ? 2 : 0 });
      }
    });
    const made: Array<(typeof plan)[number] & { row: { id: string } }> = [];
    for (const x of plan) made.push({ ...x, row: await createListingRow(x.seller.user.id, { partId: x.part.id, condition: x.condition, priceCents: x.price, photos: x.photos, quantity: x.quantity }) });

    // The rows as the facets see them.
    type Row = Partial<Record<Exclude<FacetName, 'price'>, string[]>> & { cents: number | null };
    const stocked = (partId: string) => made.some((m) => m.part.id === partId && m.quantity > 0);
    const common = { vehicle: [vehicle.slug], system: [system.slug], assembly: [assembly.slug] };
    const rows: Row[] = [
      ...[p1, p2].map((p): Row => ({ ...common, type: ['part'], inStock: [String(stocked(p.id))], cents: null })),
      ...made.map((m): Row => ({
        ...common,
        type: ['listing'],
        condition: [m.condition],
        originality: [originalityOf(m.condition)],
        seller: [m.seller.user.id],
        cents: m.price,
        shipsTo: m.seller.profile.shipsTo,
        pickup: [String(m.seller.profile.pickupAtShows)],
        hasPhotos: [String(m.photos > 0)],
        inStock: [String(m.quantity > 0)],
      })),
    ];
    const band = (r: Row) => (r.cents === null ? [] : [priceBandOf(r.cents)]);

    const cases: Array<Record<string, string | string[]>> = [
      { q: w },
      { q: w, vehicle: vehicle.slug },
      { q: w, condition: ['nos', 'reproduction'], priceMin: '1000', priceMax: '20000' },
      { q: w, vehicle: vehicle.slug, shipsTo: 'CA', hasPhotos: 'true', inStock: 'true' },
      { q: w, seller: b.user.id, originality: 'original', price: ['under_10', '200_1000'] },
      { q: w, type: 'part' },
      { q: w, pickup: 'false', condition: 'core', inStock: 'false' },
    ];
    for (const c of cases) {
      const filters: Array<[FacetName, (r: Row) => boolean]> = [];
      const has = (f: Exclude<FacetName, 'price'>, vals: string[]) => (r: Row) => (r[f] ?? []).some((v) => vals.includes(v));
      const list = (v: string | string[] | undefined) => (v === undefined ? [] : Array.isArray(v) ? v : [v]);
      for (const f of ['vehicle', 'condition', 'shipsTo', 'hasPhotos', 'inStock', 'pickup', 'seller', 'originality', 'type'] as const) {
        if (c[f] !== undefined) filters.push([f, has(f, list(c[f]))]);
      }
      if (c.price || c.priceMin || c.priceMax) {
        const bands = list(c.price);
        filters.push(['price', (r) => r.cents !== null && (!bands.length || bands.includes(priceBandOf(r.cents))) && (c.priceMin === undefined || r.cents >= Number(c.priceMin)) && (c.priceMax === undefined || r.cents <= Number(c.priceMax))]);
      }
      const passesExcept = (r: Row, except: FacetName | null) => filters.every(([f, p]) => f === except || p(r));
      const reply = await find(c);
      expect(reply.totalIsEstimate).toBe(false);
      expect(reply.total, JSON.stringify(c)).toBe(rows.filter((r) => passesExcept(r, null)).length);
      for (const facet of ['type', 'vehicle', 'system', 'assembly', 'condition', 'originality', 'seller', 'price', 'shipsTo', 'pickup', 'hasPhotos', 'inStock'] as const) {
        const expected = new Map<string, number>();
        for (const r of rows.filter((x) => passesExcept(x, facet))) for (const v of facet === 'price' ? band(r) : (r[facet as Exclude<FacetName, 'price'>] ?? [])) expected.set(v, (expected.get(v) ?? 0) + 1);
        const got = new Map(reply.facets[facet].filter((v) => v.count > 0).map((v) => [v.value, v.count]));
        expect(Object.fromEntries(got), `${facet} for ${JSON.stringify(c)}`).toEqual(Object.fromEntries(expected));
      }
    }
    const labelled = await find({ q: w });
    expect(labelled.facets.vehicle).toEqual([{ value: vehicle.slug, label: vehicle.name, count: labelled.total }]);
    expect(labelled.facets.seller.map((v) => v.label).sort()).toEqual([a.profile.shopName, b.profile.shopName].sort());
    expect(labelled.facets.price.map((v) => v.label)).toEqual(PRICE_BANDS.map((x) => x.label));
  });

  it('when results run over several pages, then the cursor walks them without gaps or repeats, in order', async () => {
    const w = word();
    const { user } = await createSellerProfile();
    const ids = new Set<string>();
    for (let i = 0; i < 23; i++) ids.add((await createListingRow(user.id, { title: `Hose ${w} number ${i}`, priceCents: 1000 + ((i * 7) % 23) * 100 })).id);
    for (const sort of ['price_asc', 'price_desc', 'relevance', 'newest'] as const) {
      const seen: SearchHit[] = [];
      let cursor: string | undefined;
      for (let page = 0; page < 5; page++) {
        const r = await find({ q: w, sort, limit: 10, cursor });
        seen.push(...r.hits);
        if (!r.nextCursor) break;
        cursor = r.nextCursor;
      }
      expect(seen.map((h) => h.id).sort(), sort).toEqual([...ids].sort());
      const prices = seen.map((h) => h.priceCents!);
      if (sort === 'price_asc') expect(prices).toEqual([...prices].sort((x, y) => x - y));
      if (sort === 'price_desc') expect(prices).toEqual([...prices].sort((x, y) => y - x));
    }
    const first = await find({ q: w, limit: 10 });
    const [body, mac] = first.nextCursor!.split('.');
    const flipped = `${body}.${mac[0] === 'A' ? 'B' : 'A'}${mac.slice(1)}`;
    expect((await get({ q: w, limit: 10, cursor: flipped })).status).toBe(400);
    const other = await get({ q: `${w} hose`, limit: 10, cursor: first.nextCursor! });
    expect(other.status).toBe(400);
    expect(other.body.error.details.fieldErrors.cursor[0]).toContain('different search');
  });

  it('when a query matches thousands of rows, then counts come from a sample but a selective filter still gets its exact total and page', async () => {
    const w = word();
    const { user: many } = await createSellerProfile();
    const { user: few } = await createSellerProfile();
    // One statement, one set-based trigger refresh.
    await getDb().execute(sql`
      INSERT INTO listings (seller_id, title, condition, used_grade, quantity, price_cents, state, approved_at)
      SELECT ${many.id}, 'Gasket ' || ${w} || ' ' || i, 'used_original', 'honest', 1, 1000 + i, 'approved', now()
      FROM generate_series(1, 6000) i`);
    const mine = [];
    for (let i = 0; i < 3; i++) mine.push((await createListingRow(few.id, { title: `Gasket ${w} special`, priceCents: 700 + i })).id);
    const broad = await find({ q: w });
    expect(broad.facetsAreEstimates).toBe(true);
    expect(broad.totalIsEstimate).toBe(true);
    expect(broad.total).toBeGreaterThan(4000);
    expect(broad.total).toBeLessThan(9000);
    expect(broad.hits).toHaveLength(24);
    const selective = await find({ q: w, seller: few.id });
    expect(selective.totalIsEstimate).toBe(false);
    expect(selective.total).toBe(3);
    expect(selective.hits.map((h) => h.id).sort()).toEqual([...mine].sort());
    const cheapest = await find({ q: w, sort: 'price_asc', limit: 3 });
    expect(cheapest.hits.map((h) => h.priceCents)).toEqual([700, 701, 702]);
  });

  it('when a listing, its photos, its part or its seller change, then the search rows follow (triggers)', async () => {
    const w = word();
    const w2 = word();
    const part = await createPart({ name: `Strap ${w}` });
    const { user } = await createSellerProfile({ shipsTo: ['US'] });
    const listing = await createListingRow(user.id, { partId: part.id, title: 'Strap, cargo' });
    expect(hitOf(await find({ q: w }), listing.id)).toMatchObject({ thumbnailUrl: null, inStock: true });

    await getDb().insert(listingPhotos).values({ listingId: listing.id, position: 0, thumbKey: 'x/t.webp', mediumKey: 'x/m.webp', largeKey: 'x/l.webp', width: 10, height: 10, placeholderColor: '#000000', dhash: '0000000000000000' });
    expect(hitOf(await find({ q: w, hasPhotos: 'true' }), listing.id)?.thumbnailUrl).toBe('/media/x/t.webp');

    await getDb().update(parts).set({ name: `Strap ${w2}` }).where(eq(parts.id, part.id));
    expect(hitOf(await find({ q: w2 }), listing.id)).toBeDefined();
    expect(hitOf(await find({ q: w }), listing.id)).toBeUndefined();

    await getDb().update(sellerProfiles).set({ shipsTo: ['DE'] }).where(eq(sellerProfiles.userId, user.id));
    expect(hitOf(await find({ q: w2, shipsTo: 'DE' }), listing.id)).toBeDefined();

    await getDb().update(listings).set({ quantity: 0 }).where(eq(listings.id, listing.id));
    const out = await find({ q: w2 });
    expect(hitOf(out, listing.id)?.inStock).toBe(false);
    expect(hitOf(out, part.id)?.inStock).toBe(false);

    await getDb().update(listings).set({ state: 'withdrawn' }).where(eq(listings.id, listing.id));
    expect(hitOf(await find({ q: w2 }), listing.id)).toBeUndefined();
  });
});

describe('search: hostile and wrong input', () => {
  it('when the query holds quotes, tsquery operators or control characters, then the answer is a safe 200', async () => {
    for (const q of [`"brake" 'line'`, 'brake & !line | (x:*)', 'a <-> b <2> c', "'; DROP TABLE parts; --", 'brake\u0000line\u0007', '\\', ':*', '!!!', '%_%', 'ÄÖÜ ñ 刹车', '\u202e\u200bclamp']) {
      const r = await get({ q });
      expect(r.status, q).toBe(200);
      expect(Array.isArray(r.body.hits)).toBe(true);
    }
  });

  it('when the query is 10,000 characters, a parameter is repeated or unknown, or a value is not known, then 400 names the field', async () => {
    const long = await get({ q: 'x'.repeat(10_000) });
    expect(long.status).toBe(400);
    expect(long.body.error.details.fieldErrors.q).toBeDefined();
    const cases: Array<[Record<string, string | string[]>, string]> = [
      [{ q: ['a', 'b'] }, 'q'],
      [{ condition: 'mint' }, 'condition.0'],
      [{ vehicle: 'no-such-truck' }, 'vehicle'],
      [{ vehicle: 'BAD SLUG!' }, 'vehicle.0'],
      [{ seller: 'not-a-uuid' }, 'seller.0'],
      [{ seller: '00000000-0000-4000-8000-000000000000' }, 'seller'],
      [{ priceMin: '500', priceMax: '100' }, 'priceMin'],
      [{ priceMin: '-1' }, 'priceMin'],
      [{ priceMin: '1.5' }, 'priceMin'],
      [{ sort: 'cheapest' }, 'sort'],
      [{ type: 'part', sort: 'price_asc' }, 'sort'],
      [{ cursor: 'abc' }, 'cursor'],
      [{ cursor: 'abc.def' }, 'cursor'],
      [{ limit: '500' }, 'limit'],
      [{ shipsTo: 'USA' }, 'shipsTo.0'],
    ];
    for (const [params, field] of cases) {
      const r = await get(params);
      expect(r.status, JSON.stringify(params)).toBe(400);
      expect(r.body.error.code).toBe('validation_failed');
      expect(Object.keys(r.body.error.details.fieldErrors ?? {}), JSON.stringify(params)).toContain(field);
    }
    const unknown = await get({ colour: 'green' });
    expect(unknown.status).toBe(400);
    const nested = await request(app).get('/api/search?q[$ne]=x');
    expect(nested.status).toBe(400);
  });
});

describe('search: suggestions and the shared code tables', () => {
  it('when a number is being typed, then numbers starting with it come first, then parts by name', async () => {
    const w = word();
    const printed = `SG-${digits(7)}-1`;
    const part = await createPart({ name: `Valve ${w}`, numbers: [{ number: printed }] });
    const r = await request(app).get('/api/search/suggest').query({ q: printed.slice(0, 9).toLowerCase() });
    expect(r.status).toBe(200);
    expect(r.body.suggestions[0]).toEqual({ type: 'number', partId: part.id, number: printed, name: `Valve ${w}`, matchedBy: 'number_prefix' });
    const byName = await request(app).get('/api/search/suggest').query({ q: `valve ${w.slice(0, 6)}` });
    expect(byName.body.suggestions).toContainEqual({ type: 'part', partId: part.id, number: printed, name: `Valve ${w}`, matchedBy: 'name' });
    expect(byName.body.suggestions.length).toBeLessThanOrEqual(10);
    expect((await request(app).get('/api/search/suggest').query({ q: '' })).status).toBe(400);
    expect((await request(app).get('/api/search/suggest').query({ q: 'x'.repeat(300) })).status).toBe(400);
    expect((await request(app).get('/api/search/suggest').query({ q: 'a & b | !c:*' })).status).toBe(200);
  });

  it('when the migration numbered the fixed facet values, then they match the TypeScript tables, originality and price bands included', async () => {
    const refs = (await getDb().execute<{ facet: number; ref: string; code: number }>(sql`SELECT facet, ref, code FROM search_facet_refs WHERE facet IN (1, 5, 6, 8, 10, 11, 12)`)).rows;
    const groups: Record<number, FacetName> = { 1: 'type', 5: 'condition', 6: 'originality', 8: 'price', 10: 'pickup', 11: 'hasPhotos', 12: 'inStock' };
    for (const [g, facet] of Object.entries(groups)) {
      const sqlValues = refs.filter((r) => r.facet === Number(g)).sort((x, y) => x.code - y.code).map((r) => r.ref);
      expect(sqlValues, facet).toEqual([...FIXED_VALUES[facet]!]);
    }
    for (const c of conditionCodes) {
      const [{ o }] = (await getDb().execute<{ o: number }>(sql`SELECT search_originality(${c}) AS o`)).rows;
      expect(FIXED_VALUES.originality![o], c).toBe(originalityOf(c));
    }
    for (const cents of [1, 999, 1000, 4999, 5000, 19999, 20000, 99999, 100000, 5_000_000]) {
      const [{ b }] = (await getDb().execute<{ b: number }>(sql`SELECT search_price_band(${cents}::int) AS b`)).rows;
      expect(FIXED_VALUES.price![b], String(cents)).toBe(priceBandOf(cents));
    }
  });
});

describe('search: shared answers for identical searches', () => {
  it('when the same search comes again within the cache time, then it gets the same answer until the caches are cleared', async () => {
    const { clearReadCaches } = await import('../../server/lib/read-cache');
    const w = word();
    await createPart({ name: `Bracket ${w}` });
    process.env.READ_CACHE = 'on';
    try {
      const first = await find({ q: w });
      expect(first.total).toBe(1);
      await createPart({ name: `Bracket ${w} late` });
      // Shared: the part made since is not in the answer yet.
      expect((await find({ q: w })).total).toBe(1);
      // A different search is its own answer.
      expect((await find({ q: w, type: 'part' })).total).toBe(2);
      clearReadCaches();
      expect((await find({ q: w })).total).toBe(2);
    } finally {
      delete process.env.READ_CACHE;
      clearReadCaches();
    }
  });
});
