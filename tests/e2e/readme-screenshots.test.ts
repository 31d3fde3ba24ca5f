import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { and, asc, desc, eq } from 'drizzle-orm';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db/client';
import { inspections, reportAccessGrants, reports, surveys, users } from '@/db/schema';
import { DEMO_LOGINS } from '@/db/seed/demo-logins.mjs';
import { APP_URL, signIn } from '../support/browser';

// The five views the README shows, taken from the demo data at the sizes the README uses:
// landing, the survey on a phone, the buyer's report page, the report PDF's cover and the dealers'
// comparison table. They land in tmp/screenshots/readme/; `npm run screenshots` runs this file on a
// fresh demo database and writes optimised copies to docs/screenshots/.
const README_SHOTS_DIR = path.resolve('tmp/screenshots/readme');

const PASSWORD = DEMO_LOGINS.password;
const BUYER = 'maeve.tolland@buyers.example';
const DEALER = 'bram@quayside-machinery.example';

async function browserAt(viewport: { width: number; height: number }, deviceScaleFactor = 1): Promise<BrowserContext> {
  return chromium.launchPersistentContext(mkdtempSync(path.join(os.tmpdir(), 'waygrade-readme-')), {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    viewport,
    deviceScaleFactor,
    baseURL: APP_URL,
  });
}

/** The view as a reader would see it: fonts in, nothing still loading, no error shown. */
async function settledShot(page: Page, name: string) {
  await page.evaluate(() => document.fonts.ready);
  await page.waitForFunction(() => !document.querySelector('[aria-busy="true"]'));
  await page.waitForLoadState('networkidle');
  // Alerts in the page itself (not the framework's route announcer, which lives in a shadow root).
  const alerts = await page.evaluate(() =>
    [...document.querySelectorAll<HTMLElement>('[role="alert"]')].filter((e) => e.offsetParent !== null && e.textContent?.trim()).map((e) => e.textContent!.trim()),
  );
  expect(alerts, `an error is showing on ${name}`).toEqual([]);
  await page.screenshot({ path: path.join(README_SHOTS_DIR, `${name}.png`) });
}

describe('the README’s screenshots', () => {
  const contexts: BrowserContext[] = [];
  const open = async (viewport: { width: number; height: number }, scale = 1) => {
    const context = await browserAt(viewport, scale);
    contexts.push(context);
    const page = await context.newPage();
    page.setDefaultNavigationTimeout(90_000);
    return page;
  };

  beforeAll(() => {
    rmSync(README_SHOTS_DIR, { recursive: true, force: true });
    mkdirSync(README_SHOTS_DIR, { recursive: true });
  });

  afterAll(async () => {
    for (const context of contexts) await context.close();
  });

  it('takes the landing page', async () => {
    const page = await open({ width: 1280, height: 820 });
    await page.goto('/');
    await page.getByRole('heading', { level: 1 }).waitFor();
    await settledShot(page, 'landing');
  });

  it('takes a survey under way on a phone, with its live results', async () => {
    // A demo visit in progress whose inspector has reached the bed: the level profile shows.
    const onSite = await db
      .select({ id: inspections.id, email: users.email, data: surveys.data })
      .from(inspections)
      .innerJoin(users, eq(users.id, inspections.inspectorId))
      .innerJoin(surveys, eq(surveys.inspectionId, inspections.id))
      .where(eq(inspections.status, 'on_site'))
      .orderBy(asc(inspections.id));
    const visit = onSite.find((v) => (v.data as Record<string, unknown>).bedAndWays) ?? onSite[0];
    expect(visit, 'the demo data has a visit under way').toBeDefined();
    const section = (visit!.data as Record<string, unknown>).bedAndWays ? 'bedAndWays' : 'lubrication';
    const page = await open({ width: 390, height: 844 }, 2);
    await signIn(page, visit!.email, PASSWORD);
    await page.goto(`/jobs/${visit!.id}/survey?section=${section}`);
    await page.locator('[data-testid="section-checks"][data-state="ready"]').waitFor({ timeout: 30_000 });
    await page.locator('[data-save-state="saved"]').waitFor();
    // The readings and the level profile drawn from them rather than the cautions above.
    const live = page.getByTestId(section === 'bedAndWays' ? 'bed-live-results' : 'section-checks');
    await live.waitFor();
    await live.evaluate((element) => window.scrollTo({ top: element.getBoundingClientRect().top + window.scrollY - 330 }));
    await settledShot(page, 'survey-phone');
  });

  it('takes a bought report’s page and its PDF’s cover', async () => {
    // The latest released report, still current, bought by the demo buyer (her own demo purchases are older).
    const [latest] = await db.select({ id: reports.id }).from(reports).where(eq(reports.status, 'released')).orderBy(desc(reports.releasedAt)).limit(1);
    const [buyer] = await db.select({ id: users.id }).from(users).where(eq(users.email, BUYER));
    expect(latest && buyer, 'the demo data has a released report and the buyer').toBeTruthy();
    const held = await db.select().from(reportAccessGrants).where(and(eq(reportAccessGrants.userId, buyer!.id), eq(reportAccessGrants.reportId, latest!.id)));
    if (!held.length) await db.insert(reportAccessGrants).values({ reportId: latest!.id, userId: buyer!.id, reason: 'purchase' });
    const grant = { reportId: latest!.id };
    const page = await open({ width: 1280, height: 1100 });
    await signIn(page, BUYER, PASSWORD);
    await page.goto(`/reports/${grant!.reportId}`);
    await page.getByRole('heading', { level: 1 }).waitFor();
    await settledShot(page, 'report-page');

    const response = await page.request.get(`/api/reports/${grant!.reportId}/pdf`);
    expect(response.status()).toBe(200);
    const dir = mkdtempSync(path.join(os.tmpdir(), 'waygrade-readme-pdf-'));
    writeFileSync(path.join(dir, 'report.pdf'), await response.body());
    // The cover at 110 dpi (about 910 px wide for A4), rendered by poppler as a reader's viewer would.
    execFileSync('pdftoppm', ['-f', '1', '-l', '1', '-r', '110', '-png', '-singlefile', path.join(dir, 'report.pdf'), path.join(README_SHOTS_DIR, 'report-pdf-cover')]);
    rmSync(dir, { recursive: true, force: true });
  });

  it('takes the dealers’ comparison table', async () => {
    const page = await open({ width: 1440, height: 900 });
    await signIn(page, DEALER, PASSWORD);
    await page.goto('/compare');
    await page.locator('tbody tr[data-report-id]').first().waitFor();
    await settledShot(page, 'comparison-table');
  });
});
