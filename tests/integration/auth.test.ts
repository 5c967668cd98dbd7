import { eq } from 'drizzle-orm';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { getDb } from '../../server/db/client';
import { auditLog } from '../../server/db/schema/index';
import { linkFrom, waitForMail } from '../factories/mail';
import { ORIGIN, createUser, signIn, signedInAs, uniqueEmail } from '../factories/users';

const app = createApp();
const post = (path: string) => request(app).post(path).set('Origin', ORIGIN);
const sessionCookie = (r: request.Response) => ([] as string[]).concat(r.headers['set-cookie'] ?? []).find((c) => c.startsWith('drabyard.sid='));

describe('registration and e-mail verification', () => {
  it('when someone registers, then a verification mail with text and HTML parts arrives and its link verifies once', async () => {
    const email = uniqueEmail('reg');
    const agent = request.agent(app);
    const r = await agent.post('/api/auth/register').set('Origin', ORIGIN).send({ email, password: 'long-enough-pass', displayName: 'New Restorer' });
    expect(r.status).toBe(201);
    expect(r.body.user).toMatchObject({ email, displayName: 'New Restorer', roles: ['buyer'], emailVerified: false });
    const mail = await waitForMail(email, (m) => m.subject.includes('Confirm'));
    expect(mail.html).toContain('verify-email?token=');
    const token = new URL(linkFrom(mail, 'verify-email')).searchParams.get('token')!;
    const v = await post('/api/auth/verify-email').send({ token });
    expect(v.status).toBe(200);
    expect(v.body.user.emailVerified).toBe(true);
    const again = await post('/api/auth/verify-email').send({ token });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('validation_failed');
    const me = await agent.get('/api/auth/me');
    expect(me.body.user.emailVerified).toBe(true);
  });

  it('when the input is bad, then a 400 names each failing field', async () => {
    const r = await post('/api/auth/register').send({ email: 'not-an-email', password: 'short', displayName: '' });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('validation_failed');
    expect(Object.keys(r.body.error.details.fieldErrors).sort()).toEqual(['displayName', 'email', 'password']);
  });

  it('when the e-mail is taken, then a 409 says so', async () => {
    const u = await createUser();
    const r = await post('/api/auth/register').send({ email: u.email.toUpperCase(), password: 'long-enough-pass', displayName: 'Dup' });
    expect(r.status).toBe(409);
  });
});

describe('sign-in and sessions', () => {
  it('when the password is right, then 200 with the user and a new httpOnly SameSite=Lax session id', async () => {
    const u = await createUser();
    const agent = request.agent(app);
    // An anonymous session exists first (a failed attempt leaves no session, so create one by a request that writes it).
    const first = await agent.post('/api/auth/login').set('Origin', ORIGIN).send({ email: u.email, password: u.password });
    expect(first.status).toBe(200);
    expect(first.body.user).toMatchObject({ id: u.id, email: u.email, roles: ['buyer'] });
    const c1 = sessionCookie(first)!;
    expect(c1).toMatch(/HttpOnly/i);
    expect(c1).toMatch(/SameSite=Lax/i);
    const second = await agent.post('/api/auth/login').set('Origin', ORIGIN).send({ email: u.email, password: u.password });
    const c2 = sessionCookie(second)!;
    expect(c2.split(';')[0]).not.toBe(c1.split(';')[0]);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(u.email);
  });

  it('when the password is wrong, then 401, and after five failures even the right one is throttled with 429', async () => {
    const u = await createUser();
    for (let i = 0; i < 5; i++) {
      const r = await post('/api/auth/login').send({ email: u.email, password: 'wrong-password' });
      expect(r.status).toBe(401);
      expect(r.body.error.code).toBe('unauthenticated');
    }
    const r = await post('/api/auth/login').send({ email: u.email, password: u.password });
    expect(r.status).toBe(429);
    expect(r.body.error.code).toBe('rate_limited');
    expect(r.headers['retry-after']).toBeDefined();
  });

  it('when signed out, then /me is 401 again', async () => {
    const { agent } = await signedInAs(app);
    expect((await agent.post('/api/auth/logout').set('Origin', ORIGIN)).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('when anonymous, then /me is 401 with the JSON error shape', async () => {
    const r = await request(app).get('/api/auth/me');
    expect(r.status).toBe(401);
    expect(r.body).toEqual({ error: { code: 'unauthenticated', message: expect.any(String) } });
  });
});

describe('password reset', () => {
  it('when a reset is asked for, then the mailed token sets a new password once and the old one stops working', async () => {
    const u = await createUser();
    const r = await post('/api/auth/forgot-password').send({ email: u.email });
    expect(r.status).toBe(202);
    const mail = await waitForMail(u.email, (m) => m.subject.includes('Reset'));
    const token = new URL(linkFrom(mail, 'reset-password')).searchParams.get('token')!;
    expect((await post('/api/auth/reset-password').send({ token, password: 'a-brand-new-secret' })).status).toBe(200);
    expect((await post('/api/auth/reset-password').send({ token, password: 'another-new-secret' })).status).toBe(400);
    expect((await post('/api/auth/login').send({ email: u.email, password: u.password })).status).toBe(401);
    expect((await post('/api/auth/login').send({ email: u.email, password: 'a-brand-new-secret' })).status).toBe(200);
  });

  it('when the address is unknown, then the reply is the same 202', async () => {
    const r = await post('/api/auth/forgot-password').send({ email: uniqueEmail('nobody') });
    expect(r.status).toBe(202);
  });
});

describe('cross-site request protection and headers', () => {
  it('when a state-changing request has no Origin or another site\'s Origin, then 403', async () => {
    const u = await createUser();
    const none = await request(app).post('/api/auth/login').send({ email: u.email, password: u.password });
    expect(none.status).toBe(403);
    expect(none.body.error.code).toBe('cross_site_refused');
    const evil = await request(app).post('/api/auth/login').set('Origin', 'https://evil.example').send({ email: u.email, password: u.password });
    expect(evil.status).toBe(403);
    const fetchSite = await request(app).post('/api/auth/login').set('Sec-Fetch-Site', 'same-origin').send({ email: u.email, password: u.password });
    expect(fetchSite.status).toBe(200);
  });

  it('when any page is served, then a CSP without inline scripts and the usual security headers are set', async () => {
    const r = await request(app).get('/api/health');
    expect(r.status).toBe(200);
    expect(r.body).toEqual({ ok: true, db: 'up' });
    const csp = r.headers['content-security-policy'];
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(r.headers['x-content-type-options']).toBe('nosniff');
    expect(r.headers['x-request-id']).toBeDefined();
  });

  it('when an API path does not exist, then a JSON 404', async () => {
    const r = await request(app).get('/api/nothing-here');
    expect(r.status).toBe(404);
    expect(r.body.error.code).toBe('not_found');
  });

  it('when the body is not JSON, then a clear 400', async () => {
    const r = await post('/api/auth/login').set('Content-Type', 'application/json').send('{"email":');
    expect(r.status).toBe(400);
  });
});

describe('seller applications and roles', () => {
  it('when an administrator approves an application, then the applicant holds the seller role and the decision is audited', async () => {
    const applicant = await createUser();
    const agent = await signIn(app, applicant);
    const a = await agent.post('/api/seller-applications').set('Origin', ORIGIN).send({ businessName: 'Test Salvage', location: 'Somewhere, US', whatTheySell: 'Used brake parts and hardware' });
    expect(a.status).toBe(201);
    expect(a.body.application.state).toBe('pending');
    const dup = await agent.post('/api/seller-applications').set('Origin', ORIGIN).send({ businessName: 'Test Salvage', location: 'Somewhere, US', whatTheySell: 'Used brake parts and hardware' });
    expect(dup.status).toBe(409);

    expect((await agent.get('/api/admin/seller-applications')).status).toBe(403);
    expect((await request(app).get('/api/admin/seller-applications')).status).toBe(401);
    const { agent: admin } = await signedInAs(app, ['buyer', 'admin']);
    const list = await admin.get('/api/admin/seller-applications?state=pending');
    expect(list.status).toBe(200);
    expect(list.body.applications.some((x: { id: string }) => x.id === a.body.application.id)).toBe(true);
    const bad = await admin.get('/api/admin/seller-applications?state=maybe');
    expect(bad.status).toBe(400);

    const forbidden = await agent.post(`/api/admin/seller-applications/${a.body.application.id}/decision`).set('Origin', ORIGIN).send({ decision: 'approve' });
    expect(forbidden.status).toBe(403);
    const d = await admin.post(`/api/admin/seller-applications/${a.body.application.id}/decision`).set('Origin', ORIGIN).send({ decision: 'approve', note: 'Welcome' });
    expect(d.status).toBe(200);
    expect(d.body.application.state).toBe('approved');
    const me = await agent.get('/api/auth/me');
    expect(me.body.user.roles.sort()).toEqual(['buyer', 'seller']);
    const rows = await getDb().select().from(auditLog).where(eq(auditLog.entityId, a.body.application.id));
    expect(rows).toHaveLength(1);
    expect(rows[0].action).toBe('seller_application.approved');
    const mail = await waitForMail(applicant.email, (m) => m.subject.includes('sell'));
    expect(mail.text).toContain('approved');
    const twice = await admin.post(`/api/admin/seller-applications/${a.body.application.id}/decision`).set('Origin', ORIGIN).send({ decision: 'reject' });
    expect(twice.status).toBe(409);
  });

  it('when the e-mail is not verified, then applying to sell is refused', async () => {
    const u = await createUser({ verified: false });
    const agent = await signIn(app, u);
    const r = await agent.post('/api/seller-applications').set('Origin', ORIGIN).send({ businessName: 'X Shop', location: 'Here', whatTheySell: 'Clamps and clips mostly' });
    expect(r.status).toBe(403);
  });
});
