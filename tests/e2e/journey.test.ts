import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { DEMO_LOGINS } from '@/db/seed/demo-logins.mjs';
import { openBrowser, screenshot, signIn } from '../support/browser';
import { waitForMail } from '../support/mail-sink';
import { fillEverySectionAndSubmit } from '../support/survey-steps';

const seller = DEMO_LOGINS.accounts.find((a) => a.role === 'seller')!;
const coordinator = DEMO_LOGINS.accounts.find((a) => a.role === 'admin')!;
const inspector = DEMO_LOGINS.accounts.find((a) => a.role === 'inspector')!;
const model = `Test Lathe ${Date.now().toString(36).toUpperCase()}`;

function isoDateInDays(days: number) {
  return new Date(Date.now() + days * 24 * 60 * 60 * 1000).toISOString().slice(0, 10);
}

// The whole journey across roles: a seller lists and requests, the coordinator books, the inspector
// surveys on a phone, the coordinator sends the survey back once and then releases the report.
describe('an inspection from listing to released report', () => {
  let sellerBrowser: BrowserContext;
  let coordinatorBrowser: BrowserContext;
  let inspectorBrowser: BrowserContext;
  let machineUrl = '';
  let inspectionId = '';

  beforeAll(async () => {
    sellerBrowser = await openBrowser({ width: 390, height: 844 });
    coordinatorBrowser = await openBrowser();
    inspectorBrowser = await openBrowser({ width: 390, height: 844 });
  });
  afterAll(async () => {
    await sellerBrowser?.close();
    await coordinatorBrowser?.close();
    await inspectorBrowser?.close();
  });

  it('lets a seller list a lathe, refusing an impossible swing first', async () => {
    const page = await sellerBrowser.newPage();
    await signIn(page, seller.email, DEMO_LOGINS.password);
    await page.goto('/machines/new');
    await page.getByLabel('Maker').fill('Corvane');
    await page.getByLabel('Model').fill(model);
    await page.getByLabel('Swing over bed (mm)').fill('40');
    await page.getByLabel('Distance between centres (mm)').fill('750');
    await page.getByLabel('Town').fill('Kellbrook');
    await page.getByLabel('Region').fill('Brenmark');
    await page.getByRole('button', { name: 'Add machine' }).click();
    await page.getByText('Swing over bed is at least 100 mm').waitFor();
    await screenshot(page, 'machine-form-error');

    await page.getByLabel('Swing over bed (mm)').fill('330');
    await page.getByLabel('Year built').fill('1998');
    await page.getByLabel('Asking price (€)').fill('6400');
    await page.getByRole('button', { name: 'Add machine' }).click();
    await page.waitForURL(/\/machines\/\d+$/);
    machineUrl = new URL(page.url()).pathname;
    await page.getByRole('heading', { name: `Corvane ${model}` }).waitFor();
    await screenshot(page, 'machine-listed');
    await page.close();
  });

  it('lets the seller request an inspection and shows it on the timeline', async () => {
    const page = await sellerBrowser.newPage();
    await page.goto(machineUrl);
    await page.getByRole('link', { name: 'Request an inspection' }).click();
    await page.getByLabel('Preferred date 1').fill(isoDateInDays(9));
    await page.getByLabel('Preferred date 2').fill(isoDateInDays(12));
    await page.getByLabel('Their phone').fill('+00 555 0101');
    await page.getByLabel('Access and site notes').fill('Side gate, ring the bell.');
    await screenshot(page, 'inspection-request');
    await page.getByRole('button', { name: 'Request the inspection' }).click();
    await page.waitForURL((url) => url.pathname === machineUrl);
    await page.getByRole('list', { name: 'Timeline' }).getByText('Requested').waitFor();
    await page.close();
  });

  it('lets the coordinator book the visit and assign an inspector, and e-mails both', async () => {
    const page = await coordinatorBrowser.newPage();
    await signIn(page, coordinator.email, DEMO_LOGINS.password);
    await page.goto('/inspections?tab=to-book');
    await page.getByRole('link', { name: `Corvane ${model}` }).click();
    await page.getByRole('heading', { name: 'Book the visit' }).waitFor();
    inspectionId = new URL(page.url()).pathname.split('/').pop()!;
    const inspectorValue = await page.locator('#inspectorId option', { hasText: inspector.name }).getAttribute('value');
    await page.getByLabel('Inspector').selectOption(inspectorValue!);
    await page.getByLabel('Arrival time (UTC)').fill('10:30');
    await screenshot(page, 'booking');
    await page.getByRole('button', { name: 'Book and assign' }).click();
    await page.getByText('Booked. The seller and the inspector have been e-mailed.').waitFor();
    await page.close();

    const sellerPage = await sellerBrowser.newPage();
    await sellerPage.goto(machineUrl);
    await sellerPage.getByText(`with ${inspector.name}`).waitFor();
    await screenshot(sellerPage, 'machine-booked');
    await sellerPage.close();
    await waitForMail(seller.email, 'booked');
  });

  it('lets the assigned inspector survey the machine on a phone and submit', async () => {
    const page = await inspectorBrowser.newPage();
    await signIn(page, inspector.email, DEMO_LOGINS.password);
    await page.goto(`/jobs/${inspectionId}`);
    await page.getByRole('button', { name: 'I am on site — start the visit' }).click();
    await page.waitForURL(`**/jobs/${inspectionId}/survey`);
    await fillEverySectionAndSubmit(page, inspectorBrowser, inspectionId, 'journey-survey');
    await page.close();
    await waitForMail(coordinator.email, 'Survey ready for review');
  }, 240_000);

  it('lets the coordinator send the survey back once, and the inspector resubmit', async () => {
    const page = await coordinatorBrowser.newPage();
    await page.goto(`/inspections/${inspectionId}/review`);
    await page.getByText('Overall condition').first().waitFor();
    await screenshot(page, 'journey-review');
    await page.getByRole('button', { name: 'Send back to the inspector' }).click();
    await page.getByText('Tell the inspector what to look at again').waitFor();
    await page.getByLabel('Comment').fill('Please add the top-slide backlash reading.');
    await page.getByRole('button', { name: 'Send back to the inspector' }).click();
    await page.getByText('Sent back. The survey is open again for the inspector.').waitFor();
    // The page refreshes without the decision buttons; the outcome stays beside the new state.
    await page.getByText('Nothing to decide now: the survey is with the inspector.').waitFor();
    await page.getByText('Sent back. The survey is open again for the inspector.').waitFor();
    await screenshot(page, 'journey-review-sent-back');
    await page.close();
    await waitForMail(inspector.email, 'Survey sent back');

    const phone = await inspectorBrowser.newPage();
    await phone.goto(`/jobs/${inspectionId}`);
    await phone.getByText('Please add the top-slide backlash reading.').waitFor();
    await screenshot(phone, 'journey-sent-back');
    await phone.goto(`/jobs/${inspectionId}/survey?section=submit`);
    await phone.getByTestId('submission-check').getByText('Ready to submit').waitFor();
    await phone.getByRole('button', { name: 'Submit survey for review' }).click();
    await phone.waitForURL(`**/jobs/${inspectionId}?submitted=1`);
    await phone.close();
  }, 120_000);

  it('lets the coordinator release the report, which the seller then sees', async () => {
    const page = await coordinatorBrowser.newPage();
    await page.goto(`/inspections/${inspectionId}/review`);
    await page.getByRole('button', { name: 'Release the report' }).click();
    await page.getByText('Released. The seller has been e-mailed.').waitFor();
    await page.close();

    const sellerPage = await sellerBrowser.newPage();
    await sellerPage.goto(machineUrl);
    await sellerPage.getByText('Released report').waitFor();
    await screenshot(sellerPage, 'journey-released');
    await sellerPage.close();
    const mail = await waitForMail(seller.email, 'Report released');
    expect(mail.text).toContain(model);
  });

  it('refuses a seller who opens another seller’s machine', async () => {
    const other = DEMO_LOGINS.accounts.filter((a) => a.role === 'seller')[1]!;
    const context = await openBrowser();
    const page = await context.newPage();
    await signIn(page, other.email, DEMO_LOGINS.password);
    // The page streams behind a loading state, so the refusal shows as the not-found page.
    await page.goto(machineUrl);
    await page.getByText('This page is off the bed.').waitFor();
    expect(await page.getByText(model).count()).toBe(0);
    await context.close();
  });
});
