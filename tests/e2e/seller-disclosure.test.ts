import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import type { BrowserContext } from 'playwright-core';
import { closeDatabase, db } from '@/db/client';
import { reportAccessGrants, reports } from '@/db/schema';
import { releaseDraftReport } from '@/db/queries/report-writes';
import type { ScoringResult } from '@/lib/scoring';
import { createAccount, type TestAccount } from '../support/accounts';
import { openBrowser, screenshot, signIn } from '../support/browser';
import { createInspection, createMachine, createSubmittedSurvey } from '../support/workflow-fixtures';
import { pdfToText } from '../support/pdf-text';
import { pdfText as pdfTextOf } from '@/lib/pdf/pdf-text';

describe('seller’s disclosure beside the findings', () => {
  let sellerBrowser: BrowserContext;
  let buyerBrowser: BrowserContext;
  let seller: TestAccount;
  let buyer: TestAccount;
  let machineId: number;
  let reportId: number;
  let result: ScoringResult;
  let coordinatorId: string;

  beforeAll(async () => {
    const [s, b, coordinator, inspector] = await Promise.all([createAccount('seller'), createAccount('buyer'), createAccount('admin'), createAccount('inspector')]);
    seller = s;
    buyer = b;
    machineId = await createMachine(seller.id, { maker: 'Halvorn', model: `HD-${Date.now().toString(36).toUpperCase()}`, supplyVoltage: 400, supplyPhases: 3 });
    const inspectionId = await createInspection(machineId, seller.id, 'in_review', inspector.id);
    // A heavily worn machine, so the findings have something to say against "no known faults".
    // The report is released once the seller has answered (below): release keeps a copy of the answers.
    ({ reportId } = await createSubmittedSurvey(inspectionId, 1));
    coordinatorId = coordinator.id;
    const [row] = await db.select({ result: reports.result }).from(reports).where(eq(reports.id, reportId));
    result = (typeof row!.result === 'string' ? JSON.parse(row!.result) : row!.result) as ScoringResult;
    sellerBrowser = await openBrowser();
    buyerBrowser = await openBrowser();
  });
  afterAll(async () => {
    await sellerBrowser?.close();
    await buyerBrowser?.close();
    await closeDatabase();
  });

  it('refuses a "yes" without a description and keeps the other answers', async () => {
    const page = await sellerBrowser.newPage();
    await signIn(page, seller.email, seller.password);
    await page.goto(`/machines/${machineId}`);
    await page.getByRole('link', { name: 'Seller’s disclosure' }).click();
    await page.waitForURL(`**/machines/${machineId}/disclosure`);
    await page.getByRole('button', { name: 'Save disclosure' }).click();
    await page.getByText('Answer whether you know of any faults').waitFor();
    await page.getByText('Choose the terms of sale').waitFor();
    await page.getByRole('group', { name: 'Do you know of any faults?' }).getByLabel('No known faults').check();
    await page.getByRole('group', { name: 'Has it been repaired or rebuilt?' }).getByLabel('Yes').check();
    await page.getByRole('group', { name: 'Has it been crashed or dropped?' }).getByLabel('None known').check();
    await page.getByLabel(/As-is/).check();
    await page.getByLabel('What is included').fill('3-jaw chuck, fixed steady, manuals');
    await page.getByRole('button', { name: 'Save disclosure' }).click();
    await page.getByText('Describe the repairs or rebuilds').waitFor();
    expect(page.url()).toContain('/disclosure');
    expect(await page.getByLabel('What is included').inputValue()).toBe('3-jaw chuck, fixed steady, manuals');
    await screenshot(page, 'disclosure-form-error');
    await page.close();
  });

  it('lets the seller disclose "no known faults" and sell "tested under power"', async () => {
    const page = await sellerBrowser.newPage();
    await page.goto(`/machines/${machineId}/disclosure`);
    await page.getByRole('group', { name: 'Do you know of any faults?' }).getByLabel('No known faults').check();
    await page.getByRole('group', { name: 'Has it been repaired or rebuilt?' }).getByLabel('None known').check();
    await page.getByRole('group', { name: 'Has it been crashed or dropped?' }).getByLabel('None known').check();
    await page.getByLabel('Use', { exact: true }).selectOption('toolroom-or-maintenance');
    await page.getByLabel('What is included').fill('3-jaw chuck, fixed steady, manuals');
    await page.getByLabel(/Tested under power/).check();
    await screenshot(page, 'disclosure-form-filled');
    await page.getByRole('button', { name: 'Save disclosure' }).click();
    await page.waitForURL(`**/machines/${machineId}`);
    await page.close();
  });

  it('lets the seller record the moving sheet and a missing chuck', async () => {
    const page = await sellerBrowser.newPage();
    await page.goto(`/machines/${machineId}`);
    await page.getByRole('link', { name: 'Moving sheet' }).click();
    await page.waitForURL(`**/machines/${machineId}/moving`);
    await page.getByLabel('Weight (kg)').fill('1850');
    await page.getByLabel('Site access').selectOption('narrow-door-or-steps');
    await page.getByRole('button', { name: 'Save moving sheet' }).click();
    await page.waitForURL(`**/machines/${machineId}`);
    await page.goto(`/machines/${machineId}/inclusions`);
    await page.getByText('Nothing listed yet.').waitFor();
    await page.getByLabel('Description').fill('250 mm 3-jaw chuck');
    await page.getByLabel('Replacement cost new (€)').fill('600');
    await page.getByRole('button', { name: 'Add item' }).click();
    await page.getByRole('button', { name: 'Remove 250 mm 3-jaw chuck' }).waitFor();
    await page.getByLabel('Description').fill('4-jaw chuck');
    await page.getByLabel('Condition').selectOption('missing');
    await page.getByLabel('Replacement cost new (€)').fill('550');
    await page.getByRole('button', { name: 'Add item' }).click();
    await page.getByRole('button', { name: 'Remove 4-jaw chuck' }).waitFor();
    // Good at 60 % of €600 = €360; the missing chuck costs its full €550 (Waygrade rule, common practice).
    await page.getByText('Worth as they stand: €360 · missing, to replace: €550').waitFor();
    await screenshot(page, 'inclusions-list');
    await page.close();
  });

  it('shows the buyer the contradiction beside the claim, as kept at release', async () => {
    const faulty = result.checks.filter((c) => c.band === 'worn' || c.band === 'unfit');
    expect(faulty.length + result.safetyFindings.length).toBeGreaterThan(0);
    await db.transaction((tx) => releaseDraftReport(tx, { reportId, reviewerId: coordinatorId, sellerId: seller.id }));
    await db.insert(reportAccessGrants).values({ reportId, userId: buyer.id, reason: 'purchase' });

    // The seller changes the answer after release; the released version keeps the one it was released with.
    const sellerPage = await sellerBrowser.newPage();
    await sellerPage.goto(`/machines/${machineId}/disclosure`);
    await sellerPage.getByRole('group', { name: 'Do you know of any faults?' }).getByLabel('Yes').check();
    await sellerPage.getByLabel(/Describe the faults/).fill('Worn ways near the chuck, changed after release');
    await sellerPage.getByRole('button', { name: 'Save disclosure' }).click();
    await sellerPage.waitForURL(`**/machines/${machineId}`);
    await sellerPage.close();

    const page = await buyerBrowser.newPage();
    await signIn(page, buyer.email, buyer.password);
    await page.goto(`/reports/${reportId}`);
    const claim = page.locator('[data-claim="known-faults"]');
    await claim.waitFor();
    expect(await claim.getAttribute('data-status')).toBe('contradicted');
    const text = await claim.textContent();
    expect(text).toContain('No known faults');
    expect(text).toContain('Contradicted by the findings');
    const first = faulty[0] ?? null;
    if (first) expect(text).toContain(`${first.label}: ${first.bandLabel}`);
    else expect(text).toContain(`Safety: ${result.safetyFindings[0]!.message}`);
    expect(text).not.toContain('changed after release');
    // Answers no finding bears on are shown as stated, never marked true.
    expect(await page.locator('[data-claim="crashes"]').getAttribute('data-status')).toBe('not-compared');
    await claim.scrollIntoViewIfNeeded();
    await screenshot(page, 'report-claims-beside-findings');

    // The signed PDF prints the same claim with its contradiction in words, and the landed cost on its own basis.
    const response = await page.request.get(`/api/reports/${reportId}/pdf`);
    expect(response.status()).toBe(200);
    const pdf = pdfToText(await response.body());
    expect(pdf).toContain('The seller’s claims beside the findings');
    expect(pdf).toMatch(/Known faults No known faults .{0,40}Contradicted by the findings/);
    if (first) expect(pdf).toContain(`${first.label}: ${pdfTextOf(first.bandLabel)}`);
    expect(pdf).not.toContain('changed after release');
    expect(pdf).toContain('Every copy of this report version prints the same figures');
    expect(pdf).toMatch(/Missing tooling .{0,80}€550/);
    await page.close();
  });

  it('tells the buyer the machine needs a converter once their single-phase supply is saved, and totals the landed cost', async () => {
    const page = await buyerBrowser.newPage();
    await page.goto('/account');
    await page.getByLabel('Voltage (V)').fill('230');
    await page.getByLabel('Phases').selectOption('1');
    await page.getByRole('button', { name: 'Save supply' }).click();
    await page.getByText('Saved.').waitFor();
    await page.goto(`/reports/${reportId}`);
    const verdict = page.locator('[data-supply-verdict]');
    await verdict.waitFor();
    expect(await verdict.getAttribute('data-supply-verdict')).toBe('converter-needed');
    // The moving sheet's weight and access and the missing chuck arrive filled in.
    expect(await page.getByLabel('Machine weight (kg)').inputValue()).toBe('1850');
    expect(await page.getByLabel('Site access').inputValue()).toBe('narrow-door-or-steps');
    expect(await page.getByRole('row', { name: /Missing tooling/ }).textContent()).toContain('€550');
    expect(await page.locator('[data-inclusions-value]').textContent()).toContain('€360');
    await page.getByLabel('Distance to your shop (km)').fill('120');
    const total = page.locator('[data-landed-total]');
    await total.waitFor();
    const before = await total.textContent();
    await page.getByLabel('Transport per km (EUR)').fill('3.5');
    await expect.poll(() => total.textContent()).not.toBe(before);
    await page.getByLabel('Machine weight (kg)').fill('-5');
    await page.getByRole('alert').getByText('Machine weight must be more than 0 kg').waitFor();
    await page.getByLabel('Machine weight (kg)').fill('1850');
    await total.scrollIntoViewIfNeeded();
    await screenshot(page, 'report-landed-cost');
    await page.close();
  });
});
