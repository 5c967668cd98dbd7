import { and, eq, inArray } from 'drizzle-orm';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { getDb } from '../../server/db/client';
import { auditLog, listingEvents, listingPhotos, listings, parts, shippingProfiles, users } from '../../server/db/schema/index';
import { seedListings } from '../../server/db/seed/listings';
import { createPart } from '../factories/catalog';
import { waitForMail } from '../factories/mail';
import { createListingVia, decideVia, liveListingVia, signedInAdmin, signedInSeller, submitVia } from '../factories/seller';
import { ORIGIN, signedInAs } from '../factories/users';

const app = createApp();
type Agent = Awaited<ReturnType<typeof signedInSeller>>['agent'];

let admin: Agent;
beforeAll(async () => {
  admin = (await signedInAdmin(app)).agent;
});

/** A seller with enough approved listings that the "new seller" flag no longer applies. */
async function establishedSeller() {
  const s = await signedInSeller(app);
  for (let i = 0; i < 3; i++) await liveListingVia(s.agent, admin);
  return s;
}

describe('who may do what', () => {
  it('when a buyer or an anonymous visitor creates a listing, then 403 and 401, and nothing is stored', async () => {
    const { agent: buyer, user } = await signedInAs(app, ['buyer']);
    const part = await createPart();
    const body = { partId: part.id, title: 'Not allowed', condition: 'nos', quantity: 1, priceCents: 100 };
    expect((await buyer.post('/api/listings').set('Origin', ORIGIN).send(body)).status).toBe(403);
    expect((await request(app).post('/api/listings').set('Origin', ORIGIN).send(body)).status).toBe(401);
    expect(await getDb().select().from(listings).where(eq(listings.sellerId, user.id))).toHaveLength(0);
  });

  it("when a seller reads or changes another seller's draft, then it is not found and unchanged", async () => {
    const a = await signedInSeller(app);
    const b = await signedInSeller(app);
    const draft = await createListingVia(a.agent, { title: 'Private draft of A' });
    expect((await b.agent.get(`/api/listings/${draft.id}`)).status).toBe(404);
    expect((await request(app).get(`/api/listings/${draft.id}`)).status).toBe(404);
    expect((await b.agent.patch(`/api/listings/${draft.id}`).set('Origin', ORIGIN).send({ priceCents: 1 })).status).toBe(404);
    expect((await b.agent.post(`/api/listings/${draft.id}/submit`).set('Origin', ORIGIN).send({})).status).toBe(404);
    expect((await b.agent.delete(`/api/listings/${draft.id}`).set('Origin', ORIGIN)).status).toBe(404);
    const own = await a.agent.get(`/api/listings/${draft.id}`);
    expect(own.status).toBe(200);
    expect(own.body.listing).toMatchObject({ title: 'Private draft of A', priceCents: 2500, state: 'draft' });
    expect(own.body.viewer).toMatchObject({ isOwner: true, allowedActions: expect.arrayContaining(['submit']) });
  });

  it("when a seller changes another seller's live listing, then 403; everyone can read it, without its flags", async () => {
    const a = await signedInSeller(app);
    const b = await signedInSeller(app);
    const live = await liveListingVia(a.agent, admin);
    expect((await b.agent.patch(`/api/listings/${live.id}`).set('Origin', ORIGIN).send({ priceCents: 1 })).status).toBe(403);
    expect((await b.agent.post(`/api/listings/${live.id}/withdraw`).set('Origin', ORIGIN).send({})).status).toBe(403);
    const pub = await request(app).get(`/api/listings/${live.id}`);
    expect(pub.status).toBe(200);
    expect(pub.body.listing.priceCents).toBe(2500);
    expect(pub.body.listing.flags).toBeUndefined();
    expect(pub.body.events).toBeUndefined();
    expect(pub.body.viewer).toEqual({ isOwner: false, isAdmin: false, allowedActions: [] });
  });

  it('when a seller or a buyer decides on a listing, then 403; only an administrator decides', async () => {
    const s = await signedInSeller(app);
    const { agent: buyer } = await signedInAs(app, ['buyer']);
    const l = await createListingVia(s.agent);
    await submitVia(s.agent, l.id);
    for (const who of [s.agent, buyer]) {
      expect((await decideVia(who, l.id, 'approve')).status).toBe(403);
      expect((await who.get('/api/admin/listings?state=submitted')).status).toBe(403);
    }
    expect((await request(app).post(`/api/admin/listings/${l.id}/decision`).set('Origin', ORIGIN).send({ decision: 'approve' })).status).toBe(401);
    const [row] = await getDb().select().from(listings).where(eq(listings.id, l.id));
    expect(row.state).toBe('submitted');
    const ok = await decideVia(admin, l.id, 'approve');
    expect(ok.status).toBe(200);
    expect(ok.body.listing.state).toBe('approved');
  });

  it('when the dashboard or shop routes are called by a buyer, then 403', async () => {
    const { agent: buyer } = await signedInAs(app, ['buyer']);
    expect((await buyer.get('/api/me/listings')).status).toBe(403);
    expect((await buyer.get('/api/me/shop')).status).toBe(403);
    expect((await buyer.get('/api/me/shipping-profiles')).status).toBe(403);
  });
});

describe('creating and editing', () => {
  it('when weight and dimensions are left out, then they default from the catalog part', async () => {
    const s = await signedInSeller(app);
    const part = await createPart();
    const l = await createListingVia(s.agent, { partId: part.id });
    expect(l).toMatchObject({ weightGrams: 120, lengthMm: 100, widthMm: 50, heightMm: 20, state: 'draft', partId: part.id });
    expect(l.part).toMatchObject({ id: part.id, primaryNumber: part.number });
    const given = await createListingVia(s.agent, { partId: part.id, weightGrams: 999 });
    expect(given).toMatchObject({ weightGrams: 999, lengthMm: 100 });
  });

  it('when the input is wrong, then 400 names the field', async () => {
    const s = await signedInSeller(app);
    const part = await createPart();
    const post = (body: Record<string, unknown>) => s.agent.post('/api/listings').set('Origin', ORIGIN).send({ partId: part.id, title: 'Bad input', condition: 'nos', quantity: 1, priceCents: 100, ...body });
    const cases: Array<[Record<string, unknown>, string]> = [
      [{ condition: 'used_original' }, 'usedGrade'],
      [{ condition: 'nos', usedGrade: 'honest' }, 'usedGrade'],
      [{ priceCents: 12.5 }, 'priceCents'],
      [{ priceCents: 0 }, 'priceCents'],
      [{ quantity: -1 }, 'quantity'],
      [{ condition: 'mint' }, 'condition'],
      [{ partId: null, description: 'too short' }, 'description'],
      [{ partId: '8f0e2a7c-5b1d-4c3e-9a2b-1c2d3e4f5a6b' }, 'partId'],
    ];
    for (const [body, field] of cases) {
      const r = await post(body);
      expect(r.status, JSON.stringify(body)).toBe(400);
      expect(r.body.error.details.fieldErrors[field], JSON.stringify(r.body)).toBeDefined();
    }
  });

  it("when a listing names another seller's shipping profile, then 400; its own profile is accepted", async () => {
    const a = await signedInSeller(app);
    const b = await signedInSeller(app);
    const rules = { kind: 'flat_per_order', amountCents: 900, shipsTo: ['US'] };
    const pb = await b.agent.post('/api/me/shipping-profiles').set('Origin', ORIGIN).send({ name: 'B flat', rules });
    const pa = await a.agent.post('/api/me/shipping-profiles').set('Origin', ORIGIN).send({ name: 'A flat', rules });
    const part = await createPart();
    const bad = await a.agent.post('/api/listings').set('Origin', ORIGIN).send({ partId: part.id, title: 'Profile test', condition: 'nos', quantity: 1, priceCents: 100, shippingProfileId: pb.body.profile.id });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.fieldErrors.shippingProfileId).toBeDefined();
    const good = await createListingVia(a.agent, { shippingProfileId: pa.body.profile.id });
    expect(good.shippingProfileId).toBe(pa.body.profile.id);
  });

  it('when a markdown description carries HTML, scripts or images, then only basic sanitised HTML is stored', async () => {
    const s = await signedInSeller(app);
    const md = '# Heading\n\n**bold** [site](https://example.test) [bad](javascript:alert(1)) ![pic](http://127.0.0.1/x.png)\n\n<img src=x onerror=alert(1)><script>alert(2)</script>';
    const l = await createListingVia(s.agent, { description: md, descriptionFormat: 'markdown' });
    const html = l.descriptionHtml as string;
    expect(html).toContain('<strong>bold</strong>');
    expect(html).toContain('href="https://example.test"');
    // Raw HTML shows as text; no tag, handler or script link survives.
    expect(html).not.toMatch(/<img|<script|<h1|href="javascript/i);
    expect(html).toContain('&lt;script&gt;');
    expect(l.descriptionFormat).toBe('markdown');
    const plain = await createListingVia(s.agent, { description: 'Line one <b>\nline two' });
    expect(plain.descriptionHtml).toBe('<p>Line one &lt;b&gt;<br />line two</p>');
    expect(plain.descriptionFormat).toBe('plain');
  });

  it('when an approved listing gets a new price or quantity, then it stays live; a new condition sends it back to review', async () => {
    const s = await signedInSeller(app);
    const live = await liveListingVia(s.agent, admin);
    const price = await s.agent.patch(`/api/listings/${live.id}`).set('Origin', ORIGIN).send({ priceCents: 2700, quantity: 5 });
    expect(price.status).toBe(200);
    expect(price.body.listing).toMatchObject({ state: 'approved', priceCents: 2700, quantity: 5 });
    const soldOut = await s.agent.patch(`/api/listings/${live.id}`).set('Origin', ORIGIN).send({ quantity: 0 });
    expect(soldOut.body.listing.state).toBe('sold_out');
    const restock = await s.agent.patch(`/api/listings/${live.id}`).set('Origin', ORIGIN).send({ quantity: 1 });
    expect(restock.body.listing.state).toBe('approved');
    const cond = await s.agent.patch(`/api/listings/${live.id}`).set('Origin', ORIGIN).send({ condition: 'used_original', usedGrade: 'honest' });
    expect(cond.status).toBe(200);
    expect(cond.body.listing.state).toBe('submitted');
    const otherPart = await createPart();
    const live2 = await liveListingVia(s.agent, admin);
    const part = await s.agent.patch(`/api/listings/${live2.id}`).set('Origin', ORIGIN).send({ partId: otherPart.id });
    expect(part.body.listing.state).toBe('submitted');
    const events = await getDb().select().from(listingEvents).where(eq(listingEvents.listingId, live.id));
    expect(events.map((e) => e.action)).toEqual(expect.arrayContaining(['create', 'submit', 'approve', 'edit', 'sell_out', 'restock', 'edit_sent_to_review']));
  });

  it('when a listing is withdrawn and reopened, then it returns to draft; a rejected listing cannot be resubmitted', async () => {
    const s = await signedInSeller(app);
    const live = await liveListingVia(s.agent, admin);
    expect((await s.agent.post(`/api/listings/${live.id}/withdraw`).set('Origin', ORIGIN).send({})).body.listing.state).toBe('withdrawn');
    expect((await request(app).get(`/api/listings/${live.id}`)).status).toBe(404);
    expect((await s.agent.post(`/api/listings/${live.id}/reopen`).set('Origin', ORIGIN).send({})).body.listing.state).toBe('draft');
    await submitVia(s.agent, live.id);
    expect((await decideVia(admin, live.id, 'reject', 'Counterfeit markings')).status).toBe(200);
    const again = await s.agent.post(`/api/listings/${live.id}/submit`).set('Origin', ORIGIN).send({});
    expect(again.status).toBe(409);
    expect((await s.agent.patch(`/api/listings/${live.id}`).set('Origin', ORIGIN).send({ priceCents: 5 })).status).toBe(409);
  });

  it('when a draft is deleted, then it is gone; a submitted listing cannot be deleted', async () => {
    const s = await signedInSeller(app);
    const d = await createListingVia(s.agent);
    expect((await s.agent.delete(`/api/listings/${d.id}`).set('Origin', ORIGIN)).status).toBe(204);
    expect(await getDb().select().from(listings).where(eq(listings.id, d.id))).toHaveLength(0);
    const sub = await createListingVia(s.agent);
    await submitVia(s.agent, sub.id);
    expect((await s.agent.delete(`/api/listings/${sub.id}`).set('Origin', ORIGIN)).status).toBe(409);
  });
});

describe('review decisions', () => {
  it('when an administrator requests changes, then the seller gets the message by e-mail and can resubmit', async () => {
    const s = await signedInSeller(app);
    const l = await createListingVia(s.agent, { title: 'Needs better photos' });
    await submitVia(s.agent, l.id);
    expect((await decideVia(admin, l.id, 'request-changes')).status).toBe(400);
    const r = await decideVia(admin, l.id, 'request-changes', "Show the maker's marks on the casting");
    expect(r.status).toBe(200);
    expect(r.body.listing.state).toBe('changes_requested');
    const mail = await waitForMail(s.user.email, (m) => m.subject.includes('Changes requested'));
    expect(mail.text).toContain("Show the maker's marks on the casting");
    await s.agent.patch(`/api/listings/${l.id}`).set('Origin', ORIGIN).send({ makersMarks: true });
    expect((await submitVia(s.agent, l.id)).state).toBe('submitted');
    const [ev] = await getDb().select().from(listingEvents).where(and(eq(listingEvents.listingId, l.id), eq(listingEvents.action, 'request_changes')));
    expect(ev).toMatchObject({ fromState: 'submitted', toState: 'changes_requested', message: "Show the maker's marks on the casting" });
    const audits = await getDb().select().from(auditLog).where(and(eq(auditLog.entityType, 'listing'), eq(auditLog.entityId, l.id)));
    expect(audits.map((a) => a.action)).toEqual(expect.arrayContaining(['listing.create', 'listing.submit', 'listing.request_changes']));
  });

  it('when an administrator approves or rejects, then the seller is told by e-mail, with the reason for a rejection', async () => {
    const s = await signedInSeller(app);
    const a = await createListingVia(s.agent, { title: 'Goes live' });
    await submitVia(s.agent, a.id);
    await decideVia(admin, a.id, 'approve');
    expect((await waitForMail(s.user.email, (m) => m.subject.includes('live'))).text).toContain('Goes live');
    const b = await createListingVia(s.agent, { title: 'Refused one' });
    await submitVia(s.agent, b.id);
    expect((await decideVia(admin, b.id, 'reject')).status).toBe(400);
    expect((await decideVia(admin, b.id, 'reject', 'Reproduction offered as NOS')).status).toBe(200);
    expect((await waitForMail(s.user.email, (m) => m.subject.includes('not approved'))).text).toContain('Reproduction offered as NOS');
  });

  it('when a decision does not fit the state, then 409', async () => {
    const s = await signedInSeller(app);
    const d = await createListingVia(s.agent);
    expect((await decideVia(admin, d.id, 'approve')).status).toBe(409);
  });
});

describe('automatic flags and the queue', () => {
  it('when old hydraulic brake rubber is offered as serviceable, then a blocking flag shows and approval is refused', async () => {
    const s = await establishedSeller();
    const hose = await createPart({ category: 'brake_hose', safetyClass: 'brake' });
    const l = await createListingVia(s.agent, { partId: hose.id, condition: 'nos', rubberUse: 'serviceable' });
    await submitVia(s.agent, l.id);
    const q = await admin.get('/api/admin/listings').query({ state: 'submitted', flag: 'rubber_brake_serviceable', sellerId: s.user.id });
    expect(q.status).toBe(200);
    const item = q.body.listings.find((x: { id: string }) => x.id === l.id);
    expect(item.flags).toContainEqual(expect.objectContaining({ code: 'rubber_brake_serviceable', severity: 'block' }));
    expect(item.seller).toMatchObject({ id: s.user.id });
    const refused = await decideVia(admin, l.id, 'approve');
    expect(refused.status).toBe(409);
    // Display only is the one way old rubber may be listed.
    await decideVia(admin, l.id, 'request-changes', 'List it as display / authenticity only');
    await s.agent.patch(`/api/listings/${l.id}`).set('Origin', ORIGIN).send({ rubberUse: 'display_only' });
    await submitVia(s.agent, l.id);
    const ok = await decideVia(admin, l.id, 'approve');
    expect(ok.status).toBe(200);
    const page = await request(app).get(`/api/listings/${l.id}`);
    expect(page.body.cautions.map((c: { code: string }) => c.code)).toEqual(expect.arrayContaining(['display_only', 'brake_safety', 'rubber_ages']));
  });

  it('when the part is a restricted category or the price is far off five others, then review flags show', async () => {
    const s = await establishedSeller();
    const mount = await createPart({ category: 'weapon_mount' });
    const m = await createListingVia(s.agent, { partId: mount.id });
    await submitVia(s.agent, m.id);
    const part = await createPart();
    const other = await signedInSeller(app);
    for (const price of [2000, 4000, 5000, 6000, 9000]) await liveListingVia(other.agent, admin, { partId: part.id, priceCents: price });
    const high = await createListingVia(s.agent, { partId: part.id, priceCents: 13_500 });
    await submitVia(s.agent, high.id);
    const fair = await createListingVia(s.agent, { partId: part.id, priceCents: 5200 });
    await submitVia(s.agent, fair.id);
    const q = await admin.get('/api/admin/listings').query({ sellerId: s.user.id });
    const flags = (id: string) => q.body.listings.find((x: { id: string }) => x.id === id).flags.map((f: { code: string }) => f.code);
    expect(flags(m.id)).toContain('restricted_category');
    expect(flags(high.id)).toContain('price_outlier');
    expect(flags(fair.id)).toEqual([]);
    const none = await admin.get('/api/admin/listings').query({ sellerId: s.user.id, flag: 'none' });
    expect(none.body.listings.map((x: { id: string }) => x.id)).toEqual([fair.id]);
  });

  it("when a new seller submits, then the first listings carry the new-seller flag", async () => {
    const s = await signedInSeller(app);
    const l = await createListingVia(s.agent);
    const sub = await submitVia(s.agent, l.id);
    expect(sub.flags.map((f: { code: string }) => f.code)).toContain('new_seller');
  });

  it('when many listings are approved at once, then only the unflagged ones go live', async () => {
    const s = await establishedSeller();
    const clean = await createListingVia(s.agent);
    await submitVia(s.agent, clean.id);
    const restricted = await createListingVia(s.agent, { partId: (await createPart({ category: 'weapon_mount' })).id });
    await submitVia(s.agent, restricted.id);
    const draft = await createListingVia(s.agent);
    const r = await admin.post('/api/admin/listings/approve').set('Origin', ORIGIN).send({ ids: [clean.id, restricted.id, draft.id] });
    expect(r.status).toBe(200);
    expect(r.body.approved).toEqual([clean.id]);
    expect(r.body.skipped).toEqual(
      expect.arrayContaining([
        { id: restricted.id, reason: 'flagged' },
        { id: draft.id, reason: 'not_submitted' },
      ]),
    );
  });

  it('when the queue is filtered by age, then only listings waiting that long are listed', async () => {
    const s = await establishedSeller();
    const l = await createListingVia(s.agent);
    await submitVia(s.agent, l.id);
    await getDb().update(listings).set({ submittedAt: new Date(Date.now() - 50 * 3_600_000) }).where(eq(listings.id, l.id));
    const fresh = await createListingVia(s.agent);
    await submitVia(s.agent, fresh.id);
    const old = await admin.get('/api/admin/listings').query({ sellerId: s.user.id, minAgeHours: 48 });
    expect(old.body.listings.map((x: { id: string }) => x.id)).toEqual([l.id]);
    expect(old.body.listings[0].waitingHours).toBeGreaterThanOrEqual(49);
    const young = await admin.get('/api/admin/listings').query({ sellerId: s.user.id, maxAgeHours: 1 });
    expect(young.body.listings.map((x: { id: string }) => x.id)).toEqual([fresh.id]);
  });
});

describe('unidentified parts', () => {
  it('when a seller lists a part described in words, then an administrator links it to the catalog', async () => {
    const s = await signedInSeller(app);
    const l = await createListingVia(s.agent, { partId: null, description: 'Brass tag, 60 x 30 mm, stamped K7, found with brake parts' });
    expect(l).toMatchObject({ partId: null, part: null, weightGrams: 0 });
    await submitVia(s.agent, l.id);
    const part = await createPart({ name: 'Tag, brass, fictional' });
    const r = await admin.post(`/api/admin/listings/${l.id}/part`).set('Origin', ORIGIN).send({ partId: part.id });
    expect(r.status).toBe(200);
    expect(r.body.listing).toMatchObject({ partId: part.id, weightGrams: 120, state: 'submitted' });
    expect((await s.agent.post(`/api/admin/listings/${l.id}/part`).set('Origin', ORIGIN).send({ partId: part.id })).status).toBe(403);
  });
});

describe('seller dashboard and public page', () => {
  it('when the seller opens the dashboard, then their listings come filtered and sorted with counts by state', async () => {
    const s = await signedInSeller(app);
    const a = await createListingVia(s.agent, { priceCents: 300, title: 'Cheap one' });
    const b = await createListingVia(s.agent, { priceCents: 900, title: 'Dear one' });
    await submitVia(s.agent, b.id);
    const other = await signedInSeller(app);
    await createListingVia(other.agent);
    const all = await s.agent.get('/api/me/listings').query({ sort: '-price' });
    expect(all.status).toBe(200);
    expect(all.body.listings.map((x: { id: string }) => x.id)).toEqual([b.id, a.id]);
    expect(all.body.counts).toMatchObject({ draft: 1, submitted: 1, approved: 0 });
    expect(all.body.total).toBe(2);
    const drafts = await s.agent.get('/api/me/listings').query({ state: 'draft' });
    expect(drafts.body.listings.map((x: { id: string }) => x.id)).toEqual([a.id]);
    const quick = await s.agent.patch(`/api/listings/${a.id}`).set('Origin', ORIGIN).send({ quantity: 7, priceCents: 350 });
    expect(quick.body.listing).toMatchObject({ quantity: 7, priceCents: 350 });
    expect((await s.agent.get('/api/me/listings').query({ state: 'nonsense' })).status).toBe(400);
  });

  it('when anyone opens a live listing, then the page has the condition explained, the seller card, the part chain and cautions', async () => {
    const s = await signedInSeller(app);
    await s.agent.put('/api/me/shop').set('Origin', ORIGIN).send({ shopName: 'Test Yard (fictional)', location: 'Nowhere Flats', shipsTo: ['US', 'CA'], pickupAtShows: true, returnPolicy: '14 days' });
    const part = await createPart({ category: 'wheel_cylinder', safetyClass: 'brake' });
    const live = await liveListingVia(s.agent, admin, { partId: part.id, condition: 'used_original', usedGrade: 'honest', rubberUse: 'display_only' });
    const r = await request(app).get(`/api/listings/${live.id}`);
    expect(r.status).toBe(200);
    expect(r.body.condition).toMatchObject({ code: 'used_original', grade: { code: 'honest', rank: 2 }, rubberUse: { code: 'display_only' } });
    expect(r.body.condition.explanation.length).toBeGreaterThan(40);
    expect(r.body.seller).toMatchObject({ id: s.user.id, shopName: 'Test Yard (fictional)', shipsTo: ['US', 'CA'], pickupAtShows: true, liveListings: 1 });
    expect(r.body.part.part).toMatchObject({ id: part.id, safetyClass: 'brake' });
    expect(r.body.part.chain).toBeDefined();
    expect(r.body.cautions.map((c: { code: string }) => c.code)).toEqual(expect.arrayContaining(['brake_safety', 'display_only']));
    const forPart = await request(app).get('/api/listings').query({ partId: part.id });
    expect(forPart.body.listings.map((x: { id: string }) => x.id)).toEqual([live.id]);
    const partPage = await request(app).get(`/api/parts/${part.id}`);
    expect(partPage.body.liveListings).toBe(1);
  });
});

describe('shop and shipping profiles', () => {
  it('when a seller saves the shop and shipping profiles, then they read back and bad rules are refused', async () => {
    const s = await signedInSeller(app);
    expect((await s.agent.get('/api/me/shop')).body.shop).toBeNull();
    const shop = await s.agent.put('/api/me/shop').set('Origin', ORIGIN).send({ shopName: 'Quiet Lane Spares', shipsTo: ['us', 'ca'] });
    expect(shop.status).toBe(200);
    expect(shop.body.shop).toMatchObject({ shopName: 'Quiet Lane Spares', shipsTo: ['US', 'CA'] });
    const bands = { kind: 'weight_bands', bands: [{ upToGrams: 500, amountCents: 800 }, { upToGrams: 2000, amountCents: 1500 }], shipsTo: ['US', 'CA'] };
    const p1 = await s.agent.post('/api/me/shipping-profiles').set('Origin', ORIGIN).send({ name: 'By weight', rules: bands });
    expect(p1.status).toBe(201);
    expect(p1.body.profile).toMatchObject({ name: 'By weight', isDefault: true, rules: { kind: 'weight_bands', pickupAvailable: false } });
    const bad = await s.agent.post('/api/me/shipping-profiles').set('Origin', ORIGIN).send({ name: 'Broken', rules: { kind: 'weight_bands', bands: [{ upToGrams: 900, amountCents: 1 }, { upToGrams: 100, amountCents: 2 }], shipsTo: ['US'] } });
    expect(bad.status).toBe(400);
    const p2 = await s.agent.post('/api/me/shipping-profiles').set('Origin', ORIGIN).send({ name: 'Flat', rules: { kind: 'flat_per_order', amountCents: 1500, freeAboveCents: 15000, shipsTo: ['US'], pickupAvailable: true }, isDefault: true });
    const list = await s.agent.get('/api/me/shipping-profiles');
    expect(list.body.profiles.map((p: { name: string; isDefault: boolean }) => [p.name, p.isDefault])).toEqual([
      ['By weight', false],
      ['Flat', true],
    ]);
    const other = await signedInSeller(app);
    expect((await other.agent.patch(`/api/me/shipping-profiles/${p2.body.profile.id}`).set('Origin', ORIGIN).send({ name: 'Mine now' })).status).toBe(404);
    expect((await s.agent.patch(`/api/me/shipping-profiles/${p2.body.profile.id}`).set('Origin', ORIGIN).send({ name: 'Flat rate' })).body.profile.name).toBe('Flat rate');
    expect((await s.agent.delete(`/api/me/shipping-profiles/${p2.body.profile.id}`).set('Origin', ORIGIN)).status).toBe(204);
    expect((await s.agent.get('/api/me/shipping-profiles')).body.profiles).toEqual([expect.objectContaining({ name: 'By weight', isDefault: true })]);
  });
});

describe('demo listings seed', () => {
  it('when the seed runs twice, then the demo sellers have listings on the master cylinder parts and nothing doubles', async () => {
    const db = getDb();
    const first = await seedListings(db);
    const second = await seedListings(db);
    expect(second.listings).toBe(0);
    const sellers = await db.select().from(users).where(inArray(users.email, ['seller@drabyard.test', 'seller2@drabyard.test']));
    const seller = sellers.find((u) => u.email === 'seller@drabyard.test')!;
    const rows = await db
      .select({ l: listings, key: parts.seedKey })
      .from(listings)
      .leftJoin(parts, eq(parts.id, listings.partId))
      .where(inArray(listings.sellerId, sellers.map((u) => u.id)));
    expect(first.missingParts).toBe(0);
    expect(rows.length).toBeGreaterThanOrEqual(55);
    expect(rows.filter((r) => r.key?.startsWith('kv4.brakes.m')).length).toBeGreaterThanOrEqual(10);
    // master-late replaces master-early in the demo catalog.
    expect(rows.filter((r) => r.key === 'kv4.brakes.master-late').length).toBeGreaterThanOrEqual(5);
    expect(new Set(rows.map((r) => r.l.condition))).toEqual(new Set(['nos', 'nors', 'used_original', 'rebuilt', 'reproduction', 'core']));
    expect(rows.some((r) => r.l.partId === null)).toBe(true);
    const photos = await db.select().from(listingPhotos).where(inArray(listingPhotos.listingId, rows.map((r) => r.l.id)));
    expect(photos.length).toBeGreaterThanOrEqual(5);
    const shipping = await db.select().from(shippingProfiles).where(inArray(shippingProfiles.sellerId, sellers.map((u) => u.id)));
    expect(shipping.map((p) => (p.rules as { kind: string }).kind).sort()).toEqual(['flat_per_order', 'weight_bands']);
    const waiting = await admin.get('/api/admin/listings').query({ sellerId: seller.id });
    const codes = waiting.body.listings.flatMap((x: { flags: Array<{ code: string }> }) => x.flags.map((f) => f.code));
    expect(codes).toEqual(expect.arrayContaining(['rubber_brake_serviceable', 'price_outlier', 'restricted_category']));
  });
});
