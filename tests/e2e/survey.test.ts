import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_LOGINS } from '@/db/seed/demo-logins.mjs';
import { openBrowser, screenshot, signIn } from '../support/browser';
import { fillEverySectionAndSubmit, savedSurvey } from '../support/survey-steps';

// Petra has two booked visits in the demo data; the cross-role journey works with its own inspection.
const INSPECTOR = 'petra.lindqvist@waygrade.example';

describe('the inspector’s survey on a phone', () => {
  let context: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    context = await openBrowser({ width: 390, height: 844 });
    page = await context.newPage();
    // The first visit to a page may wait for it to be built when the app runs in development mode.
    page.setDefaultNavigationTimeout(90_000);
    expect(DEMO_LOGINS.accounts.some((a) => a.email === INSPECTOR)).toBe(true);
    await signIn(page, INSPECTOR, DEMO_LOGINS.password);
  });

  afterAll(async () => {
    await context?.close();
  });

  it('fills every section, uploads a photo, keeps an edit through a lost signal and submits', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My jobs' }).click();
    await page.getByRole('heading', { level: 1, name: 'My jobs' }).waitFor();
    await screenshot(page, 'survey-00-my-jobs');

    const booked = page.getByRole('link', { name: /Open the job/ }).first();
    expect(await booked.count(), 'the seeded inspector has a booked job').toBeGreaterThan(0);
    await booked.click();
    await page.waitForURL(/\/jobs\/\d+$/);
    const inspectionId = new URL(page.url()).pathname.split('/').pop()!;
    await screenshot(page, 'survey-01-job');
    await page.getByRole('button', { name: 'I am on site — start the visit' }).click();
    await page.waitForURL(`**/jobs/${inspectionId}/survey`);

    await fillEverySectionAndSubmit(page, context, inspectionId);

    const submitted = await savedSurvey(page, inspectionId);
    expect(submitted.data.status).toBe('in_review');
    expect(submitted.data.submittedAt).not.toBeNull();
    expect(submitted.data.data.testCuts?.twoCollar?.diameterNearTailstock).toEqual({ value: 25.03, unit: 'mm' });
  }, 240_000);
});
