import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { closeDatabase } from '@/db/client';
import { createAccount, type TestAccount } from '../support/accounts';
import { APP_URL, openBrowser } from '../support/browser';

// The usual open-redirect shapes (common practice, e.g. OWASP's Unvalidated Redirects and Forwards
// cheat sheet); a browser reads "\" as "/" and drops tabs and line breaks (WHATWG URL Standard).
const OFF_SITE_SHAPES = ['/\\evil.example/x', '/\t/evil.example/x', '/\\/evil.example', '/.//evil.example', '//evil.example'];

describe('the sign-in page’s callback address', () => {
  let browser: BrowserContext;
  let account: TestAccount;
  beforeAll(async () => {
    browser = await openBrowser();
    account = await createAccount('buyer');
  });
  afterAll(async () => {
    await browser?.close();
    await closeDatabase();
  });

  it.each(OFF_SITE_SHAPES)('stays on the site after signing in with callbackUrl %j', async (shape) => {
    await browser.clearCookies();
    const page = await browser.newPage();
    const offSite: string[] = [];
    page.on('request', (request) => {
      if (new URL(request.url()).host !== new URL(APP_URL).host) offSite.push(request.url());
    });
    await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(shape)}`);
    await page.getByLabel('E-mail').fill(account.email);
    await page.getByLabel('Password').fill(account.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await page.waitForLoadState('load');
    expect(new URL(page.url()).origin).toBe(new URL(APP_URL).origin);
    expect(offSite).toEqual([]);
    await page.close();
  });

  it('follows a same-site callback after signing in', async () => {
    await browser.clearCookies();
    const page = await browser.newPage();
    await page.goto(`/sign-in?callbackUrl=${encodeURIComponent('/account')}`);
    await page.getByLabel('E-mail').fill(account.email);
    await page.getByLabel('Password').fill(account.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/account');
    await page.close();
  });
});
