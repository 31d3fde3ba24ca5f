import { eq } from 'drizzle-orm';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db/client';
import { machineDisclosures, machines, reportAccessGrants, reports, surveys } from '@/db/schema';
import { demoSurvey } from '@/db/seed/demo-survey';
import { seededRandom } from '@/db/seed/random';
import { createAccount, type TestAccount } from '../support/accounts';
import { openBrowser, screenshot, signIn } from '../support/browser';
import { photoFile, savedSurvey, waitUntilSaved } from '../support/survey-steps';
import { createInspection, createMachine } from '../support/workflow-fixtures';
import { pdfToText } from '../support/pdf-text';

// The inspector records a broken gear tooth with its photo on an otherwise good lathe; once the
// coordinator releases the report, the buyer's summary opens with the deal-breaker above everything.
describe('a deal-breaker from the survey to the top of the buyer\'s report', () => {
  let seller: TestAccount;
  let coordinator: TestAccount;
  let inspector: TestAccount;
  let buyer: TestAccount;
  let inspectionId = 0;
  let phone: BrowserContext;
  let desk: BrowserContext;

  beforeAll(async () => {
    [seller, coordinator, inspector, buyer] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector'), createAccount('buyer')]);
    const machineId = await createMachine(seller.id, { model: `DB-${Date.now().toString(36)}` });
    inspectionId = await createInspection(machineId, seller.id, 'booked', inspector.id);
    // The seller claims no known faults; the broken gear tooth will contradict it.
    await db.insert(machineDisclosures).values({ machineId, knownFaults: '', repairsAndRebuilds: '', crashesOrDrops: '', usage: 'hobby', usageNotes: '', supplyVoltage: 400, supplyPhases: 3, included: '', saleTerm: 'as-is' });
    phone = await openBrowser({ width: 390, height: 844 });
    desk = await openBrowser();
  });

  afterAll(async () => {
    await phone?.close();
    await desk?.close();
  });

  it('refuses to submit a broken gear tooth without a photo, then submits it with one', async () => {
    const page = await phone.newPage();
    page.setDefaultNavigationTimeout(90_000);
    await signIn(page, inspector.email, inspector.password);
    await page.goto(`/jobs/${inspectionId}`);
    await page.getByRole('button', { name: 'I am on site — start the visit' }).click();
    await page.waitForURL(`**/jobs/${inspectionId}/survey`);
    await waitUntilSaved(page);

    // Every other section is taken as filled on a good machine, so the test is about the deal-breaker.
    const [machine] = await db.select().from(machines).where(eq(machines.sellerId, seller.id));
    const good = demoSurvey(machine!, { wear: 0.1, random: seededRandom(inspectionId), inspectedOn: '2026-11-20' });
    const [row] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
    await db.update(surveys).set({ data: good, version: row!.version + 1 }).where(eq(surveys.inspectionId, inspectionId));

    await page.goto(`/jobs/${inspectionId}/survey?section=hiddenDamage`);
    await page.getByRole('heading', { level: 1, name: 'Hidden damage and deal-breakers' }).waitFor();
    const finding = page.locator('[data-finding="brokenGearTeeth"]');
    await finding.getByRole('button', { name: /^Yes/ }).click();
    await finding.getByLabel('What you saw, and where').fill('Two teeth broken off the 60-tooth change gear');
    await waitUntilSaved(page);

    await page.goto(`/jobs/${inspectionId}/survey?section=submit`);
    await page.getByTestId('submission-check').getByText(/A photo for every “yes”: 1 answered yes \(Broken gear teeth\)/).waitFor();
    await screenshot(page, 'deal-breaker-01-photo-missing');

    await page.goto(`/jobs/${inspectionId}/survey?section=hiddenDamage`);
    // Wait for the screen to come alive (save state shown) so the file input has its handler.
    await page.getByRole('heading', { level: 1, name: 'Hidden damage and deal-breakers' }).waitFor();
    await waitUntilSaved(page);
    await page.getByTestId('photo-file-input').setInputFiles(await photoFile());
    await page.getByTestId('section-photos').getByRole('link').first().waitFor({ timeout: 30_000 });
    await screenshot(page, 'deal-breaker-02-recorded');

    // Bed wear: the carriage-lock distance and two thickness stations draw the wear profile at once.
    await page.goto(`/jobs/${inspectionId}/survey?section=bedAndWays`);
    await page.getByRole('heading', { level: 1, name: 'Bed and ways' }).waitFor();
    await waitUntilSaved(page);
    await page.getByLabel('Locked carriage binds at, from the headstock').fill('450');
    await page.getByRole('button', { name: '+ Add a thickness station' }).click();
    await page.getByRole('button', { name: '+ Add a thickness station' }).click();
    await page.getByLabel('Way thickness').nth(0).fill('24.96');
    await page.getByLabel('Way thickness').nth(1).fill('25.00');
    await page.getByTestId('wear-profile').locator('rect').nth(1).waitFor();
    // The bed was read before the power run warmed the machine: the inspector says so with one tap.
    await page.getByRole('group', { name: 'Machine while these readings were taken' }).getByRole('button', { name: /^Cold/ }).click();
    await page.locator('[data-thermal-section="bedAndWays"] [data-thermal-state="cold"]').waitFor();
    await waitUntilSaved(page);
    await screenshot(page, 'deal-breaker-02b-bed-wear');

    await page.goto(`/jobs/${inspectionId}/survey?section=submit`);
    await page.getByTestId('submission-check').getByText('Ready to submit').waitFor();
    await page.getByRole('button', { name: '+ Add an area not inspected' }).click();
    await page.getByRole('group', { name: 'Area' }).getByRole('button', { name: /^Test cuts/ }).click();
    await page.getByLabel('Why not').fill('No bar stock on site for the test cuts');
    await waitUntilSaved(page);
    await screenshot(page, 'deal-breaker-02c-submit');
    await page.getByRole('button', { name: 'Submit survey for review' }).click();
    await page.waitForURL(`**/jobs/${inspectionId}?submitted=1`);
    const saved = await savedSurvey(page, String(inspectionId));
    expect(saved.data.data.dealBreakers?.brokenGearTeeth?.present).toBe(true);
    expect(saved.data.data.bedAndWays?.wayThickness?.stations).toEqual([
      { distanceFromHeadstock: { value: 0, unit: 'mm' }, thickness: { value: 24.96, unit: 'mm' } },
      { distanceFromHeadstock: { value: 250, unit: 'mm' }, thickness: { value: 25, unit: 'mm' } },
    ]);
    expect(saved.data.data.notInspected).toEqual([{ area: 'testCuts', reason: 'No bar stock on site for the test cuts' }]);
    // The section's readings carry their time, and the inspector's cold.
    expect(saved.data.data.bedAndWays?.thermal?.machineState).toBe('cold');
    expect(Date.parse(saved.data.data.bedAndWays?.thermal?.readingsAt ?? '')).toBeGreaterThan(Date.now() - 10 * 60_000);
    await page.close();
  }, 240_000);

  it('shows the coordinator the deal-breaker first, what was not inspected, the contradicted claim and the bed plots before release', async () => {
    const review = await desk.newPage();
    await signIn(review, coordinator.email, coordinator.password);
    await review.goto(`/inspections/${inspectionId}/review`);
    const panel = review.getByRole('region', { name: /Deal-breaker/ });
    await panel.waitFor();
    await expect(panel.textContent()).resolves.toContain('Two teeth broken off the 60-tooth change gear');
    const order = await review.evaluate(() => {
      const text = document.querySelector('main')?.textContent ?? document.body.textContent ?? '';
      return { deal: text.indexOf('Deal-breaker'), summary: text.indexOf('Overall condition'), checks: text.indexOf('Readings as entered') };
    });
    expect(order.deal).toBeGreaterThan(-1);
    expect(order.deal).toBeLessThan(order.summary);
    await expect(review.getByTestId('not-inspected').textContent()).resolves.toContain('No bar stock on site for the test cuts');
    const claim = review.locator('[data-claim="known-faults"]');
    expect(await claim.getAttribute('data-status')).toBe('contradicted');
    await expect(claim.textContent()).resolves.toContain('Broken gear teeth');
    await review.getByRole('img', { name: /Way wear/ }).waitFor();
    await review.getByRole('img', { name: /Bed profile/ }).waitFor();
    await expect(review.locator('summary [data-thermal-section="bedAndWays"]').textContent()).resolves.toContain('Cold');
    await review.getByRole('img', { name: /Way wear/ }).scrollIntoViewIfNeeded();
    await screenshot(review, 'deal-breaker-02d-review');
    await review.close();
  }, 120_000);

  it('shows the buyer the deal-breaker at the top of the released report, above a good grade', async () => {
    const review = await desk.newPage();
    await review.goto(`/inspections/${inspectionId}/review`);
    await review.getByRole('button', { name: 'Release the report' }).click();
    await review.getByText('Released. The seller has been e-mailed.').waitFor();
    await review.close();

    const [report] = await db.select().from(reports).where(eq(reports.inspectionId, inspectionId));
    // Access as a completed purchase would leave it; paying is covered by the purchase tests.
    await db.insert(reportAccessGrants).values({ reportId: report!.id, userId: buyer.id, reason: 'purchase' });

    const buyerContext = await openBrowser({ width: 390, height: 844 });
    const page = await buyerContext.newPage();
    await signIn(page, buyer.email, buyer.password);
    await page.goto(`/reports/${report!.id}`);
    const panel = page.getByRole('region', { name: /Deal-breaker/ });
    await panel.waitFor();
    await expect(panel.textContent()).resolves.toContain('Broken gear teeth');
    await expect(panel.textContent()).resolves.toContain('Two teeth broken off the 60-tooth change gear');
    // At the top: the deal-breakers come before the machine card and the grade scale.
    const order = await page.evaluate(() => {
      const text = document.querySelector('main')?.textContent ?? document.body.textContent ?? '';
      return { deal: text.indexOf('Deal-breaker'), machine: text.indexOf('The machine'), scale: text.indexOf('How to read the grade') };
    });
    expect(order.deal).toBeGreaterThan(-1);
    expect(order.deal).toBeLessThan(order.machine);
    expect(order.machine).toBeLessThan(order.scale);
    await page.getByText('No bar stock on site for the test cuts').waitFor();
    await page.getByText('Not a warranty').first().waitFor();
    await page.getByText('No advice to buy or not to buy').first().waitFor();
    await screenshot(page, 'deal-breaker-03-buyer-report');
    const pdf = pdfToText(await (await page.request.get(`/api/reports/${report!.id}/pdf`)).body());
    expect(pdf).toMatch(/Known faults No known faults .{0,40}Contradicted by the findings/);
    expect(pdf).toContain('Bed and ways read cold (set by the inspector)');
    await buyerContext.close();
  }, 120_000);
});
