import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { randomUUID } from 'node:crypto';
import { and, eq, inArray } from 'drizzle-orm';
import type { BrowserContext, Page } from 'playwright-core';
import { closeDatabase, db } from '@/db/client';
import { comparisonEntries, machines, reportAccessGrants, surveys, users } from '@/db/schema';
import { insertDraftReport, releaseDraftReport } from '@/db/queries/report-writes';
import { demoSurvey } from '@/db/seed/demo-survey';
import { seededRandom } from '@/db/seed/random';
import { scoreSurvey, SURVEY_FORMAT_VERSION } from '@/lib/scoring';
import { openBrowser, screenshot, signIn } from '../support/browser';
import { createInspection, createMachine } from '../support/workflow-fixtures';

// A dealer's day with the comparison table: filter, sort, export what the filter shows, and put
// three machines side by side. Runs on the demo data (15 released lathes).

const DEALER = 'bram@quayside-machinery.example';
const PASSWORD = 'demo-lathe-2026';
const SWING = { min: 300, max: 450 };
const GRADES = ['Good', 'Very good'];

async function waitForRows(page: Page) {
  await page.locator('tbody tr[data-report-id]').first().waitFor();
  await page.waitForFunction(() => !document.querySelector('[aria-busy="true"]'));
}

const swingsOnPage = (page: Page) =>
  page.locator('tbody tr[data-report-id] td:nth-child(4)').evaluateAll((cells) => cells.map((c) => Number(c.textContent!.replace(/[^\d]/g, ''))));

describe('the dealers’ comparison table', () => {
  let browser: BrowserContext;
  let matching: Array<{ reportId: number; swingMm: number; overallCondition: string }>;

  beforeAll(async () => {
    browser = await openBrowser({ width: 1280, height: 900 });
    const [dealer] = await db.select({ id: users.id }).from(users).where(eq(users.email, DEALER));
    matching = (await db.select().from(comparisonEntries)).filter(
      (e) => e.swingMm >= SWING.min && e.swingMm <= SWING.max && GRADES.includes(e.overallCondition),
    );
    expect(matching.length, 'the demo data has machines for this filter').toBeGreaterThanOrEqual(3);
    // The dealer has bought two of the reports, so the side-by-side page has checks to set against each other.
    const bought = matching.slice(0, 2).map((e) => e.reportId);
    const held = await db
      .select({ reportId: reportAccessGrants.reportId })
      .from(reportAccessGrants)
      .where(and(eq(reportAccessGrants.userId, dealer!.id), inArray(reportAccessGrants.reportId, bought)));
    const missing = bought.filter((id) => !held.some((h) => h.reportId === id));
    if (missing.length) await db.insert(reportAccessGrants).values(missing.map((reportId) => ({ reportId, userId: dealer!.id, reason: 'purchase' as const })));
  });

  afterAll(async () => {
    await browser?.close();
    await closeDatabase();
  });

  it('filters, sorts, exports the filtered rows as CSV and compares three machines', async () => {
    const page = await browser.newPage();
    await signIn(page, DEALER, PASSWORD);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Compare' }).click();
    await page.waitForURL('**/compare');
    await waitForRows(page);
    await screenshot(page, 'compare-all');

    // Filter: two grades and a swing range.
    const filters = page.locator('aside .hidden.lg\\:block');
    for (const grade of GRADES) {
      await filters.getByRole('group', { name: 'Overall condition' }).getByLabel(grade, { exact: true }).click();
      await page.waitForURL((url) => (url.searchParams.get('condition') ?? '').includes(grade));
    }
    await filters.getByLabel('Swing over bed from').fill(String(SWING.min));
    await filters.getByLabel('Swing over bed to').fill(String(SWING.max));
    await filters.getByRole('button', { name: 'Apply filters' }).click();
    await page.waitForURL((url) => url.searchParams.get('swingMin') === String(SWING.min) && url.searchParams.get('swingMax') === String(SWING.max));
    await waitForRows(page);
    await page.getByRole('status').filter({ hasText: `${matching.length} machines match` }).waitFor();

    // Sort by swing, smallest first, then largest first.
    await page.getByRole('button', { name: 'Swing', exact: true }).click();
    await page.waitForURL((url) => url.searchParams.get('sort') === 'swing' && url.searchParams.get('dir') === 'asc');
    await waitForRows(page);
    const ascending = await swingsOnPage(page);
    expect(ascending).toEqual([...ascending].sort((a, b) => a - b));
    expect(ascending.every((s) => s >= SWING.min && s <= SWING.max)).toBe(true);
    await page.getByRole('button', { name: 'Swing', exact: true }).click();
    await page.waitForURL((url) => url.searchParams.get('dir') === 'desc');
    await waitForRows(page);
    const descending = await swingsOnPage(page);
    expect(descending).toEqual([...descending].sort((a, b) => b - a));
    await screenshot(page, 'compare-filtered-sorted');

    // Export: the file holds exactly the filtered machines.
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Export CSV' }).click()]);
    const text = readFileSync((await download.path())!, 'utf8').replace(/^\uFEFF/, '');
    const csv = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
    expect(csv.errors).toEqual([]);
    expect(csv.data).toHaveLength(matching.length);
    for (const row of csv.data) {
      expect(GRADES).toContain(row['Overall condition']);
      expect(Number(row['Swing over bed (mm)'])).toBeGreaterThanOrEqual(SWING.min);
      expect(Number(row['Swing over bed (mm)'])).toBeLessThanOrEqual(SWING.max);
    }
    expect(csv.data.map((r) => Number(r['Report id'])).sort()).toEqual(matching.map((m) => m.reportId).sort());
    expect(csv.data.map((r) => Number(r['Swing over bed (mm)']))).toEqual([...csv.data.map((r) => Number(r['Swing over bed (mm)']))].sort((a, b) => b - a));

    // Tick the two bought machines and one more, then compare them side by side.
    const chosen = [matching[0]!, matching[1]!, matching[2]!];
    for (const entry of chosen) await page.locator(`tr[data-report-id="${entry.reportId}"] input[type="checkbox"]`).click();
    await page.getByRole('link', { name: 'Compare 3 side by side' }).click();
    await page.waitForURL('**/compare/side-by-side?reports=*');
    await page.getByRole('heading', { level: 1, name: 'Side by side' }).waitFor();
    expect(new URL(page.url()).searchParams.get('reports')!.split(',').map(Number).sort()).toEqual(chosen.map((c) => c.reportId).sort());
    await page.getByRole('img', { name: /Subsystem scores of A: .*B: .*C: / }).waitFor();
    const differing = page.locator('tr[data-check]');
    expect(await differing.count()).toBeGreaterThan(0);
    await screenshot(page, 'compare-side-by-side');
    await page.close();
  });

  it('filters on no deal-breakers and a report age, sorts by report age and shows exactly those rows', async () => {
    // A machine inspected yesterday whose report records a cracked casting: only the deal-breaker filter keeps it out.
    const [seller] = await db.select({ id: users.id }).from(users).where(eq(users.email, 'gwen@kellbrook-turning.example'));
    const [admin] = await db.select({ id: users.id }).from(users).where(eq(users.email, 'nadia.ferrand@waygrade.example'));
    const model = `DB-${randomUUID().slice(0, 6)}`;
    const machineId = await createMachine(seller!.id, { maker: 'Corvane', model });
    const inspectionId = await createInspection(machineId, seller!.id, 'in_review', null);
    const [machine] = await db.select().from(machines).where(eq(machines.id, machineId));
    const inspectedOn = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
    const survey = { ...demoSurvey(machine!, { wear: 0.3, random: seededRandom(inspectionId), inspectedOn }), dealBreakers: { crackedCasting: { present: true, note: 'Crack across the bed at the headstock end' } } };
    await db.insert(surveys).values({ inspectionId, formatVersion: SURVEY_FORMAT_VERSION, version: 5, data: survey, submittedAt: new Date() });
    const { reportId } = await db.transaction((tx) => insertDraftReport(tx, { inspectionId, machineId, surveyVersion: 5, inspectorId: null, result: scoreSurvey(survey) }));
    await db.transaction((tx) => releaseDraftReport(tx, { reportId, reviewerId: admin!.id, sellerId: seller!.id }));

    // A report age that splits the released machines: the median age in days.
    const today = Math.floor(Date.now() / 86_400_000);
    const entries = (await db.select().from(comparisonEntries)).map((e) => ({ ...e, age: today - Math.floor(Date.parse(`${e.inspectedOn}T00:00:00Z`) / 86_400_000) }));
    const ages = entries.map((e) => e.age).sort((a, b) => a - b);
    const maxAge = ages[Math.floor(ages.length / 2)]!;
    const expected = entries
      .filter((e) => e.dealBreakerCount === 0 && e.age <= maxAge)
      .sort((a, b) => a.age - b.age || b.reportId - a.reportId)
      .map((e) => e.reportId);
    expect(expected.length, 'the filter keeps some machines').toBeGreaterThan(0);
    expect(expected.length, 'the filter drops some machines').toBeLessThan(entries.length - 1);

    const page = await browser.newPage();
    await signIn(page, DEALER, PASSWORD);
    await page.goto('/compare');
    await waitForRows(page);
    const filters = page.locator('aside .hidden.lg\\:block');
    await filters.getByRole('group', { name: 'Deal-breakers' }).getByLabel('None recorded').click();
    await page.waitForURL((url) => url.searchParams.get('dealBreakers') === 'none');
    await filters.getByLabel('Report age to').fill(String(maxAge));
    await filters.getByRole('button', { name: 'Apply filters' }).click();
    await page.waitForURL((url) => url.searchParams.get('reportAgeMax') === String(maxAge));
    await page.getByRole('button', { name: 'Report age', exact: true }).click();
    await page.waitForURL((url) => url.searchParams.get('sort') === 'reportAge' && url.searchParams.get('dir') === 'asc');
    await waitForRows(page);
    await page.getByRole('status').filter({ hasText: `${expected.length} machines match` }).waitFor();

    const shown = await page.locator('tbody tr[data-report-id]').evaluateAll((rows) => rows.map((r) => Number(r.getAttribute('data-report-id'))));
    expect(shown).toEqual(expected.slice(0, 50));
    expect(await page.locator('tbody [data-deal-breakers]').evaluateAll((cells) => cells.map((c) => c.getAttribute('data-deal-breakers')))).toEqual(shown.map(() => '0'));
    const agesShown = await page.locator('tbody [data-report-age]').evaluateAll((cells) => cells.map((c) => Number(c.getAttribute('data-report-age'))));
    expect(agesShown).toEqual([...agesShown].sort((a, b) => a - b));
    expect(Math.max(...agesShown)).toBeLessThanOrEqual(maxAge);
    await page.locator('[data-landed-cost-basis]').filter({ hasText: 'at 100 km' }).waitFor();
    await screenshot(page, 'compare-no-deal-breakers-by-report-age');

    // The other way round: only machines with a deal-breaker, named in words with an icon, not by colour alone.
    await filters.getByRole('group', { name: 'Deal-breakers' }).getByLabel('At least one').click();
    await page.waitForURL((url) => url.searchParams.get('dealBreakers') === 'any');
    const flagged = page.locator(`tr[data-report-id="${reportId}"]`);
    await flagged.waitFor();
    await flagged.getByText('1 deal-breaker', { exact: true }).waitFor();
    await flagged.getByText('named in the report').waitFor();
    await screenshot(page, 'compare-deal-breakers-any');
    await page.close();
  });

  it('answers a hand-edited link with an unknown column with the reason, not an empty table', async () => {
    const page = await browser.newPage();
    await page.goto('/compare?sort=password_hash');
    await page.getByRole('alert').filter({ hasText: 'Not a column the table can be sorted by' }).waitFor();
    await screenshot(page, 'compare-bad-link');
    await page.getByRole('button', { name: 'Start again with no filters' }).click();
    await waitForRows(page);
    await page.close();
  });

  it('lays the table out on a phone', async () => {
    const phone = await openBrowser({ width: 390, height: 844 });
    const page = await phone.newPage();
    await signIn(page, DEALER, PASSWORD);
    await page.goto('/compare');
    await page.locator('[data-report-card]').first().waitFor();
    expect(await page.locator('table').isVisible()).toBe(false);
    await screenshot(page, 'compare-phone');
    await page.getByText('Filters', { exact: false }).first().click();
    await page.getByRole('group', { name: 'Overall condition' }).first().waitFor();
    await screenshot(page, 'compare-phone-filters');
    await phone.close();
  });
});

describe('the coordinators’ market data', () => {
  afterAll(closeDatabase);

  it('records a sale and imports a CSV, showing the rejected row and why', async () => {
    const browser = await openBrowser({ width: 1280, height: 900 });
    const page = await browser.newPage();
    await signIn(page, 'nadia.ferrand@waygrade.example', PASSWORD);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Market data' }).click();
    await page.getByRole('heading', { level: 1, name: 'Market data' }).waitFor();
    const mark = `E2E ${Date.now().toString(36)}`;

    const form = page.getByRole('form', { name: 'Record a comparable sale' });
    await form.getByLabel('Machine sold').fill(`${mark} Corvane CL-330, 2001`);
    await form.getByLabel('Swing over bed (mm)').fill('330');
    await form.getByLabel('Price (whole units)').fill('7900');
    await form.getByLabel('Date sold').fill('2025-05-14');
    await form.getByRole('button', { name: 'Record sale' }).click();
    await form.getByRole('status').filter({ hasText: 'Recorded' }).waitFor();

    const csv = [
      'description,swing_mm,between_centres_mm,year_built,condition,sale_kind,price,currency,sold_on,region,source',
      `${mark} Oldreth T400,400,1000,1986,Fair,private,5600,EUR,2025-02-02,Brenmark,`,
      `${mark} Vantor Meridian 360,360,,1999,Gleaming,auction,8800,EUR,2025-03-03,,`,
    ].join('\n');
    await page.getByLabel('CSV file').setInputFiles({ name: 'sales.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.getByRole('button', { name: 'Import' }).click();
    await page.getByText('Imported 1 sale').waitFor();
    await page.locator('[data-rejected-line="line 3"]').filter({ hasText: 'condition' }).waitFor();
    await screenshot(page, 'market-data');
    await browser.close();
  });
});
