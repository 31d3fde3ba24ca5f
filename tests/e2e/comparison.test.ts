import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { and, eq, inArray } from 'drizzle-orm';
import type { BrowserContext, Page } from 'playwright-core';
import { closeDatabase, db } from '@/db/client';
import { comparisonEntries, reportAccessGrants, users } from '@/db/schema';
import { openBrowser, screenshot, signIn } from '../support/browser';

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
