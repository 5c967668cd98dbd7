import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { linkFrom, waitForMail } from '../factories/mail';
import { openBrowser, SCREENSHOTS, signInThroughUi } from './browser';

const baseUrl = inject('baseUrl');
let b: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  mkdirSync(SCREENSHOTS, { recursive: true });
  b = await openBrowser();
});
afterAll(async () => {
  await b?.close();
});

describe('accounts in the browser', () => {
  it('when someone registers, verifies from the mail, signs in and out, then an admin approves their seller application and they see the seller role', async () => {
    const { page } = b;
    const email = `e2e-${Date.now()}@example.test`;
    const password = 'a-long-e2e-password';
    await page.goto(`${baseUrl}/register`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Display name').fill('Browser Restorer');
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByText('Check your e-mail to verify your address').waitFor();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'auth-registered.png') });

    const mail = await waitForMail(email, (m) => m.subject.includes('Confirm'));
    const link = new URL(linkFrom(mail, 'verify-email'));
    await page.goto(`${baseUrl}${link.pathname}${link.search}`);
    await page.getByText('Your e-mail address is verified').waitFor();

    // sign out, then sign in again through the form
    await page.getByRole('button', { name: /account menu|Browser Restorer/i }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).or(page.getByRole('button', { name: 'Sign out' })).first().click();
    await page.getByRole('link', { name: 'Sign in' }).first().waitFor();
    await signInThroughUi(page, baseUrl, email, password);
    await page.waitForURL(/\/account/);

    await page.goto(`${baseUrl}/account/seller-application`);
    await page.getByLabel('Business name').fill('Browser Salvage Co');
    await page.getByLabel('Location').fill('Testville, US');
    await page.getByLabel('What you sell').fill('Used original clamps, clips and brake hardware');
    await page.getByRole('button', { name: 'Apply to sell' }).click();
    await page.getByText(/pending|waiting/i).first().waitFor();

    // the administrator approves it in a second browser
    const admin = await openBrowser();
    try {
      await signInThroughUi(admin.page, baseUrl, 'admin@drabyard.test', 'drabyard-demo');
      await admin.page.waitForURL(/\/account/);
      await admin.page.goto(`${baseUrl}/admin/seller-applications`);
      const row = admin.page.getByRole('row', { name: /Browser Salvage Co/ });
      await row.getByRole('button', { name: 'Approve' }).click();
      await row.waitFor({ state: 'detached' });
      await admin.page.screenshot({ path: path.join(SCREENSHOTS, 'admin-seller-applications.png') });
    } finally {
      await admin.close();
    }

    await page.goto(`${baseUrl}/account`);
    await page.getByText('seller', { exact: false }).first().waitFor();
    await page.getByRole('link', { name: 'Seller desk', exact: true }).waitFor();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'account-seller.png') });
    expect(b.errors).toEqual([]);
  });
});
