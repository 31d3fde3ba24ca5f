import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../support/accounts';
import { openBrowser, screenshot, signIn } from '../support/browser';
import { photoFile, waitUntilSaved } from '../support/survey-steps';
import { createInspection, createMachine } from '../support/workflow-fixtures';

// The survey screen downloads the photo uploader, the live grading and the final check after it is
// up, not with it (the survey's first-load budget). These are the moments that could go wrong on site: the signal
// gone before the uploader was ever fetched, and the last screen reached with no signal.
describe('the survey’s parts loaded on demand, on a phone with a patchy signal', () => {
  let seller: TestAccount;
  let inspector: TestAccount;
  let inspectionId = 0;
  let phone: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    [seller, inspector] = await Promise.all([createAccount('seller'), createAccount('inspector')]);
    const machineId = await createMachine(seller.id, { model: `OD-${Date.now().toString(36)}` });
    inspectionId = await createInspection(machineId, seller.id, 'booked', inspector.id);
    phone = await openBrowser({ width: 390, height: 844 });
    page = await phone.newPage();
    page.setDefaultNavigationTimeout(90_000);
    await signIn(page, inspector.email, inspector.password);
    await page.goto(`/jobs/${inspectionId}`);
    await page.getByRole('button', { name: 'I am on site — start the visit' }).click();
    await page.waitForURL(`**/jobs/${inspectionId}/survey`);
    await waitUntilSaved(page);
  });

  afterAll(async () => {
    await phone?.close();
  });

  it('grades live once the scoring library has arrived', async () => {
    await page.goto(`/jobs/${inspectionId}/survey?section=lubrication`);
    await page.getByRole('heading', { level: 1, name: 'Headstock and lubrication' }).waitFor();
    await page.getByRole('group', { name: 'Oil level', exact: true }).getByRole('button', { name: /^Correct/ }).click();
    await page.locator('[data-testid="section-checks"][data-state="ready"]').getByText('Headstock oil level').waitFor({ timeout: 30_000 });
    await waitUntilSaved(page);
  });

  it('keeps a photo chosen with no signal, before the uploader was ever fetched, and sends it on Retry', async () => {
    await phone.setOffline(true);
    await page.getByTestId('photo-file-input').setInputFiles(await photoFile());
    const upload = page.getByTestId('photo-upload');
    await upload.getByRole('alert').getByText('No signal: the photo is kept here').waitFor({ timeout: 30_000 });
    await screenshot(page, 'survey-photo-offline');
    expect(await page.getByTestId('section-photos').getByRole('link').count()).toBe(0);

    await phone.setOffline(false);
    await upload.getByRole('button', { name: 'Retry' }).click();
    await page.getByTestId('section-photos').getByRole('link').first().waitFor({ timeout: 30_000 });
    expect(await page.getByTestId('photo-upload').count()).toBe(0);
  });

  it('opens the final check with no signal, fetched in the background earlier', async () => {
    await phone.setOffline(true);
    // The list of all sections under the progress bar jumps straight to the last screen.
    await page.getByText(/sections started/).click();
    await page.getByRole('button', { name: /Check and submit$/ }).click();
    await page.getByRole('heading', { level: 1, name: 'Check and submit' }).waitFor();
    await page.getByTestId('submission-check').waitFor({ timeout: 10_000 });
    await expect(page.getByTestId('submission-check').textContent()).resolves.toMatch(/still missing/);
    await phone.setOffline(false);
  });
});
