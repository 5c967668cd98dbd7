import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { DEMO_KEYS } from '../../server/db/seed/catalog-data';
import { openBrowser, SCREENSHOTS, signInThroughUi } from './browser';

const baseUrl = inject('baseUrl');
let b: Awaited<ReturnType<typeof openBrowser>>;

// Visible names from the fictional demo catalog (server/db/seed/catalog-*.ts).
const VEHICLE = /Kestrelvale KV-4/;
const EARLY_MASTER = 'Master cylinder assembly, single circuit, 1 in bore, early';
const shot = (name: string) => b.page.screenshot({ path: path.join(SCREENSHOTS, name), fullPage: true });

beforeAll(async () => {
  mkdirSync(SCREENSHOTS, { recursive: true });
  b = await openBrowser();
});
afterAll(async () => {
  await b?.close();
});

describe('catalog in the browser', () => {
  it('when a restorer opens a vehicle, the master cylinder, filters by serial and selects a callout, then the part page shows its supersession chain', async () => {
    const { page } = b;
    await page.goto(`${baseUrl}/catalog`);
    await page.getByRole('link', { name: VEHICLE }).click();
    await page.getByRole('heading', { name: 'Brakes' }).waitFor();
    await shot('catalog-vehicle.png');

    await page.getByRole('link', { name: 'Master cylinder', exact: true }).click();
    const diagram = page.getByRole('group', { name: 'Exploded diagram: Master cylinder' });
    await diagram.waitFor();
    await shot('catalog-assembly.png');

    // An early vehicle: only the early master cylinder applies, the late one folds away with its reason.
    await page.getByLabel('Vehicle serial number').fill(String(DEMO_KEYS.lastEarlySerial));
    await page.getByRole('button', { name: 'Show what applies' }).click();
    await page.getByText(`Showing what applies to serial ${DEMO_KEYS.lastEarlySerial}`).waitFor();
    expect(new URL(page.url()).searchParams.get('serial')).toBe(String(DEMO_KEYS.lastEarlySerial));
    await page.getByText(/Not on this vehicle \(\d+\)/).waitFor();

    // Keyboard: into the diagram, Tab to the first callout, Enter selects it.
    await diagram.focus();
    await page.keyboard.press('Tab');
    const callout1 = page.getByRole('button', { name: /^Callout 1: / });
    expect(await callout1.getAttribute('aria-label')).toBe(`Callout 1: ${EARLY_MASTER}`);
    await page.keyboard.press('Enter');
    expect(await callout1.getAttribute('aria-pressed')).toBe('true');
    const row = page.locator('tbody tr[data-callout="1"]');
    expect(await row.getAttribute('data-state')).toBe('selected');
    await page.getByRole('button', { name: 'Zoom in' }).click();
    await shot('catalog-assembly-selected.png');

    await page.getByRole('link', { name: `Open the part page: ${EARLY_MASTER}` }).click();
    await page.getByRole('heading', { name: EARLY_MASTER }).waitFor();
    const steps = page.getByRole('list', { name: 'Supersession steps' });
    await steps.waitFor();
    const text = await steps.innerText();
    expect(text).toContain(`is replaced by ${DEMO_KEYS.replacementNumber}`);
    expect(text).toContain('two-way');
    await page.getByRole('complementary', { name: 'Safety cautions' }).waitFor();
    await page.getByRole('button', { name: `Copy ${DEMO_KEYS.supersededNumber}` }).waitFor();
    await shot('catalog-part.png');

    // The other shapes of a chain: a kit replacing one part, and a four-step chain with a one-way step.
    await page.getByRole('link', { name: VEHICLE }).first().click();
    await page.getByRole('link', { name: 'Rear wheel cylinder', exact: true }).click();
    await page.getByRole('link', { name: 'Cylinder, wheel, rear, 7/8 in bore, early' }).click();
    await page.getByText(/^Kit of \d+, replaces /).waitFor();
    await shot('catalog-part-kit.png');

    await page.goto(`${baseUrl}/catalog/${DEMO_KEYS.vehicle1Slug}`);
    await page.getByRole('link', { name: 'Front wheel brake', exact: true }).click();
    await page.getByRole('link', { name: 'Shoe, brake, with lining, front or rear' }).first().click();
    expect(await page.getByRole('list', { name: 'Supersession steps' }).innerText()).toContain('one-way');
    await shot('catalog-part-chain.png');

    // A hardware-standard part shows the standard's figures with their source.
    await page.goto(`${baseUrl}/catalog/${DEMO_KEYS.vehicle1Slug}`);
    await page.getByRole('link', { name: 'Brake pedal and linkage', exact: true }).click();
    await page.getByRole('link', { name: 'Pin, cotter, 3/32 x 3/4' }).click();
    await page.getByRole('heading', { name: 'From the standard' }).waitFor();
    await shot('catalog-part-hardware.png');

    expect(b.errors).toEqual([]);
  });

  it('when an administrator finds a part by a number typed loosely, then the editor opens it; and the data-quality report shows the deliberate loop', async () => {
    const admin = await openBrowser();
    try {
      const { page } = admin;
      await signInThroughUi(page, baseUrl, 'admin@drabyard.test', 'drabyard-demo');
      await page.waitForURL(/\/account/);
      await page.goto(`${baseUrl}/admin`);
      await page.getByRole('link', { name: /Catalog editor/ }).click();
      await page.getByLabel('Part number').fill(DEMO_KEYS.lookalikeTypedAs);
      await page.getByRole('button', { name: 'Find' }).click();
      await page.getByRole('list', { name: 'Parts found' }).getByRole('link').first().click();
      await page.getByRole('form', { name: 'Part details' }).waitFor();
      await page.screenshot({ path: path.join(SCREENSHOTS, 'admin-catalog-part.png'), fullPage: true });

      await page.getByRole('link', { name: 'Assemblies and lines' }).click();
      await page.getByRole('navigation', { name: 'Assemblies' }).getByRole('link', { name: /Master cylinder$/ }).click();
      await page.getByRole('form', { name: 'Assembly details' }).waitFor();
      await page.screenshot({ path: path.join(SCREENSHOTS, 'admin-catalog-assembly.png'), fullPage: true });

      await page.getByRole('link', { name: 'Data quality' }).click();
      await page.getByText(/Supersession loop: /).first().waitFor();
      await page.screenshot({ path: path.join(SCREENSHOTS, 'admin-catalog-quality.png'), fullPage: true });
      await page.getByRole('link', { name: /^Public page of / }).first().click();
      await page.getByRole('alert').filter({ hasText: 'This chain loops back on itself' }).waitFor();
      await page.screenshot({ path: path.join(SCREENSHOTS, 'catalog-part-loop.png'), fullPage: true });
      expect(admin.errors).toEqual([]);
    } finally {
      await admin.close();
    }
  });
});
