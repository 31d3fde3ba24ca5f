import { AxeBuilder } from '@axe-core/playwright';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_LOGINS } from '@/db/seed/demo-logins.mjs';
import { openBrowser, signIn } from '../support/browser';

/**
 * The main pages in Chromium under the app's real headers: nothing the content security policy
 * blocks (a blocked script or style would break the page), and no serious or critical
 * accessibility violation found by axe. Then signing in with the keyboard alone.
 */
const PAGES_BY_ROLE: Record<string, string[]> = {
  signedOut: ['/', '/sign-in', '/sign-up', '/forgot-password', '/verify'],
  seller: ['/dashboard', '/machines', '/machines/new', '/account'],
  inspector: ['/dashboard', '/jobs'],
  buyer: ['/dashboard', '/reports', '/purchases'],
  dealer: ['/dashboard', '/compare'],
  admin: ['/dashboard', '/inspections', '/admin/people', '/admin/orders', '/admin/audit'],
};

/** Records every content security policy violation the page reports, from the first script on. */
async function watchPolicy(page: Page) {
  const violations: string[] = [];
  await page.exposeFunction('__reportPolicyViolation', (text: string) => violations.push(text));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (event) => {
      (window as unknown as { __reportPolicyViolation: (t: string) => void }).__reportPolicyViolation(
        `${event.effectiveDirective} blocked ${event.blockedURI || 'inline'} (${event.sourceFile}:${event.lineNumber})`,
      );
    });
  });
  page.on('console', (message) => {
    if (message.type() === 'error' && /Content Security Policy/i.test(message.text())) violations.push(message.text());
  });
  return violations;
}

async function seriousViolations(page: Page) {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.impact} ${v.id}: ${v.help} — ${v.nodes.slice(0, 3).map((n) => n.target.join(' ')).join(', ')}`);
}

describe('the main pages in the browser', () => {
  for (const [role, addresses] of Object.entries(PAGES_BY_ROLE)) {
    describe(role === 'signedOut' ? 'signed out' : `as a ${role}`, () => {
      let context: BrowserContext;
      let page: Page;
      let violations: string[];

      beforeAll(async () => {
        context = await openBrowser();
        page = await context.newPage();
        violations = await watchPolicy(page);
        if (role !== 'signedOut') {
          const account = DEMO_LOGINS.accounts.find((a) => a.role === role)!;
          await signIn(page, account.email, DEMO_LOGINS.password);
        }
      });
      afterAll(async () => {
        await context?.close();
      });

      for (const address of addresses) {
        it(`${address}: works under the content security policy, with no serious accessibility violation`, async () => {
          violations.length = 0;
          const response = await page.goto(address, { waitUntil: 'networkidle' });
          expect(response?.status(), address).toBeLessThan(400);
          expect(response?.headers()['content-security-policy']).toContain("frame-ancestors 'none'");
          // Hydrated: the app's scripts ran (a blocked script would leave the page without React).
          await page.waitForFunction(() => Boolean((window as unknown as { next?: unknown }).next));
          expect(violations).toEqual([]);
          expect(await seriousViolations(page)).toEqual([]);
        });
      }
    });
  }
});

describe('signing in with the keyboard alone', () => {
  let context: BrowserContext;
  beforeAll(async () => {
    context = await openBrowser();
  });
  afterAll(async () => {
    await context?.close();
  });

  it('reaches the e-mail and password fields and the button by Tab, submits with Enter, and lands on the overview', async () => {
    const page = await context.newPage();
    const account = DEMO_LOGINS.accounts.find((a) => a.role === 'seller')!;
    await page.goto('/sign-in', { waitUntil: 'networkidle' });
    const focused = () => page.evaluate(() => {
      const el = document.activeElement as HTMLElement | null;
      return el ? { tag: el.tagName.toLowerCase(), name: el.getAttribute('name'), type: el.getAttribute('type'), text: el.textContent?.trim() ?? '' } : null;
    });
    // Tab from the top of the page until the e-mail field has focus; every stop on the way is visible.
    for (let presses = 0; presses < 30; presses += 1) {
      await page.keyboard.press('Tab');
      const now = await focused();
      if (now?.type === 'email' || now?.name === 'email') break;
    }
    expect(await focused()).toMatchObject({ tag: 'input' });
    expect(await page.evaluate(() => (document.activeElement as HTMLInputElement).type)).toBe('email');
    const outline = await page.evaluate(() => getComputedStyle(document.activeElement!).outlineStyle + getComputedStyle(document.activeElement!).boxShadow);
    expect(outline, 'the focused field shows a focus ring').not.toBe('nonenone');
    await page.keyboard.type(account.email);
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => (document.activeElement as HTMLInputElement).type)).toBe('password');
    await page.keyboard.type(DEMO_LOGINS.password);
    // On to the button (past a "show password" or "forgot" link if there is one), then Enter.
    for (let presses = 0; presses < 5; presses += 1) {
      const now = await focused();
      if (now?.tag === 'button' && /sign in/i.test(now.text)) break;
      await page.keyboard.press('Tab');
    }
    expect(await focused()).toMatchObject({ tag: 'button', text: expect.stringMatching(/sign in/i) });
    await page.keyboard.press('Enter');
    await page.waitForURL('**/dashboard');
    await page.getByRole('heading', { level: 1 }).waitFor();
    await page.close();
  });
});
