import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { APIResponse, Page } from 'playwright-core';
import { DEMO_KEYS } from '../../server/db/seed/catalog-data';
import { linkFrom, waitForMail } from '../factories/mail';
import { openBrowser, SCREENSHOTS } from './browser';

const baseUrl = inject('baseUrl');
type Session = Awaited<ReturnType<typeof openBrowser>>;

// Script payloads: an attribute handler, a tag break-out and a script URL. Each would set window.__xss or open
// a dialog if it ran. The CSP (script-src 'self') would stop most of them even if they reached the DOM, so the
// checks below look at the DOM itself too: no element carries an on* attribute, no script holds the payload,
// nothing links to javascript:, and the browser reported no CSP violation (which a blocked injection causes).
const IMG = '<img src=x onerror=window.__xss=1>';
const BREAK = '"><script>window.__xss=1</script>';
const JS_URL = 'javascript:alert(1)';
const tag = `Xq${randomUUID().slice(0, 6).replace(/-/g, '')}`;

const dialogs: string[] = [];
const sessions: Session[] = [];
let user: Session;
let admin: Session;
let visitor: Session;

const state = {
  userId: '',
  plainId: '',
  markdownId: '',
  partId: '',
  vehicleId: '',
  assemblyId: '',
};
const email = `xss-${tag.toLowerCase()}@example.test`;
const displayName = `${IMG} ${BREAK}`;
const application = { businessName: `${tag} ${IMG}`, location: BREAK, whatTheySell: `${IMG} ${BREAK} ${JS_URL}` };
const shop = { shopName: `${IMG} ${BREAK}`, location: BREAK, showsNote: `${IMG} ${JS_URL}`, returnPolicy: `${BREAK} ${JS_URL}` };
const plainTitle = `${tag} ${IMG} ${BREAK}`;
const plainDescription = `${IMG}\n\n${BREAK}\n${JS_URL}`;
const markdownTitle = `${tag} md ${BREAK}`;
const markdownDescription = [
  `## Heading ${IMG}`,
  '',
  `**Bold** ${BREAK}`,
  '',
  `[click me](${JS_URL}) and <a href="${JS_URL}">raw link</a>`,
  '',
  `![${IMG}](x)`,
  '',
  `<svg onload=window.__xss=1>`,
].join('\n');
const nickname = `${IMG} ${BREAK}`;
const logText = `${IMG}\n${BREAK}\n${JS_URL}`;
const teardownNote = `${BREAK} ${IMG} ${JS_URL}`;
const partName = `${tag} part ${IMG}`;
const partNumber = `${tag.toUpperCase()} ${IMG}`;

async function open(): Promise<Session> {
  const s = await openBrowser();
  sessions.push(s);
  // Installed through the DevTools protocol, so the page's CSP does not stop it.
  await s.context.addInitScript(() => {
    const w = window as unknown as { __csp: string[] };
    w.__csp = [];
    document.addEventListener('securitypolicyviolation', (e) => {
      // zod 4 probes once whether `new Function` is allowed; the CSP refusing it is the policy working, not a payload.
      if (e.blockedURI === 'eval') return;
      w.__csp.push(`${e.violatedDirective} ${e.blockedURI} ${e.sample}`);
    });
  });
  s.page.on('dialog', (d) => {
    dialogs.push(`${d.type()}: ${d.message()}`);
    void d.dismiss();
  });
  return s;
}

async function ok(r: APIResponse, what: string) {
  expect(r.status(), `${what}: ${await r.text()}`).toBeLessThan(300);
  return r.status() === 204 ? null : ((await r.json()) as Record<string, unknown>);
}
const post = async (s: Session, url: string, data: unknown, what: string) => ok(await s.page.request.post(`${baseUrl}${url}`, { data, headers: { Origin: baseUrl } }), what);
const put = async (s: Session, url: string, data: unknown, what: string) => ok(await s.page.request.put(`${baseUrl}${url}`, { data, headers: { Origin: baseUrl } }), what);
const get = async (s: Session, url: string) => ok(await s.page.request.get(`${baseUrl}${url}`), `GET ${url}`);

/** Each text shows on the page as text (at least once, visibly), and nothing of the payloads became live. */
async function expectInert(page: Page, texts: string[], name: string) {
  for (const text of texts) await page.getByText(text).filter({ visible: true }).first().waitFor();
  await page.waitForTimeout(150);
  const seen = await page.evaluate(() => {
    const w = window as unknown as { __xss?: unknown; __csp?: string[] };
    const all = [...document.querySelectorAll('*')];
    const short = (el: Element) => el.outerHTML.slice(0, 160);
    return {
      xss: w.__xss,
      csp: w.__csp ?? [],
      handlers: all.filter((el) => [...el.attributes].some((a) => /^on/i.test(a.name))).map(short),
      scripts: [...document.scripts].filter((s) => (s.textContent ?? '').includes('__xss')).map(short),
      scriptUrls: all.filter((el) => ['href', 'src', 'action', 'formaction', 'xlink:href'].some((a) => /^\s*javascript:/i.test(el.getAttribute(a) ?? ''))).map(short),
    };
  });
  await page.screenshot({ path: path.join(SCREENSHOTS, `xss-${name}.png`), fullPage: true });
  expect(seen.xss, `window.__xss on ${name}`).toBeUndefined();
  expect(seen.handlers, `elements with on* attributes on ${name}`).toEqual([]);
  expect(seen.scripts, `scripts with the payload on ${name}`).toEqual([]);
  expect(seen.scriptUrls, `javascript: URLs on ${name}`).toEqual([]);
  expect(seen.csp, `CSP violations on ${name}`).toEqual([]);
  expect(dialogs).toEqual([]);
}

beforeAll(async () => {
  mkdirSync(SCREENSHOTS, { recursive: true });
  [user, admin, visitor] = [await open(), await open(), await open()];
  await post(admin, '/api/auth/login', { email: 'admin@drabyard.test', password: 'drabyard-demo' }, 'admin sign-in');
});

afterAll(async () => {
  for (const s of sessions) await s.close();
});

describe('stored and reflected script payloads render as text in the browser', () => {
  it('when someone registers with a script payload as display name, then the header and account page show it as text', async () => {
    const reg = (await post(user, '/api/auth/register', { email, password: 'a-long-xss-password', displayName }, 'register')) as { user: { id: string } };
    state.userId = reg.user.id;
    // Applying to sell needs a verified address: follow the link from the mail stand-in.
    const mail = await waitForMail(email, (m) => m.subject.includes('Confirm'));
    const token = new URL(linkFrom(mail, 'verify-email')).searchParams.get('token');
    await post(user, '/api/auth/verify-email', { token }, 'verify e-mail');

    await user.page.goto(`${baseUrl}/account`);
    await expectInert(user.page, [displayName], 'account');
    expect(user.errors).toEqual([]);
  });

  it('when the seller application holds payloads, then the applicant and the administrator see them as text', async () => {
    await post(user, '/api/seller-applications', application, 'seller application');
    await user.page.goto(`${baseUrl}/account/seller-application`);
    await expectInert(user.page, [application.businessName], 'seller-application');

    await admin.page.goto(`${baseUrl}/admin/seller-applications`);
    const row = admin.page.getByRole('row', { name: new RegExp(tag) });
    await row.waitFor();
    await expectInert(admin.page, [application.businessName, application.location, application.whatTheySell], 'admin-seller-applications');

    const { applications } = (await get(admin, '/api/admin/seller-applications?state=pending')) as { applications: Array<{ id: string; userId: string }> };
    const mine = applications.find((a) => a.userId === state.userId);
    expect(mine).toBeDefined();
    await post(admin, `/api/admin/seller-applications/${mine!.id}/decision`, { decision: 'approve' }, 'approve the application');
    expect(admin.errors).toEqual([]);
  });

  it('when the new seller sets shop fields and two listings (plain and markdown) with payloads, then the seller desk, editor and review queue show them as text', async () => {
    await put(user, '/api/me/shop', { ...shop, country: 'US', shipsTo: ['US', 'CA'], pickupAtShows: true }, 'shop profile');
    await post(
      user,
      '/api/me/shipping-profiles',
      { name: `${tag} ${IMG}`, isDefault: true, rules: { kind: 'flat_per_order', amountCents: 1500, freeAboveCents: 15000, shipsTo: ['CA', 'US'], pickupAvailable: true, dimDivisor: 'carrier_139' } },
      'shipping profile',
    );
    // Unidentified parts (described in words), so these listings stay out of the demo numbers' search results
    // that the other browser tests count on.
    const base = { partId: null, condition: 'reproduction', quantity: 2, priceCents: 4_200 };
    const plain = (await post(user, '/api/listings', { ...base, title: plainTitle, description: plainDescription, descriptionFormat: 'plain' }, 'plain listing')) as { listing: { id: string } };
    const md = (await post(user, '/api/listings', { ...base, title: markdownTitle, description: markdownDescription, descriptionFormat: 'markdown' }, 'markdown listing')) as { listing: { id: string } };
    state.plainId = plain.listing.id;
    state.markdownId = md.listing.id;
    for (const id of [state.plainId, state.markdownId]) await post(user, `/api/listings/${id}/submit`, {}, 'submit');

    await user.page.goto(`${baseUrl}/seller`);
    await expectInert(user.page, [plainTitle, markdownTitle], 'seller-desk');
    await user.page.goto(`${baseUrl}/seller/listings/${state.plainId}/edit`);
    await user.page.getByLabel('Title').waitFor();
    expect(await user.page.getByLabel('Title').inputValue()).toBe(plainTitle);
    await expectInert(user.page, [], 'listing-edit');
    await user.page.goto(`${baseUrl}/seller/shop`);
    await user.page.getByRole('form', { name: 'Shop profile' }).waitFor();
    await expect.poll(() => user.page.getByLabel(/Shop name/).inputValue()).toBe(shop.shopName);
    await expectInert(user.page, [], 'seller-shop');

    // The review panel shows the stored description HTML: it must be the escaped text.
    await admin.page.goto(`${baseUrl}/admin/listings?sort=newest`);
    await admin.page.getByRole('row', { name: new RegExp(`^Select ${tag} `) }).first().waitFor();
    await admin.page.getByRole('button', { name: `Review ${plainTitle}` }).click();
    await expectInert(admin.page, [plainTitle, IMG, BREAK, JS_URL], 'admin-review-plain');
    await admin.page.getByRole('button', { name: `Review ${markdownTitle}` }).click();
    await expectInert(admin.page, [markdownTitle, `Heading ${IMG}`], 'admin-review-markdown');
    for (const id of [state.plainId, state.markdownId]) await post(admin, `/api/admin/listings/${id}/decision`, { decision: 'approve' }, 'approve the listing');
    expect(user.errors).toEqual([]);
    expect(admin.errors).toEqual([]);
  });

  it('when a visitor opens the live listings and finds them by search, then titles, descriptions and shop fields show as text', async () => {
    const { page } = visitor;
    await page.goto(`${baseUrl}/listings/${state.plainId}`);
    await page.getByRole('heading', { level: 1, name: plainTitle }).waitFor();
    await expectInert(page, [plainTitle, IMG, BREAK, JS_URL, shop.shopName, shop.showsNote, shop.returnPolicy], 'listing-plain');

    await page.goto(`${baseUrl}/listings/${state.markdownId}`);
    await page.getByRole('heading', { level: 1, name: markdownTitle }).waitFor();
    await expectInert(page, [`Heading ${IMG}`, `Bold ${BREAK}`, `<a href="${JS_URL}">raw link</a>`, '<svg onload=window.__xss=1>'], 'listing-markdown');
    // Markdown's own link syntax keeps its text but loses the script URL.
    const link = page.getByRole('main').getByText('click me', { exact: true });
    expect(await link.getAttribute('href')).toBeNull();

    await page.goto(`${baseUrl}/search?q=${encodeURIComponent(tag)}`);
    await page.getByRole('list', { name: 'Results' }).waitFor();
    await expectInert(page, [plainTitle, markdownTitle, shop.shopName], 'search-stored');
    expect(visitor.errors).toEqual([]);
  });

  it('when a search query in the URL carries payloads, then the results page and the header box reflect it as text', async () => {
    const { page } = visitor;
    const q = `${IMG} ${BREAK} ${JS_URL}`;
    await page.goto(`${baseUrl}/search?q=${encodeURIComponent(q)}`);
    const box = page.getByRole('combobox', { name: 'Search parts and numbers' });
    await expect.poll(() => box.inputValue()).toBe(q);
    await expectInert(page, [q], 'search-reflected');
    // The raw query, unencoded as a hand-typed URL would carry it.
    await page.goto(`${baseUrl}/search?q=${BREAK.replace(/ /g, '+')}`);
    await expect.poll(() => box.inputValue()).toBe(BREAK);
    await expectInert(page, [], 'search-reflected-raw');
    expect(visitor.errors).toEqual([]);
  });

  it('when the garage holds a payload nickname, log entry and teardown note, then the garage pages show them as text', async () => {
    const { page } = user;
    const created = (await post(
      user,
      '/api/garage/vehicles',
      { vehicleSlug: DEMO_KEYS.vehicle1Slug, nickname, serial: `KV4-${DEMO_KEYS.lastEarlySerial}`, originalityTarget: 'usable_driver' },
      'garage vehicle',
    )) as { vehicle: { id: string } };
    state.vehicleId = created.vehicle.id;
    await post(user, `/api/garage/vehicles/${state.vehicleId}/log`, { text: logText }, 'log entry');
    const vehicle = (await get(visitor, `/api/vehicles/${DEMO_KEYS.vehicle1Slug}`)) as { systems: Array<{ assemblies: Array<{ id: string; name: string }> }> };
    state.assemblyId = vehicle.systems.flatMap((s) => s.assemblies).find((a) => a.name === 'Master cylinder')!.id;
    const checklist = (await get(user, `/api/garage/vehicles/${state.vehicleId}/assemblies/${state.assemblyId}`)) as { lines: Array<{ id: string }> };
    await put(user, `/api/garage/vehicles/${state.vehicleId}/teardown/${checklist.lines[0].id}`, { status: 'replace', note: teardownNote }, 'teardown note');

    await page.goto(`${baseUrl}/garage`);
    await expectInert(page, [nickname], 'garage');
    await page.goto(`${baseUrl}/garage/vehicles/${state.vehicleId}`);
    await page.getByRole('heading', { level: 1, name: nickname }).waitFor();
    await expectInert(page, [nickname, IMG, BREAK, JS_URL], 'garage-vehicle');
    await page.goto(`${baseUrl}/garage/vehicles/${state.vehicleId}/assemblies/${state.assemblyId}`);
    await page.getByRole('heading', { name: 'Master cylinder', level: 1 }).waitFor();
    await expect.poll(() => page.locator('textarea').evaluateAll((els) => els.map((e) => (e as HTMLTextAreaElement).value))).toContain(teardownNote);
    await expectInert(page, [], 'garage-assembly');
    await page.goto(`${baseUrl}/garage/vehicles/${state.vehicleId}/needs`);
    await page.getByRole('heading', { name: 'Needs list', level: 1 }).waitFor();
    await expectInert(page, [], 'garage-needs');
    expect(user.errors).toEqual([]);
  });

  it('when an administrator names a catalog part and its number with payloads, then the part page, the editor and the suggestions show them as text', async () => {
    const created = (await post(
      admin,
      '/api/admin/parts',
      { name: partName, description: `${BREAK} ${JS_URL}`, category: 'bracket', specs: { Marking: IMG }, numbers: [{ number: partNumber, kind: 'maker' }] },
      'catalog part',
    )) as { part: { id: string } };
    state.partId = created.part.id;

    const { page } = visitor;
    await page.goto(`${baseUrl}/catalog/parts/${state.partId}`);
    await page.getByRole('heading', { level: 1, name: partName }).waitFor();
    await expectInert(page, [partName, partNumber, BREAK], 'catalog-part');

    // The header's suggestions list the part by its number and name.
    const box = page.getByRole('combobox', { name: 'Search parts and numbers' });
    await box.click();
    await box.pressSequentially(tag.toLowerCase(), { delay: 30 });
    await page.getByRole('listbox', { name: 'Suggestions' }).getByRole('option').first().waitFor();
    await expectInert(page, [partName], 'suggestions');

    await admin.page.goto(`${baseUrl}/admin/catalog?part=${state.partId}`);
    await admin.page.getByRole('form', { name: 'Part details' }).waitFor();
    await expect.poll(() => admin.page.getByRole('form', { name: 'Part details' }).getByLabel(/^Name/).inputValue()).toBe(partName);
    await expectInert(admin.page, [partNumber], 'admin-catalog-part');
    expect(visitor.errors).toEqual([]);
    expect(admin.errors).toEqual([]);
  });
});
