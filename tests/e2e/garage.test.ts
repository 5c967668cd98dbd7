import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { DEMO_KEYS } from '../../server/db/seed/catalog-data';
import { openBrowser, SCREENSHOTS, signInThroughUi } from './browser';

const baseUrl = inject('baseUrl');
let b: Awaited<ReturnType<typeof openBrowser>>;
const shot = (name: string) => b.page.screenshot({ path: path.join(SCREENSHOTS, name), fullPage: true });

// Three brake parts of the demo KV-4 master cylinder that have live demo listings (server/db/seed/listings.ts).
const BRAKE_LINES = [/^Callout 2: Cap, filler, master cylinder/, /^Callout 3: Gasket, master cylinder filler cap/, /^Callout 4: Boot, master cylinder push rod/];

beforeAll(async () => {
  mkdirSync(SCREENSHOTS, { recursive: true });
  b = await openBrowser();
});
afterAll(async () => {
  await b?.close();
});

describe('garage in the browser', () => {
  it('when a restorer adds a vehicle, marks three brake parts replace, builds the plan and puts it in the cart, then the cart holds them', async () => {
    const { page } = b;
    await signInThroughUi(page, baseUrl, 'buyer@drabyard.test', 'drabyard-demo');
    await page.waitForURL(/\/account/);

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Garage' }).click();
    await page.getByRole('heading', { name: 'Your garage' }).waitFor();
    const addButton = page.getByRole('button', { name: 'Add a vehicle' });
    const form = page.getByRole('form', { name: 'Add a vehicle' });
    await addButton.or(form).first().waitFor();
    if (await addButton.isVisible()) await addButton.click();

    const serial = `KV4-${DEMO_KEYS.lastEarlySerial}`;
    await form.getByLabel('Vehicle model').selectOption(DEMO_KEYS.vehicle1Slug);
    await form.getByLabel('Serial number').fill(serial);
    await form.getByLabel('Build date').fill('1953-06');
    await form.getByLabel('Nickname').fill('Browser test truck');
    await form.getByRole('radio', { name: /Usable driver/ }).check();
    await shot('garage-add-vehicle.png');
    await form.getByRole('button', { name: 'Add vehicle' }).click();

    await page.getByRole('heading', { name: 'Browser test truck', level: 1 }).waitFor();
    await page.getByRole('progressbar', { name: 'Teardown progress of Browser test truck' }).waitFor();
    await shot('garage-vehicle.png');

    await page.getByRole('region', { name: 'Brakes' }).getByRole('link', { name: 'Master cylinder', exact: true }).click();
    await page.getByRole('heading', { name: 'Master cylinder', level: 1 }).waitFor();
    // An early serial: the late master cylinder is folded away as not applying.
    await page.getByText(/Not on this vehicle \(\d+\)/).waitFor();

    for (const name of BRAKE_LINES) {
      const item = page.getByRole('listitem', { name });
      const saved = page.waitForResponse((r) => r.url().includes('/teardown/') && r.request().method() === 'PUT' && r.ok());
      // The radio itself is visually hidden inside its styled label: click what a person sees.
      await item.locator('label').filter({ hasText: /^Replace$/ }).click();
      await saved;
      expect(await item.getByRole('radio', { name: 'Replace' }).isChecked()).toBe(true);
      await item.getByText(/^Needed 1 = 1 per assembly − 0 usable on hand$/).waitFor();
      expect(await item.getByText(/Brake work: have it inspected by a qualified mechanic/).count()).toBe(1);
    }
    const asmBar = page.getByRole('progressbar', { name: 'Progress of Master cylinder' });
    await expect.poll(() => asmBar.getAttribute('aria-valuetext')).toMatch(/^3 of \d+ lines inspected/);
    await shot('garage-checklist.png');
    await page.getByRole('listitem', { name: BRAKE_LINES[0] }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'garage-checklist-detail.png') });

    await page.getByRole('link', { name: 'Needs list' }).first().click();
    await page.getByRole('heading', { name: 'Needs list', level: 1 }).waitFor();
    const rows = page.getByRole('table', { name: 'Needs list' }).locator('tbody tr');
    await expect.poll(() => rows.count()).toBe(3);
    expect(await page.getByRole('link', { name: 'CSV' }).getAttribute('download')).not.toBeNull();
    await shot('garage-needs.png');
    await page.emulateMedia({ media: 'print' });
    await shot('garage-needs-print.png');
    expect(await page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false);
    await page.emulateMedia({ media: 'screen' });

    await page.getByRole('link', { name: 'Sourcing plan' }).click();
    await page.getByRole('heading', { name: 'Sourcing plan', level: 1 }).waitFor();
    await page.getByLabel('Ship to').selectOption('US');
    await page.getByRole('button', { name: 'Build the plan' }).click();
    const totals = page.getByRole('region', { name: 'Plan totals' });
    await totals.waitFor();
    expect(await page.getByTestId('plan-gap').innerText()).toMatch(/Lower bound \$[\d,.]+; gap \$[\d,.]+ \([\d.]+%\)/);
    expect(await page.getByRole('heading', { name: /Cannot be filled/ }).count()).toBe(0);
    await shot('garage-plan.png');

    await page.getByRole('button', { name: 'Put the plan in the cart' }).click();
    await page.getByText(/^Added 3 units from 3 listings to your cart$/).waitFor();
    await shot('garage-plan-in-cart.png');

    const cart = (await (await page.request.get(`${baseUrl}/api/cart`)).json()) as { groups: Array<{ items: Array<{ title: string; quantity: number }> }> };
    const items = cart.groups.flatMap((g) => g.items);
    expect(items.length).toBeGreaterThanOrEqual(3);
    expect(items.reduce((a, i) => a + i.quantity, 0)).toBeGreaterThanOrEqual(3);

    // The cart page shows what the plan put there (its layout is the cart's own; only the titles are relied on).
    await page.getByRole('link', { name: 'Go to the cart' }).click();
    await page.waitForURL(/\/cart/);
    for (const item of items) await page.getByText(item.title).first().waitFor();
    await shot('garage-cart.png');
    expect(b.errors).toEqual([]);
  });
  it('when a restorer watches a part number with a condition and a top price, then the alert is listed and the notices page opens', async () => {
    const { page } = b;
    await page.goto(`${baseUrl}/garage/alerts`);
    const form = page.getByRole('form', { name: 'Watch a part' });
    await form.getByLabel('Part number').fill(DEMO_KEYS.supersededNumber);
    await form.getByLabel('Condition').selectOption('originals_only');
    await form.getByLabel('Top price ($)').fill('120');
    await form.getByRole('button', { name: 'Watch' }).click();
    const alerts = page.getByRole('list', { name: 'Your wanted alerts' });
    await alerts.getByText('Originals only · up to $120.00 · 0 matches so far').waitFor();
    await shot('garage-alerts.png');

    await page.getByRole('navigation', { name: 'Garage' }).getByRole('link', { name: /Notices/ }).click();
    await page.getByRole('heading', { name: 'Notices', level: 1 }).waitFor();
    await page.getByText(/No notices yet|All read|unread/).first().waitFor();
    await shot('garage-notices.png');
    expect(b.errors).toEqual([]);
  });
});
