import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { getDb } from '../../server/db/client';
import { alertHits, notices } from '../../server/db/schema/index';
import { getBoss, QUEUES } from '../../server/jobs/boss';
import { startJobs, stopJobs } from '../../server/jobs/queue';
import { mailHit, matchListing, onListingLive } from '../../server/services/wanted-alerts';
import { createPart, supersede } from '../factories/catalog';
import { createLiveListing, createSellerWithShipping } from '../factories/garage';
import { waitForMail, type FakeMail } from '../factories/mail';
import { ORIGIN, signedInAs } from '../factories/users';

const app = createApp();

beforeAll(async () => {
  await startJobs({ pollingIntervalSeconds: 0.5 });
});
afterAll(async () => {
  await stopJobs();
});

async function mailsTo(email: string): Promise<FakeMail[]> {
  const r = await fetch(`${process.env.MAIL_FAKE_URL}/api/messages?to=${encodeURIComponent(email.toLowerCase())}`);
  return ((await r.json()) as { messages: FakeMail[] }).messages;
}

async function hitsOf(alertId: string) {
  return getDb().select().from(alertHits).where(eq(alertHits.alertId, alertId));
}

/** Old part replaced one-way by a new one: the new fills the old's need, never the reverse. */
async function oneWayPair() {
  const old = await createPart({ name: 'Fuel pump (early)' });
  const neu = await createPart({ name: 'Fuel pump (current)' });
  await supersede(old, neu, 'one_way');
  return { old, neu };
}

async function watch(agent: Awaited<ReturnType<typeof signedInAs>>['agent'], body: object) {
  const r = await agent.post('/api/alerts').set('Origin', ORIGIN).send(body);
  expect(r.status).toBe(201);
  return r.body.alert as { id: string; number: string };
}

describe('wanted alerts: matching (handler called directly)', () => {
  it('when a listing of the replacing part goes live, then the alert on the old number is hit exactly once, with one notice', async () => {
    const { old, neu } = await oneWayPair();
    const { user, agent } = await signedInAs(app);
    const alert = await watch(agent, { number: old.number.toLowerCase(), policy: 'any', maxPriceCents: 5000 });
    const seller = await createSellerWithShipping();
    const listing = await createLiveListing(seller.user, neu.id, { condition: 'nos', priceCents: 4500 });

    expect(await matchListing(listing.id)).toEqual([alert.id]);
    expect(await matchListing(listing.id)).toEqual([]);
    expect(await hitsOf(alert.id)).toHaveLength(1);
    const mine = await getDb().select().from(notices).where(eq(notices.userId, user.id));
    expect(mine).toHaveLength(1);
    expect(mine[0]).toMatchObject({ kind: 'wanted_alert', link: `/listings/${listing.id}` });
    expect(mine[0].title).toContain(alert.number);

    const list = await agent.get('/api/alerts');
    expect(list.body.alerts).toEqual([expect.objectContaining({ id: alert.id, hits: 1, policy: 'any', maxPriceCents: 5000, part: expect.objectContaining({ id: old.id }) })]);
  });

  it('when a listing of the old part goes live, then an alert on the part that replaced it one-way never fires', async () => {
    const { old, neu } = await oneWayPair();
    const { agent } = await signedInAs(app);
    const alert = await watch(agent, { partId: neu.id });
    const seller = await createSellerWithShipping();
    const listing = await createLiveListing(seller.user, old.id, { condition: 'nos', priceCents: 100 });
    expect(await matchListing(listing.id)).toEqual([]);
    expect(await hitsOf(alert.id)).toHaveLength(0);
  });

  it('when the condition policy or the top price is not met, or the seller watches their own part, then nothing fires', async () => {
    const part = await createPart();
    const { agent } = await signedInAs(app);
    const originals = await watch(agent, { partId: part.id, policy: 'originals_only' });
    const cheap = await watch(agent, { partId: part.id, policy: 'any', maxPriceCents: 1000 });
    const seller = await createSellerWithShipping();
    const repro = await createLiveListing(seller.user, part.id, { condition: 'reproduction', priceCents: 900 });
    const dear = await createLiveListing(seller.user, part.id, { condition: 'used_original', priceCents: 1001 });
    expect(await matchListing(repro.id)).toEqual([cheap.id]);
    expect(await matchListing(dear.id)).toEqual([originals.id]);
    const core = await createLiveListing(seller.user, part.id, { condition: 'core', priceCents: 10 });
    expect(await matchListing(core.id)).toEqual([]);

    const sellerAgent = await signedInAs(app);
    const sellersOwn = await watch(sellerAgent.agent, { partId: part.id });
    const own = await createLiveListing(sellerAgent.user, part.id, { condition: 'nos', priceCents: 500 });
    const hit = await matchListing(own.id);
    expect(hit.sort()).toEqual([cheap.id, originals.id].sort());
    expect(hit).not.toContain(sellersOwn.id);
  });

  it('when the hit is mailed, then the mail names the watched number and links to the listing', async () => {
    const part = await createPart();
    const { user, agent } = await signedInAs(app);
    const alert = await watch(agent, { partId: part.id });
    const seller = await createSellerWithShipping();
    const listing = await createLiveListing(seller.user, part.id, { title: 'Boxed NOS pump, fictional maker' });
    await matchListing(listing.id);
    expect(await mailHit({ alertId: alert.id, listingId: listing.id })).toBe('sent');
    const mail = await waitForMail(user.email, (m) => m.text.includes(listing.id));
    expect(mail.subject).toContain(part.number);
    expect(mail.text).toContain(`http://localhost:3000/listings/${listing.id}`);
    expect(mail.html).toContain('Boxed NOS pump');
  });
});

describe('wanted alerts: through the real queue', () => {
  it('when onListingLive is called twice for a matching listing, then exactly one mail and one notice arrive', async () => {
    const { old, neu } = await oneWayPair();
    const { user, agent } = await signedInAs(app);
    const alert = await watch(agent, { partId: old.id, policy: 'originals_only' });
    const seller = await createSellerWithShipping();
    const listing = await createLiveListing(seller.user, neu.id, { condition: 'used_original', priceCents: 7000 });

    await onListingLive(listing.id);
    await onListingLive(listing.id);
    const mail = await waitForMail(user.email, (m) => m.text.includes(listing.id), 15_000);
    expect(mail.subject).toContain('Wanted part listed');
    // Give a second job, if any, the time to run before counting.
    const boss = await getBoss();
    const until = Date.now() + 10_000;
    while (Date.now() < until) {
      const [m, n] = await Promise.all([boss.getQueueSize(QUEUES.alertMatch), boss.getQueueSize(QUEUES.alertMail)]);
      if (m === 0 && n === 0) break;
      await new Promise((r) => setTimeout(r, 200));
    }
    await new Promise((r) => setTimeout(r, 1500));
    expect((await mailsTo(user.email)).filter((m) => m.text.includes(listing.id))).toHaveLength(1);
    expect(await hitsOf(alert.id)).toHaveLength(1);

    const n = await agent.get('/api/notices');
    expect(n.status).toBe(200);
    expect(n.body.unreadCount).toBe(1);
    expect(n.body.notices[0]).toMatchObject({ kind: 'wanted_alert', read: false, link: `/listings/${listing.id}` });
    const read = await agent.post(`/api/notices/${n.body.notices[0].id}/read`).set('Origin', ORIGIN);
    expect(read.status).toBe(200);
    expect(read.body.notice.read).toBe(true);
    expect((await agent.get('/api/notices')).body.unreadCount).toBe(0);
    const other = await signedInAs(app);
    expect((await other.agent.post(`/api/notices/${n.body.notices[0].id}/read`).set('Origin', ORIGIN)).status).toBe(404);
  });
});

describe('alerts API', () => {
  it('when an alert is made with an unknown number or neither number nor part, then a 400 names the field; delete is owner-only', async () => {
    const { agent } = await signedInAs(app);
    const unknown = await agent.post('/api/alerts').set('Origin', ORIGIN).send({ number: 'ZZ-NO-SUCH-99' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.details.fieldErrors.number).toBeDefined();
    expect((await agent.post('/api/alerts').set('Origin', ORIGIN).send({ policy: 'any' })).status).toBe(400);
    const part = await createPart();
    const alert = await watch(agent, { partId: part.id, maxPriceCents: 2500 });
    const other = await signedInAs(app);
    expect((await other.agent.delete(`/api/alerts/${alert.id}`).set('Origin', ORIGIN)).status).toBe(404);
    expect((await agent.delete(`/api/alerts/${alert.id}`).set('Origin', ORIGIN)).status).toBe(204);
    expect((await agent.get('/api/alerts')).body.alerts).toEqual([]);
    expect((await request(app).get('/api/alerts')).status).toBe(401);
  });
});
