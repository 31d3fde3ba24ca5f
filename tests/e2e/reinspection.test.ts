import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { closeDatabase } from '@/db/client';
import { createAccount, type TestAccount } from '../support/accounts';
import { openBrowser, screenshot, signIn } from '../support/browser';
import { waitForMail } from '../support/mail-sink';
import { createAgedReleasedReport } from '../support/reinspection-fixtures';

describe('a re-inspection paid before the visit and refunded by the sale', () => {
  let buyerBrowser: BrowserContext;
  let sellerBrowser: BrowserContext;
  let buyer: TestAccount;
  let seller: TestAccount;
  let reportId: number;
  let machineId: number;
  const model = `RI-${Date.now().toString(36).toUpperCase()}`;

  beforeAll(async () => {
    buyer = await createAccount('buyer');
    // Inspected 130 days ago: stale under the default 90-day validity.
    ({ reportId, machineId, seller } = await createAgedReleasedReport({ inspectedDaysAgo: 130, machine: { maker: 'Tessvale', model } }));
    buyerBrowser = await openBrowser();
    sellerBrowser = await openBrowser();
  });
  afterAll(async () => {
    await buyerBrowser?.close();
    await sellerBrowser?.close();
    await closeDatabase();
  });

  it('lets the buyer request and pay on a stale report, and shows it paid once the provider confirms', async () => {
    const page = await buyerBrowser.newPage();
    await signIn(page, buyer.email, buyer.password);
    await page.goto(`/reports/${reportId}`);
    await page.getByText('Stale report.').waitFor();
    await page.getByRole('heading', { name: 'Re-inspection' }).waitFor();
    await page.getByText('refunded to you automatically').waitFor();
    await page.getByText('Once the visit has started there is no automatic refund.').waitFor();
    await screenshot(page, 'reinspection-offer');
    await page.getByRole('button', { name: /Request a re-inspection · €390/ }).click();

    await page.waitForURL(/\/checkout\/cs_/);
    expect(await page.locator('#amount-total').textContent()).toContain('390');
    await page.locator('#pay').click();
    await page.waitForURL(new RegExp(`/reports/${reportId}\\?reinspection=returned`));
    await page.getByText('Re-inspection paid').waitFor({ timeout: 30_000 });
    await page.getByText('Waiting for a coordinator to book the visit.').waitFor();
    await screenshot(page, 'reinspection-paid');
    const receipt = await waitForMail(buyer.email, 'Receipt WGR-');
    expect(receipt.text).toContain(`Tessvale ${model}`);
    await page.close();
  });

  it('shows the coordinators the paid re-inspection in the queue, marked as one', async () => {
    const coordinator = await createAccount('admin');
    const browser = await openBrowser();
    try {
      const page = await browser.newPage();
      await signIn(page, coordinator.email, coordinator.password);
      await page.goto('/inspections?tab=to-book');
      const row = page.getByRole('row').filter({ hasText: `Tessvale ${model}` });
      await row.getByText('Re-inspection · fee paid by the requester').waitFor();
      await screenshot(page, 'reinspection-in-queue');
    } finally {
      await browser.close();
    }
  });

  it('lets the seller mark the machine sold, after which the buyer sees the fee refunded', async () => {
    const page = await sellerBrowser.newPage();
    await signIn(page, seller.email, seller.password);
    await page.goto(`/machines/${machineId}`);
    await page.getByText('Re-inspection requested and paid by').waitFor();
    await page.getByRole('button', { name: 'Mark as sold…' }).click();
    await page.getByText('Any paid re-inspection whose visit has not started is cancelled').waitFor();
    await screenshot(page, 'reinspection-seller-marks-sold');
    await page.getByRole('button', { name: 'Yes, it is sold' }).click();
    await page.getByRole('button', { name: 'Put back on the market' }).waitFor();
    await page.close();

    const buyerPage = await buyerBrowser.newPage();
    await buyerPage.goto(`/reports/${reportId}`);
    await buyerPage.getByText('Re-inspection refunded').waitFor();
    await buyerPage.getByText('The machine was sold before the re-inspection visit started').waitFor();
    await screenshot(buyerPage, 'reinspection-refunded');
    const notice = await waitForMail(buyer.email, 'Refund of');
    expect(notice.text).toContain('sold before the re-inspection visit started');
    await buyerPage.goto('/purchases');
    const row = buyerPage.getByRole('row').filter({ hasText: `Re-inspection: Tessvale ${model}` });
    await row.getByText('Refunded').first().waitFor();
    await buyerPage.close();
  });
});
