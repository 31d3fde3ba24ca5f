import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { DEMO_LOGINS } from '@/db/seed/demo-logins.mjs';
import { ROLE_LABELS } from '@/lib/roles';
import { openBrowser, screenshot, signIn } from '../support/browser';

describe('the application shell', () => {
  let browser: BrowserContext;
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows the landing page to signed-out visitors', async () => {
    const page = await browser.newPage();
    const response = await page.goto('/');
    expect(response?.status()).toBe(200);
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toContain('used lathe');
    await screenshot(page, 'landing');
    await page.close();
  });

  it('answers an unknown address with the product’s own 404 page', async () => {
    const page = await browser.newPage();
    const response = await page.goto('/no-such-page/at-all');
    expect(response?.status()).toBe(404);
    await page.getByText('This page is off the bed.').waitFor();
    await screenshot(page, 'not-found');
    await page.close();
  });

  it('answers a report that does not exist with status 404, signed in', async () => {
    const dealer = DEMO_LOGINS.accounts.find((a) => a.role === 'dealer')!;
    const context = await openBrowser();
    const page = await context.newPage();
    await signIn(page, dealer.email, DEMO_LOGINS.password);
    const response = await page.goto('/reports/999999999');
    expect(response?.status()).toBe(404);
    await page.getByText('This page is off the bed.').waitFor();
    await context.close();
  });

  it('sends a signed-out visitor of the overview to sign-in', async () => {
    const page = await browser.newPage();
    await page.goto('/dashboard');
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await page.close();
  });

  it('refuses a wrong password with one message for every case', async () => {
    const page = await browser.newPage();
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(DEMO_LOGINS.accounts[0]!.email);
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('That e-mail and password do not match an active account.').waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await page.close();
  });

  for (const role of ['seller', 'inspector', 'buyer', 'dealer', 'admin'] as const) {
    it(`signs in a ${role} and shows the ${role}'s overview, then signs out`, async () => {
      const account = DEMO_LOGINS.accounts.find((a) => a.role === role)!;
      const context = await openBrowser({ width: 390, height: 844 });
      const page = await context.newPage();
      await signIn(page, account.email, DEMO_LOGINS.password);
      await page.getByRole('banner').getByText(ROLE_LABELS[role], { exact: false }).waitFor();
      await page.getByRole('heading', { level: 1 }).waitFor();
      await screenshot(page, `overview-${role}`);
      await page.getByRole('button', { name: 'Sign out' }).click();
      await page.waitForURL((url) => url.pathname === '/');
      await page.goto('/dashboard');
      expect(new URL(page.url()).pathname).toBe('/sign-in');
      await context.close();
    });
  }
});
