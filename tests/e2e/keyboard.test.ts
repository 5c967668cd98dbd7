import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { DEMO_KEYS } from '../../server/db/seed/catalog-data';
import { openBrowser, SCREENSHOTS } from './browser';

const baseUrl = inject('baseUrl');
const BUYER = 'buyer@drabyard.test';
let b: Awaited<ReturnType<typeof openBrowser>>;
/** The demo buyer's cart before the journey, put back afterwards so the other browser tests find it as it was. */
let cartBefore = new Map<string, number>();

interface Focused {
  tag: string;
  role: string | null;
  name: string;
  href: string | null;
  inResults: boolean;
  cardText: string;
  focusVisible: boolean;
  outline: string;
}

/** What has the keyboard focus now, and whether it shows a focus ring. */
function focused(page: Page): Promise<Focused | null> {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return null;
    const s = getComputedStyle(el);
    const card = el.closest('article');
    return {
      tag: el.tagName.toLowerCase(),
      role: el.getAttribute('role'),
      name: (el.getAttribute('aria-label') ?? el.innerText ?? '').replace(/\s+/g, ' ').trim(),
      href: el.getAttribute('href'),
      inResults: !!el.closest('[aria-label="Results"]'),
      cardText: card?.innerText ?? '',
      focusVisible: el.matches(':focus-visible'),
      // A visible ring: an outline of some width in a colour that is not transparent, or a box-shadow ring.
      outline:
        s.outlineStyle !== 'none' && parseFloat(s.outlineWidth) >= 1 && s.outlineColor !== 'rgba(0, 0, 0, 0)' ? `outline ${s.outlineWidth} ${s.outlineStyle} ${s.outlineColor}` : s.boxShadow !== 'none' ? `box-shadow ${s.boxShadow}` : '',
    };
  });
}

/** Presses Tab until the focused element passes `want` (at most `max` presses); fails with the path it took. */
async function tabTo(page: Page, what: string, want: (f: Focused) => boolean, max = 80): Promise<Focused> {
  const trail: string[] = [];
  for (let i = 0; i < max; i++) {
    await page.keyboard.press('Tab');
    const f = await focused(page);
    trail.push(f ? `${f.tag}${f.role ? `[${f.role}]` : ''} "${f.name.slice(0, 30)}"` : '(body)');
    if (f && want(f)) return f;
  }
  throw new Error(`Tab did not reach ${what} in ${max} presses; focus went: ${trail.join(' → ')}`);
}

function expectRing(f: Focused, what: string) {
  expect(f.focusVisible, `${what} matches :focus-visible`).toBe(true);
  expect(f.outline, `${what} shows a focus ring`).not.toBe('');
}

type CartReply = { groups: Array<{ items: Array<{ listingId: string; title: string; quantity: number }> }> };
const cartItems = async (page: Page) => ((await (await page.request.get(`${baseUrl}/api/cart`)).json()) as CartReply).groups.flatMap((g) => g.items);

beforeAll(async () => {
  mkdirSync(SCREENSHOTS, { recursive: true });
  b = await openBrowser();
  const r = await b.page.request.post(`${baseUrl}/api/auth/login`, { data: { email: BUYER, password: 'drabyard-demo' }, headers: { Origin: baseUrl } });
  expect(r.status()).toBe(200);
  cartBefore = new Map((await cartItems(b.page)).map((i) => [i.listingId, i.quantity]));
});

afterAll(async () => {
  if (b) {
    const headers = { Origin: baseUrl };
    for (const item of await cartItems(b.page)) {
      const before = cartBefore.get(item.listingId);
      if (before === undefined) await b.page.request.delete(`${baseUrl}/api/cart/items/${item.listingId}`, { headers });
      else if (before !== item.quantity) await b.page.request.patch(`${baseUrl}/api/cart/items/${item.listingId}`, { data: { quantity: before }, headers });
    }
    await b.close();
  }
});

describe('keyboard only', () => {
  it('when a signed-in buyer uses only the keyboard from the header search to a listing and the cart, then every stop shows a focus ring and the item lands in the cart', async () => {
    const { page } = b;
    const keys = page.keyboard;
    await page.goto(`${baseUrl}/`);
    await page.locator('main h1').waitFor();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Cart' }).waitFor();

    // 1. The header search box, reached with Tab from the top of the page (past the skip link and the wordmark).
    const box = await tabTo(page, 'the header search box', (f) => f.role === 'combobox', 10);
    expectRing(box, 'the search box');

    // 2. Type the number as people do, lower case without the hyphen; arrow down to its suggestion; Enter.
    await keys.type(DEMO_KEYS.supersededNumber.toLowerCase().replace('-', ''), { delay: 40 });
    const listbox = page.getByRole('listbox', { name: 'Suggestions' });
    const suggestion = listbox.getByRole('option', { name: new RegExp(`^${DEMO_KEYS.supersededNumber}`) });
    await suggestion.waitFor();
    const index = (await listbox.getByRole('option').allInnerTexts()).findIndex((t) => t.startsWith(DEMO_KEYS.supersededNumber));
    for (let i = 0; i <= index; i++) await keys.press('ArrowDown');
    expect(await suggestion.getAttribute('aria-selected')).toBe('true');
    await keys.press('Enter');
    await page.waitForURL((u) => u.pathname === '/search' && u.searchParams.get('q') === DEMO_KEYS.supersededNumber);
    await page.getByRole('list', { name: 'Results' }).getByRole('article').first().waitFor();
    await page.waitForFunction(() => !document.querySelector('[aria-busy="true"]'));

    // 3. Tab on through the header and the filters to the first listing in stock; Enter opens it.
    const result = await tabTo(page, 'a listing in stock among the results', (f) => f.inResults && !!f.href?.startsWith('/listings/') && !/out of stock/i.test(f.cardText));
    expectRing(result, 'the result link');
    await page.screenshot({ path: path.join(SCREENSHOTS, 'keyboard-result.png') });
    await keys.press('Enter');
    await page.waitForURL(/\/listings\//);
    const title = page.getByRole('heading', { level: 1 });
    await title.waitFor();
    expect((await title.innerText()).replace(/\s+/g, ' ').trim()).toBe(result.name);

    // 4. Tab to "Add to cart" (wired by the cart feature; waited for by its accessible name); Enter adds one.
    await page.getByRole('button', { name: 'Add to cart' }).waitFor();
    const add = await tabTo(page, 'the "Add to cart" button', (f) => f.tag === 'button' && f.name === 'Add to cart');
    expectRing(add, 'the Add to cart button');
    await page.screenshot({ path: path.join(SCREENSHOTS, 'keyboard-add-to-cart.png') });
    await keys.press('Enter');
    await page.getByRole('link', { name: 'View cart' }).waitFor();

    // 5. On to the cart: the "View cart" link next to the button (or the header's Cart link, whichever Tab meets first).
    const toCart = await tabTo(page, 'a link to the cart', (f) => f.tag === 'a' && f.href === '/cart', 40);
    expectRing(toCart, 'the cart link');
    await keys.press('Enter');
    await page.waitForURL((u) => u.pathname === '/cart');
    await page.getByRole('main').getByText(result.name).first().waitFor();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'keyboard-cart.png'), fullPage: true });

    // Shift+Tab walks back as well: from the first control of the cart page back into the header.
    const first = await tabTo(page, 'a control on the cart page', (f) => f.tag !== 'a' || !f.href?.startsWith('/'), 40);
    expectRing(first, 'a cart control');
    await keys.press('Shift+Tab');
    const back = await focused(page);
    expect(back, 'focus after Shift+Tab').not.toBeNull();
    expectRing(back!, 'the previous stop');

    expect(b.errors).toEqual([]);
  });
});
