import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import type { CartReply, OrderDto } from '../../shared/schemas/orders';
import type { SearchReply } from '../../shared/schemas/search';
import { waitForMail } from '../factories/mail';
import { openBrowser, SCREENSHOTS, signInThroughUi } from './browser';

const baseUrl = inject('baseUrl');
const PASSWORD = 'drabyard-demo';
const BUYER = 'buyer@drabyard.test';
// The demo shops (fictional, server/db/seed/listings.ts) and their sellers' accounts.
const SELLERS: Record<string, string> = {
  'Hollow Creek Salvage': 'seller@drabyard.test',
  'Bramble & Sons Reproductions': 'seller2@drabyard.test',
};

let b: Awaited<ReturnType<typeof openBrowser>>;
const shot = (name: string) => b.page.screenshot({ path: path.join(SCREENSHOTS, name), fullPage: true });
const usd = (cents: number) => new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(cents / 100);
const ref = (id: string) => id.replaceAll('-', '').slice(0, 8).toUpperCase();

beforeAll(async () => {
  mkdirSync(SCREENSHOTS, { recursive: true });
  b = await openBrowser();
});
afterAll(async () => {
  await b?.close();
});

/** One live listing with stock to spare from each demo shop, found through the public search API. */
async function twoListingsOfTwoSellers(page: Page): Promise<Array<{ id: string; title: string; sellerName: string }>> {
  const r = await page.request.get(`${baseUrl}/api/search?type=listing&inStock=true&shipsTo=US&sort=price_asc`);
  expect(r.ok()).toBe(true);
  const { hits } = (await r.json()) as SearchReply;
  const picked = Object.keys(SELLERS).map((shop) => hits.find((h) => h.type === 'listing' && h.sellerName === shop && (h.quantity ?? 0) >= 2));
  expect(picked.every(Boolean), 'each demo shop has a live listing with stock').toBe(true);
  return picked.map((h) => ({ id: h!.id, title: h!.title, sellerName: h!.sellerName! }));
}

/** The listing page's button when it has one; otherwise the same request from the page's context (same cookies). */
async function addToCart(page: Page, listingId: string) {
  await page.goto(`${baseUrl}/listings/${listingId}`);
  await page.getByRole('heading', { level: 1 }).waitFor();
  const button = page.getByRole('button', { name: 'Add to cart' });
  if ((await button.count()) > 0) {
    await button.click();
    await page.getByRole('link', { name: 'View cart' }).waitFor();
    return;
  }
  const r = await page.request.post(`${baseUrl}/api/cart/items`, { data: { listingId, quantity: 1 }, headers: { Origin: baseUrl } });
  expect(r.status(), await r.text()).toBe(201);
}

async function signInAs(page: Page, email: string) {
  await b.context.clearCookies();
  await signInThroughUi(page, baseUrl, email, PASSWORD);
  await page.waitForURL(/\/account/);
}

describe('checkout in the browser', () => {
  it('when a buyer pays for items from two sellers with the test card, then the order shows, both sellers see their part and the mails arrive', async () => {
    const { page } = b;
    const [first, second] = await twoListingsOfTwoSellers(page);

    // Signed out: the first item goes into this browser's anonymous cart, which merges at sign-in.
    await addToCart(page, first.id);
    await page.goto(`${baseUrl}/cart`);
    await page.getByRole('region', { name: first.sellerName }).waitFor();
    await page.getByRole('link', { name: 'Sign in to check out' }).waitFor();
    await shot('checkout-cart-anonymous.png');

    await signInThroughUi(page, baseUrl, BUYER, PASSWORD);
    await page.waitForURL(/\/account/);
    await addToCart(page, second.id);

    await page.goto(`${baseUrl}/cart?ship=US`);
    const groupA = page.getByRole('region', { name: first.sellerName });
    const groupB = page.getByRole('region', { name: second.sellerName });
    await groupA.waitFor();
    await groupB.waitFor();
    expect(await groupA.getByRole('link', { name: first.title }).count()).toBe(1);
    expect(await groupB.getByRole('link', { name: second.title }).count()).toBe(1);
    // The total on screen is the server's, in cents.
    const cart = (await (await page.request.get(`${baseUrl}/api/cart?country=US`)).json()) as CartReply;
    expect(cart.groups).toHaveLength(2);
    expect(cart.canCheckout).toBe(true);
    expect(await page.getByTestId('cart-total').innerText()).toBe(usd(cart.totalCents));
    await shot('checkout-cart.png');

    // The stand-in's hosted payment page, paid with the test card.
    await page.getByRole('button', { name: 'Check out' }).click();
    await page.waitForURL((u) => u.pathname.startsWith('/pay/'));
    // The stand-in prints "25.65 USD": the same amount in its own format.
    expect(await page.locator('#amount-due').innerText()).toBe(`${(cart.totalCents / 100).toFixed(2)} USD`);
    // Shipping: the page asks where to, in the one country the shipping was priced for.
    await page.getByLabel('Full name').fill('Ada Fenner');
    await page.getByLabel('Street address').fill('7 Tannery Row');
    await page.getByLabel('City').fill('Hollin Ford');
    await page.getByLabel('State, province or region').fill('OH');
    await page.getByLabel('Postal code').fill('45999');
    expect(await page.locator('#shipping-country').inputValue()).toBe('US');
    await page.locator('#card-number').fill('4242 4242 4242 4242');
    await page.locator('#card-expiry').fill('12 / 34');
    await page.locator('#card-cvc').fill('123');
    await shot('checkout-payment-page.png');
    await page.getByRole('button', { name: 'Pay' }).click();

    // Back on the order page, which waits for the payment webhook.
    await page.waitForURL((u) => u.origin === baseUrl && /^\/orders\/[0-9a-f-]{36}$/.test(u.pathname));
    const orderId = new URL(page.url()).pathname.split('/').at(-1)!;
    await page.getByText('Thank you: your payment is in').waitFor({ timeout: 20_000 });
    await page.getByRole('heading', { name: `Order ${ref(orderId)}` }).waitFor();
    for (const name of [first.sellerName, second.sellerName]) {
      const part = page.getByRole('region', { name });
      const current = part.locator('li[aria-current="step"]');
      expect(await current.getAttribute('data-step')).toBe('paid');
    }
    expect(await page.getByTestId('order-total').innerText()).toBe(usd(cart.totalCents));
    await page.getByText('7 Tannery Row').waitFor();
    await page.getByText('Hollin Ford, OH 45999').waitFor();
    await shot('checkout-order.png');

    const order = ((await (await page.request.get(`${baseUrl}/api/orders/${orderId}`)).json()) as { order: OrderDto }).order;
    expect(order.state).toBe('paid');
    expect(order.subOrders).toHaveLength(2);
    // The bought items left the cart.
    await page.goto(`${baseUrl}/cart`);
    await page.getByRole('heading', { name: 'Your cart is empty' }).waitFor();

    // The mails: the buyer's confirmation and each seller's order to ship, each with its own link.
    const buyerMail = await waitForMail(BUYER, (m) => m.text.includes(`/orders/${orderId}`));
    expect(buyerMail.subject).toBe(`Drabyard order confirmed: ${usd(cart.totalCents)}`);
    for (const s of order.subOrders) {
      const mail = await waitForMail(SELLERS[s.seller.name], (m) => m.text.includes(`/seller/orders/${s.id}`));
      expect(mail.subject).toContain('New Drabyard order');
    }

    // First seller: the sub-order is listed, opened, and shipped with carrier and tracking.
    const subA = order.subOrders.find((s) => s.seller.name === first.sellerName)!;
    await signInAs(page, SELLERS[first.sellerName]);
    await page.goto(`${baseUrl}/seller/orders`);
    await page.getByRole('link', { name: `Open order ${ref(orderId)}` }).click();
    await page.waitForURL(`${baseUrl}/seller/orders/${subA.id}`);
    await page.getByRole('heading', { name: `Order ${ref(orderId)}` }).waitFor();
    await page.getByText(first.title).waitFor();
    await shot('checkout-seller-order.png');
    await page.getByLabel('Carrier').fill('UPS');
    await page.getByLabel('Tracking number').fill('1Z 999 AA1 0123 4567 84');
    await page.getByRole('button', { name: 'Mark as shipped' }).click();
    await page.getByRole('button', { name: 'Mark as delivered' }).waitFor();
    await shot('checkout-seller-shipped.png');
    const shippedMail = await waitForMail(BUYER, (m) => m.subject.includes('on their way') && m.text.includes(`/orders/${orderId}`));
    expect(shippedMail.text).toContain('1Z 999 AA1 0123 4567 84');

    // Second seller: sees their own sub-order only, then sets up payouts on the stand-in's onboarding page.
    const subB = order.subOrders.find((s) => s.seller.name === second.sellerName)!;
    await signInAs(page, SELLERS[second.sellerName]);
    await page.goto(`${baseUrl}/seller/orders?state=paid`);
    const row = page.locator(`tr[data-sub-order-id="${subB.id}"]`);
    await row.waitFor();
    expect(await page.locator(`tr[data-sub-order-id="${subA.id}"]`).count()).toBe(0);
    expect((await row.innerText()).toLowerCase()).toContain('to ship');
    await shot('checkout-seller2-orders.png');

    await page.goto(`${baseUrl}/seller/payouts`);
    await page.getByRole('table', { name: /Payout statement for/ }).waitFor();
    expect(await page.getByRole('table', { name: /Payout statement for/ }).innerText()).toContain(ref(orderId));
    const setUp = page.getByRole('button', { name: /payout setup|Set up payouts/ });
    if ((await setUp.count()) > 0) {
      await setUp.click();
      await page.getByRole('button', { name: 'Complete onboarding' }).click();
      await page.waitForURL((u) => u.origin === baseUrl && u.pathname === '/seller/payouts');
      await page.getByText('Payouts on').waitFor({ timeout: 15_000 });
    }
    await shot('checkout-seller2-payouts.png');

    expect(b.errors).toEqual([]);
  });
});
