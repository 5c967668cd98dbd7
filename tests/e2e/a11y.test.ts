import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { DEMO_KEYS } from '../../server/db/seed/catalog-data';
import { isBlocking, runAxe, violationTable, type Violation } from './axe';
import { openBrowser, SCREENSHOTS } from './browser';

const baseUrl = inject('baseUrl');
const EARLY_MASTER = 'Master cylinder assembly, single circuit, 1 in bore, early';
type Session = Awaited<ReturnType<typeof openBrowser>>;

const found: Array<{ page: string; violations: Violation[] }> = [];
const sessions: Session[] = [];
let anon: Session;
let buyer: Session;
let seller: Session;
let admin: Session;

/** Signs in through the API (the session cookie lands in the browser context), as the sign-in form does. */
async function signIn(s: Session, email: string, password = 'drabyard-demo') {
  const r = await s.page.request.post(`${baseUrl}/api/auth/login`, { data: { email, password }, headers: { Origin: baseUrl } });
  expect(r.status(), `sign-in of ${email}`).toBe(200);
}

/** A live demo listing found through the public search API (search lists only live, in-stock listings first). */
async function liveListing(page: Page): Promise<{ id: string; title: string }> {
  const r = await page.request.get(`${baseUrl}/api/search?q=${encodeURIComponent(DEMO_KEYS.supersededNumber)}`);
  expect(r.status()).toBe(200);
  const { hits } = (await r.json()) as { hits: Array<{ type: string; id: string; title: string; inStock: boolean }> };
  const hit = hits.find((h) => h.type === 'listing' && h.inStock);
  expect(hit, 'a live listing in the search reply').toBeDefined();
  return hit!;
}

async function open(): Promise<Session> {
  const s = await openBrowser();
  sessions.push(s);
  return s;
}

/** Waits until the page shows its own content and nothing is loading, so axe sees what a person sees. */
async function settle(page: Page, ready: ReturnType<Page['locator']>) {
  await ready.first().waitFor();
  await page.waitForFunction(() => !document.querySelector('[aria-busy="true"]'));
  // Colour transitions (hover/focus styles, toasts) finish before contrast is measured.
  await page.waitForTimeout(250);
}

async function check(name: string, page: Page) {
  const violations = await runAxe(page);
  found.push({ page: name, violations });
  const blocking = violations.filter(isBlocking);
  if (blocking.length) await page.screenshot({ path: path.join(SCREENSHOTS, `a11y-${name.replace(/\W+/g, '-')}.png`), fullPage: true });
  expect(blocking.map((v) => `${v.impact} ${v.id}: ${v.help} — ${v.targets.join(' | ')} — ${v.summary}`)).toEqual([]);
}

beforeAll(async () => {
  mkdirSync(SCREENSHOTS, { recursive: true });
  [anon, buyer, seller, admin] = [await open(), await open(), await open(), await open()];
  // A buyer of its own, so the demo buyer's cart and garage stay as the other browser tests expect them.
  const email = `a11y-${randomUUID().slice(0, 8)}@example.test`;
  const reg = await buyer.page.request.post(`${baseUrl}/api/auth/register`, {
    data: { email, password: 'a-long-a11y-password', displayName: 'Axe Restorer' },
    headers: { Origin: baseUrl },
  });
  expect(reg.status()).toBe(201);
  await signIn(seller, 'seller@drabyard.test');
  await signIn(admin, 'admin@drabyard.test');
});

afterAll(async () => {
  // Every violation, blocking or not, by page: the minor and moderate ones are worth a look too.
  if (found.length) console.log(`\naxe-core violations by page:\n${violationTable(found)}\n`);
  for (const s of sessions) await s.close();
});

describe('accessibility of the main pages (axe-core, no serious or critical violations)', () => {
  it('when the home page is open, then axe finds nothing serious', async () => {
    await anon.page.goto(`${baseUrl}/`);
    await settle(anon.page, anon.page.locator('main h1'));
    await check('home', anon.page);
  });

  it('when the sign-in page is open, then axe finds nothing serious', async () => {
    await anon.page.goto(`${baseUrl}/sign-in`);
    await settle(anon.page, anon.page.getByLabel('E-mail'));
    await check('sign-in', anon.page);
  });

  it('when the register page is open, then axe finds nothing serious', async () => {
    await anon.page.goto(`${baseUrl}/register`);
    await settle(anon.page, anon.page.getByLabel('Display name'));
    await check('register', anon.page);
  });

  it('when the catalog index is open, then axe finds nothing serious', async () => {
    await anon.page.goto(`${baseUrl}/catalog`);
    await settle(anon.page, anon.page.getByRole('link', { name: /Kestrelvale KV-4/ }));
    await check('catalog', anon.page);
  });

  it('when a vehicle page and its master cylinder assembly are open, then axe finds nothing serious on either', async () => {
    const { page } = anon;
    await page.goto(`${baseUrl}/catalog/${DEMO_KEYS.vehicle1Slug}`);
    await settle(page, page.getByRole('heading', { name: 'Brakes' }));
    await check('vehicle', page);
    await page.getByRole('link', { name: 'Master cylinder', exact: true }).click();
    await settle(page, page.getByRole('group', { name: 'Exploded diagram: Master cylinder' }));
    await check('assembly', page);
  });

  it('when a part page is open, then axe finds nothing serious', async () => {
    const { page } = anon;
    const r = await page.request.get(`${baseUrl}/api/parts/resolve?number=${encodeURIComponent(DEMO_KEYS.supersededNumber)}`);
    const { parts } = (await r.json()) as { parts: Array<{ id: string; name: string }> };
    const part = parts.find((p) => p.name === EARLY_MASTER);
    expect(part, `${EARLY_MASTER} in the resolve reply`).toBeDefined();
    await page.goto(`${baseUrl}/catalog/parts/${part!.id}`);
    await settle(page, page.getByRole('list', { name: 'Supersession steps' }));
    await check('part', page);
  });

  it('when the search results are open, then axe finds nothing serious', async () => {
    const { page } = anon;
    await page.goto(`${baseUrl}/search?q=${encodeURIComponent(DEMO_KEYS.supersededNumber)}`);
    await settle(page, page.getByRole('list', { name: 'Results' }).getByRole('article'));
    await check('search', page);
  });

  it('when a live listing is open, then axe finds nothing serious', async () => {
    const { page } = anon;
    const listing = await liveListing(page);
    await page.goto(`${baseUrl}/listings/${listing.id}`);
    await settle(page, page.getByRole('heading', { level: 1, name: listing.title }));
    await check('listing', page);
  });

  it('when a signed-in buyer has an item in the cart and a vehicle in the garage, then axe finds nothing serious on the cart and garage', async () => {
    const { page } = buyer;
    const listing = await liveListing(page);
    const add = await page.request.post(`${baseUrl}/api/cart/items`, { data: { listingId: listing.id, quantity: 1 }, headers: { Origin: baseUrl } });
    expect(add.status()).toBeLessThan(300);
    const car = await page.request.post(`${baseUrl}/api/garage/vehicles`, {
      data: { vehicleSlug: DEMO_KEYS.vehicle1Slug, nickname: 'Axe test truck', serial: `KV4-${DEMO_KEYS.lastEarlySerial}`, originalityTarget: 'usable_driver' },
      headers: { Origin: baseUrl },
    });
    expect(car.status()).toBe(201);

    await page.goto(`${baseUrl}/cart`);
    await settle(page, page.getByRole('main').getByRole('heading', { level: 1 }));
    await page.getByRole('main').getByText(listing.title).first().waitFor();
    await check('cart', page);

    await page.goto(`${baseUrl}/garage`);
    await settle(page, page.getByRole('heading', { name: 'Your garage' }));
    await page.getByText('Axe test truck').first().waitFor();
    await check('garage', page);
  });

  it('when a seller opens the seller desk, then axe finds nothing serious', async () => {
    const { page } = seller;
    await page.goto(`${baseUrl}/seller`);
    await settle(page, page.getByRole('list', { name: 'Listings by state' }));
    await check('seller-desk', page);
  });

  it('when an administrator opens the listings queue, then axe finds nothing serious', async () => {
    const { page } = admin;
    await page.goto(`${baseUrl}/admin/listings`);
    await settle(page, page.getByRole('search', { name: 'Filter the queue' }));
    await page.getByRole('table').or(page.getByText(/nothing|no listings|empty/i)).first().waitFor();
    await check('admin-listings', page);
  });
});
