import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { DEMO_KEYS } from '../../server/db/seed/catalog-data';
import { openBrowser, SCREENSHOTS } from './browser';

const baseUrl = inject('baseUrl');
let b: Awaited<ReturnType<typeof openBrowser>>;

const shot = (name: string, fullPage = true) => b.page.screenshot({ path: path.join(SCREENSHOTS, name), fullPage });

beforeAll(async () => {
  mkdirSync(SCREENSHOTS, { recursive: true });
  b = await openBrowser();
});
afterAll(async () => {
  await b?.close();
});

describe('search in the browser', () => {
  it('when a restorer types a superseded number in the header, picks the suggestion, narrows by condition and opens a result, then the listing under the replacement number opens', async () => {
    const { page } = b;
    await page.goto(`${baseUrl}/`);

    // Typed loosely, as people do: lower case, no hyphen.
    const box = page.getByRole('combobox', { name: 'Search parts and numbers' });
    await box.click();
    await box.pressSequentially(DEMO_KEYS.supersededNumber.toLowerCase().replace('-', ''), { delay: 40 });
    const listbox = page.getByRole('listbox', { name: 'Suggestions' });
    const suggestion = listbox.getByRole('option', { name: new RegExp(`^${DEMO_KEYS.supersededNumber}`) });
    await suggestion.waitFor();
    await shot('search-suggestions.png', false);

    // Keyboard: down the list to the superseded number, Enter picks it.
    const options = await listbox.getByRole('option').allInnerTexts();
    const index = options.findIndex((t) => t.startsWith(DEMO_KEYS.supersededNumber));
    for (let i = 0; i <= index; i++) await page.keyboard.press('ArrowDown');
    expect(await suggestion.getAttribute('aria-selected')).toBe('true');
    await page.keyboard.press('Enter');
    await page.waitForURL((u) => u.pathname === '/search' && u.searchParams.get('q') === DEMO_KEYS.supersededNumber);

    const results = page.getByRole('list', { name: 'Results' });
    await results.waitFor();
    // Listings found through the replacement number say so.
    const note = `Listed under replacement number ${DEMO_KEYS.replacementNumber}, two-way interchangeable`;
    await results.getByText(note).first().waitFor();
    await shot('search-results.png');

    // Narrow by condition: rebuilt originals (seeded on the replacement number only).
    const filters = page.getByRole('complementary', { name: 'Filters' });
    const rebuilt = filters.getByRole('checkbox', { name: /Rebuilt/ });
    // The box follows the URL, which changes a moment after the click: click, then wait for the URL.
    await rebuilt.click();
    await page.waitForURL(/condition=rebuilt/);
    await page.waitForURL((u) => u.searchParams.getAll('condition').join() === 'rebuilt');
    await page.getByRole('list', { name: 'Active filters' }).getByRole('button', { name: /Condition: Rebuilt/ }).waitFor();
    await page.waitForFunction(() => !document.querySelector('[aria-busy="true"]'));
    const cards = results.getByRole('article');
    const count = await cards.count();
    expect(count).toBeGreaterThan(0);
    for (let i = 0; i < count; i++) {
      const text = await cards.nth(i).innerText();
      // innerText follows CSS: the condition badge is set in capitals.
      expect(text.toLowerCase()).toContain('rebuilt original');
      expect(text).toContain(note);
    }
    await shot('search-narrowed.png');

    // Back restores the unfiltered results; Forward the narrowed ones.
    await page.goBack();
    await page.waitForURL((u) => u.searchParams.getAll('condition').length === 0);
    expect(await rebuilt.isChecked()).toBe(false);
    await page.goForward();
    await page.waitForURL((u) => u.searchParams.get('condition') === 'rebuilt');
    await filters.getByRole('checkbox', { name: /Rebuilt/, checked: true }).waitFor();

    // Open the first result.
    const first = cards.first().getByRole('link');
    const title = (await first.innerText()).trim();
    await first.click();
    await page.waitForURL(/\/listings\//);
    await page.getByRole('heading', { level: 1, name: title }).waitFor();

    expect(b.errors).toEqual([]);
  });

  it('when the search page is opened on a phone, then the filters fold away behind a toggle', async () => {
    const phone = await openBrowser();
    try {
      const { page } = phone;
      await page.setViewportSize({ width: 390, height: 844 });
      await page.goto(`${baseUrl}/search?q=${encodeURIComponent(DEMO_KEYS.supersededNumber)}`);
      await page.getByRole('list', { name: 'Results' }).waitFor();
      const toggle = page.getByRole('button', { name: /Show filters/ });
      expect(await toggle.getAttribute('aria-expanded')).toBe('false');
      expect(await page.getByRole('complementary', { name: 'Filters' }).getByRole('checkbox').first().isVisible()).toBe(false);
      await page.screenshot({ path: path.join(SCREENSHOTS, 'search-mobile.png'), fullPage: true });
      await toggle.click();
      await page.getByRole('complementary', { name: 'Filters' }).getByRole('checkbox').first().waitFor();
      await page.screenshot({ path: path.join(SCREENSHOTS, 'search-mobile-filters.png'), fullPage: false });

      // The header box on a phone, with its suggestions.
      const box = page.getByRole('combobox', { name: 'Search parts and numbers' });
      await box.fill('');
      await box.pressSequentially('master cyl', { delay: 30 });
      await page.getByRole('listbox', { name: 'Suggestions' }).getByRole('option').first().waitFor();
      await page.screenshot({ path: path.join(SCREENSHOTS, 'search-mobile-suggestions.png'), fullPage: false });
      expect(phone.errors).toEqual([]);
    } finally {
      await phone.close();
    }
  });
});
