import { and, eq } from 'drizzle-orm';
import Papa from 'papaparse';
import sharp from 'sharp';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { getDb } from '../../server/db/client';
import { cartItems, carts } from '../../server/db/schema/index';
import { addLine, createPart, createVehicleWithAssembly, supersede } from '../factories/catalog';
import { createLiveListing, createSellerWithShipping } from '../factories/garage';
import { ORIGIN, signedInAs } from '../factories/users';

const app = createApp();
type Agent = Awaited<ReturnType<typeof signedInAs>>['agent'];

async function addVehicle(agent: Agent, slug: string, extra: Record<string, unknown> = {}) {
  const r = await agent
    .post('/api/garage/vehicles')
    .set('Origin', ORIGIN)
    .send({ vehicleSlug: slug, serial: 'TT-05000', buildDate: '1952-06', originalityTarget: 'as_built', nickname: 'Old Faithful', ...extra });
  expect(r.status).toBe(201);
  return r.body.vehicle as { id: string; serialNumber: number };
}

describe('garage vehicles', () => {
  it('when a restorer adds, edits and removes a vehicle, then only they can see it and others get 404', async () => {
    const { vehicle: model } = await createVehicleWithAssembly();
    const { agent } = await signedInAs(app);
    const v = await addVehicle(agent, model.slug);
    expect(v.serialNumber).toBe(5000);
    const list = await agent.get('/api/garage/vehicles');
    expect(list.body.vehicles).toHaveLength(1);
    expect(list.body.vehicles[0]).toMatchObject({ id: v.id, nickname: 'Old Faithful', originalityTarget: 'as_built', model: { slug: model.slug } });

    const patched = await agent.patch(`/api/garage/vehicles/${v.id}`).set('Origin', ORIGIN).send({ originalityTarget: 'usable_driver', serial: 'TT-06210' });
    expect(patched.status).toBe(200);
    expect(patched.body.vehicle).toMatchObject({ originalityTarget: 'usable_driver', serial: 'TT-06210', serialNumber: 6210 });

    const other = await signedInAs(app);
    expect((await other.agent.get(`/api/garage/vehicles/${v.id}`)).status).toBe(404);
    expect((await other.agent.patch(`/api/garage/vehicles/${v.id}`).set('Origin', ORIGIN).send({ nickname: 'mine now' })).status).toBe(404);
    expect((await other.agent.delete(`/api/garage/vehicles/${v.id}`).set('Origin', ORIGIN)).status).toBe(404);
    expect((await other.agent.get(`/api/garage/vehicles/${v.id}/needs`)).status).toBe(404);
    expect((await request(app).get('/api/garage/vehicles')).status).toBe(401);

    expect((await agent.delete(`/api/garage/vehicles/${v.id}`).set('Origin', ORIGIN)).status).toBe(204);
    expect((await agent.get(`/api/garage/vehicles/${v.id}`)).status).toBe(404);
  });

  it('when the serial has no digits or lies outside the model range, then a 400 names the field', async () => {
    const { vehicle: model } = await createVehicleWithAssembly();
    const { agent } = await signedInAs(app);
    const none = await agent.post('/api/garage/vehicles').set('Origin', ORIGIN).send({ vehicleSlug: model.slug, serial: 'ABC', originalityTarget: 'as_built' });
    expect(none.status).toBe(400);
    expect(none.body.error.details.fieldErrors.serial).toBeDefined();
    const outside = await agent.post('/api/garage/vehicles').set('Origin', ORIGIN).send({ vehicleSlug: model.slug, serial: 'TT-99999', originalityTarget: 'as_built' });
    expect(outside.status).toBe(400);
    expect(outside.body.error.message).toMatch(/serials run from/);
    const badTarget = await agent.post('/api/garage/vehicles').set('Origin', ORIGIN).send({ vehicleSlug: model.slug, serial: '12', originalityTarget: 'shiny' });
    expect(badTarget.status).toBe(400);
  });
});

describe('teardown checklist, log and photos', () => {
  it('when lines are marked, then the checklist applies applicability, counts progress and logs each status change', async () => {
    const { vehicle: model, assembly } = await createVehicleWithAssembly();
    const early = await createPart({ name: 'Early boot' });
    const cup = await createPart({ name: 'Piston cup' });
    const spring = await createPart({ name: 'Return spring' });
    const earlyLine = await addLine(assembly.id, early.id, { callout: '1', serialTo: 99 });
    const cupLine = await addLine(assembly.id, cup.id, { callout: '2', quantity: 2, sortOrder: 1 });
    const springLine = await addLine(assembly.id, spring.id, { callout: '3', sortOrder: 2 });
    const { agent } = await signedInAs(app);
    const v = await addVehicle(agent, model.slug);

    const list = await agent.get(`/api/garage/vehicles/${v.id}/assemblies/${assembly.id}`);
    expect(list.status).toBe(200);
    expect(list.body.lines.map((l: { id: string }) => l.id)).toEqual([cupLine.id, springLine.id]);
    expect(list.body.excluded[0].line.id).toBe(earlyLine.id);
    expect(list.body.lines[0].teardown).toMatchObject({ status: 'not_inspected', usableOnHand: 0, photos: [] });

    const put = await agent.put(`/api/garage/vehicles/${v.id}/teardown/${cupLine.id}`).set('Origin', ORIGIN).send({ status: 'replace', usableOnHand: 1, note: 'one cup swollen', policy: 'nos_only' });
    expect(put.status).toBe(200);
    expect(put.body).toMatchObject({ needed: 1, teardown: { status: 'replace', usableOnHand: 1, note: 'one cup swollen', policy: 'nos_only' } });
    expect((await agent.put(`/api/garage/vehicles/${v.id}/teardown/${springLine.id}`).set('Origin', ORIGIN).send({ status: 'reuse' })).status).toBe(200);

    const tooMany = await agent.put(`/api/garage/vehicles/${v.id}/teardown/${cupLine.id}`).set('Origin', ORIGIN).send({ usableOnHand: 3 });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.details.fieldErrors.usableOnHand).toBeDefined();
    const excluded = await agent.put(`/api/garage/vehicles/${v.id}/teardown/${earlyLine.id}`).set('Origin', ORIGIN).send({ status: 'missing' });
    expect(excluded.status).toBe(409);
    const foreign = await createVehicleWithAssembly();
    const foreignLine = await addLine(foreign.assembly.id, cup.id);
    expect((await agent.put(`/api/garage/vehicles/${v.id}/teardown/${foreignLine.id}`).set('Origin', ORIGIN).send({ status: 'missing' })).status).toBe(404);
    expect((await agent.get(`/api/garage/vehicles/${v.id}/assemblies/${foreign.assembly.id}`)).status).toBe(404);

    const detail = await agent.get(`/api/garage/vehicles/${v.id}`);
    expect(detail.body.progress).toMatchObject({ lines: 2, inspected: 2, percent: 100 });
    const asm = detail.body.systems.flatMap((s: { assemblies: unknown[] }) => s.assemblies).find((a: { id: string }) => a.id === assembly.id);
    expect(asm.progress.byStatus).toMatchObject({ replace: 1, reuse: 1, not_inspected: 0 });

    await agent.post(`/api/garage/vehicles/${v.id}/log`).set('Origin', ORIGIN).send({ text: 'Bore shows light pitting', bomLineId: cupLine.id }).expect(201);
    const log = await agent.get(`/api/garage/vehicles/${v.id}/log`);
    expect(log.body.entries.map((e: { text: string }) => e.text)).toEqual(['Bore shows light pitting', expect.stringMatching(/^Callout 3 .*reuse as is/), expect.stringMatching(/^Callout 2 .*replace — one cup swollen/)]);
    expect(log.body.entries[0]).toMatchObject({ bomLineId: cupLine.id, at: expect.any(String) });
  });

  it('when photos are uploaded for a line, then they are stored and shown on the checklist; a non-image is refused', async () => {
    const { vehicle: model, assembly } = await createVehicleWithAssembly();
    const part = await createPart();
    const line = await addLine(assembly.id, part.id);
    const { agent } = await signedInAs(app);
    const v = await addVehicle(agent, model.slug);
    const png = await sharp({ create: { width: 80, height: 60, channels: 3, background: { r: 120, g: 90, b: 40 } } }).png().toBuffer();
    const up = await agent.post(`/api/garage/vehicles/${v.id}/teardown/${line.id}/photos`).set('Origin', ORIGIN).attach('photos', png, 'cup.png');
    expect(up.status).toBe(201);
    expect(up.body.photos).toHaveLength(1);
    const thumb = await request(app).get(up.body.photos[0].urls.thumb);
    expect(thumb.status).toBe(200);
    const list = await agent.get(`/api/garage/vehicles/${v.id}/assemblies/${assembly.id}`);
    expect(list.body.lines[0].teardown.photos).toHaveLength(1);
    const bad = await agent.post(`/api/garage/vehicles/${v.id}/teardown/${line.id}/photos`).set('Origin', ORIGIN).attach('photos', Buffer.from('not an image at all'), 'x.png');
    expect(bad.status).toBe(415);
  });
});

describe('needs list, sourcing plan and cart', () => {
  async function scenario() {
    const { vehicle: model, assembly } = await createVehicleWithAssembly();
    const aOld = await createPart({ name: 'Wheel cylinder (early number)' });
    const aNew = await createPart({ name: 'Wheel cylinder (current number)' });
    await supersede(aOld, aNew, 'one_way');
    const b = await createPart({ name: 'Bleeder screw' });
    const c = await createPart({ name: 'Dust boot' });
    const d = await createPart({ name: 'Brake shoe' });
    const e = await createPart({ name: 'Anchor pin' });
    const lines = {
      a: await addLine(assembly.id, aOld.id, { callout: '1', quantity: 2 }),
      b: await addLine(assembly.id, b.id, { callout: '2', sortOrder: 1 }),
      d: await addLine(assembly.id, d.id, { callout: '3', quantity: 4, sortOrder: 2 }),
      e: await addLine(assembly.id, e.id, { callout: '4', sortOrder: 3 }),
      f: await addLine(assembly.id, (await createPart()).id, { callout: '5', sortOrder: 4 }),
    };
    const s1 = await createSellerWithShipping({ shopName: 'Fictional Depot One', rules: { kind: 'flat_per_order', amountCents: 1000, shipsTo: ['US'] } });
    const s2 = await createSellerWithShipping({ shopName: 'Fictional Depot Two', rules: { kind: 'flat_per_order', amountCents: 500, shipsTo: ['US', 'CA'] } });
    const listings = {
      aNew: await createLiveListing(s1.user, aNew.id, { condition: 'nos', priceCents: 3000, quantity: 5 }),
      aRepro: await createLiveListing(s2.user, aOld.id, { condition: 'reproduction', priceCents: 100, quantity: 9 }),
      bRepro: await createLiveListing(s1.user, b.id, { condition: 'reproduction', priceCents: 1500 }),
      bNos: await createLiveListing(s2.user, b.id, { condition: 'nos', priceCents: 2000 }),
      c: await createLiveListing(s2.user, c.id, { condition: 'used_original', priceCents: 800 }),
    };
    const { user, agent } = await signedInAs(app);
    const v = await addVehicle(agent, model.slug);
    const put = (lineId: string, body: object) => agent.put(`/api/garage/vehicles/${v.id}/teardown/${lineId}`).set('Origin', ORIGIN).send(body).expect(200);
    await put(lines.a.id, { status: 'replace', usableOnHand: 0, policy: 'originals_only' });
    await put(lines.b.id, { status: 'missing' });
    await put(lines.d.id, { status: 'wrong_part', usableOnHand: 1 });
    await put(lines.e.id, { status: 'refurbish' });
    const want = await agent.post(`/api/garage/vehicles/${v.id}/wants`).set('Origin', ORIGIN).send({ partId: c.id, quantity: 1, note: 'spare for the shelf' });
    expect(want.status).toBe(201);
    return { user, agent, v, parts: { aOld, aNew, b, c, d }, listings, sellers: { s1, s2 }, wantId: want.body.want.id as string };
  }

  it('when lines are marked replace, missing or wrong and wants are added, then the needs list sums them and exports CSV', async () => {
    const { agent, v, parts, wantId } = await scenario();
    const r = await agent.get(`/api/garage/vehicles/${v.id}/needs`);
    expect(r.status).toBe(200);
    const byPart = Object.fromEntries(r.body.needs.map((n: { part: { id: string }; quantity: number; policy: string }) => [n.part.id, n]));
    expect(byPart[parts.aOld.id]).toMatchObject({ quantity: 2, policy: 'originals_only' });
    expect(byPart[parts.b.id]).toMatchObject({ quantity: 1, policy: 'any' });
    expect(byPart[parts.d.id]).toMatchObject({ quantity: 3 });
    expect(byPart[parts.c.id]).toMatchObject({ quantity: 1, sources: [{ kind: 'manual', wantId, quantity: 1, note: 'spare for the shelf' }] });
    expect(r.body.needs).toHaveLength(4);
    expect(r.body.notInspectedLines).toBe(1);
    expect(r.body.totalUnits).toBe(7);

    const csv = await agent.get(`/api/garage/vehicles/${v.id}/needs?format=csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const rows = Papa.parse<Record<string, string>>(csv.text, { header: true, skipEmptyLines: true }).data;
    expect(rows).toHaveLength(4);
    expect(rows.find((x) => x.part_number === parts.d.number)).toMatchObject({ quantity: '3', condition: 'any', part_name: 'Brake shoe' });

    expect((await agent.delete(`/api/garage/vehicles/${v.id}/wants/${wantId}`).set('Origin', ORIGIN)).status).toBe(204);
    expect((await agent.get(`/api/garage/vehicles/${v.id}/needs`)).body.needs).toHaveLength(3);
  });

  it('when a plan is made, then it buys at the lowest landed cost honouring policy and supersession, lists what cannot be filled, and one click fills the cart', async () => {
    const { user, agent, v, parts, listings, sellers } = await scenario();
    const r = await agent.post(`/api/garage/vehicles/${v.id}/plan`).set('Origin', ORIGIN).send({ destination: { country: 'US' } });
    expect(r.status).toBe(200);
    expect(r.body.method).toBe('exact');
    expect(r.body.optimal).toBe(true);
    expect(r.body.gapPercent).toBe(0);
    // Items 2 x 30.00 (current number, NOS; the cheap reproduction breaks the originals-only policy)
    // + bleeder 15.00 from the seller already shipping + boot 8.00; shipping 10.00 + 5.00.
    expect(r.body.plan).toMatchObject({ itemsCents: 8300, shippingCents: 1500, totalCents: 9800 });
    expect(r.body.lowerBoundCents).toBe(9800);
    const one = r.body.plan.sellers.find((s: { seller: { id: string } }) => s.seller.id === sellers.s1.user.id);
    expect(one.seller.name).toBe('Fictional Depot One');
    expect(one.items).toContainEqual(expect.objectContaining({ listingId: listings.aNew.id, quantity: 2, forPart: expect.objectContaining({ id: parts.aOld.id }), substitute: expect.objectContaining({ interchange: 'one_way' }) }));
    expect(one.items).toContainEqual(expect.objectContaining({ listingId: listings.bRepro.id, quantity: 1 }));
    expect(r.body.unfilled).toEqual([expect.objectContaining({ part: expect.objectContaining({ id: parts.d.id }), missing: 3, reason: 'no_listing' })]);

    const canada = await agent.post(`/api/garage/vehicles/${v.id}/plan`).set('Origin', ORIGIN).send({ destination: { country: 'CA' } });
    expect(canada.body.unfilled).toContainEqual(expect.objectContaining({ part: expect.objectContaining({ id: parts.aOld.id }), reason: 'does_not_ship' }));
    expect((await agent.post(`/api/garage/vehicles/${v.id}/plan`).set('Origin', ORIGIN).send({ destination: { country: 'USA' } })).status).toBe(400);

    const cart = await agent.post(`/api/garage/vehicles/${v.id}/plan/to-cart`).set('Origin', ORIGIN).send({ destination: { country: 'US' } });
    expect(cart.status).toBe(200);
    expect(cart.body.added).toHaveLength(3);
    const again = await agent.post(`/api/garage/vehicles/${v.id}/plan/to-cart`).set('Origin', ORIGIN).send({ destination: { country: 'US' } });
    expect(again.body.added).toEqual([]);
    const [c] = await getDb().select().from(carts).where(eq(carts.userId, user.id));
    const items = await getDb().select().from(cartItems).where(eq(cartItems.cartId, c.id));
    expect(Object.fromEntries(items.map((i) => [i.listingId, i.quantity]))).toEqual({ [listings.aNew.id]: 2, [listings.bRepro.id]: 1, [listings.c.id]: 1 });
    const [price] = await getDb().select().from(cartItems).where(and(eq(cartItems.cartId, c.id), eq(cartItems.listingId, listings.aNew.id)));
    expect(price.priceCentsAtAdd).toBe(3000);
  });
});
