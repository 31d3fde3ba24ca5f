import { mkdtempSync, readFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import type { BrowserContext } from 'playwright-core';
import { closeDatabase, db } from '@/db/client';
import { orders } from '@/db/schema';
import { createAccount, type TestAccount } from '../support/accounts';
import { openBrowser, screenshot, signIn } from '../support/browser';
import { waitForMail } from '../support/mail-sink';
import { createReleasedReport } from '../support/purchase-fixtures';

describe('buying a report', () => {
  let buyerBrowser: BrowserContext;
  let coordinatorBrowser: BrowserContext;
  let buyer: TestAccount;
  let coordinator: TestAccount;
  let reportId: number;
  const model = `CL-${Date.now().toString(36).toUpperCase()}`;

  beforeAll(async () => {
    [buyer, coordinator] = await Promise.all([createAccount('buyer'), createAccount('admin')]);
    ({ reportId } = await createReleasedReport({ maker: 'Corvane', model, serialNumber: 'CV-20931' }));
    buyerBrowser = await openBrowser();
    coordinatorBrowser = await openBrowser();
  });
  afterAll(async () => {
    await buyerBrowser?.close();
    await coordinatorBrowser?.close();
    await closeDatabase();
  });

  it('shows the machine and its condition openly and keeps the details locked', async () => {
    const page = await buyerBrowser.newPage();
    await signIn(page, buyer.email, buyer.password);
    await page.goto('/reports');
    await page.getByLabel('Maker or model').fill(model);
    await page.getByRole('button', { name: 'Search' }).click();
    await page.waitForURL(/\/reports\?q=/);
    await page.getByText('1 machine', { exact: true }).waitFor();
    await screenshot(page, 'reports-catalogue-search');
    await page.getByRole('link', { name: `Corvane ${model}` }).click();
    await page.waitForURL(`**/reports/${reportId}`);
    await page.getByRole('heading', { name: 'In the full report' }).waitFor();
    await page.getByRole('button', { name: /Buy the report · €390/ }).waitFor();
    const direct = await page.request.get(`/api/reports/${reportId}/pdf`);
    expect(direct.status()).toBe(404);
    await screenshot(page, 'report-summary-locked');
    await page.close();
  });

  it('takes the buyer through the payment page and back to a downloadable report', async () => {
    const page = await buyerBrowser.newPage();
    await page.goto(`/reports/${reportId}`);
    await page.getByRole('button', { name: /Buy the report/ }).click();
    await page.waitForURL(/\/checkout\/cs_/);
    await page.locator('#amount-total').waitFor();
    expect(await page.locator('#amount-total').textContent()).toContain('390');
    await screenshot(page, 'checkout-page');
    await page.locator('#pay').click();
    await page.waitForURL(/\/purchases\?checkout=cs_/);
    await page.getByText('Payment confirmed.').waitFor({ timeout: 30_000 });
    await screenshot(page, 'purchases-after-payment');

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download v1' }).click()]);
    expect(download.suggestedFilename()).toBe(`waygrade-corvane-${model.toLowerCase()}-cv-20931-v1.pdf`);
    const file = path.join(mkdtempSync(path.join(os.tmpdir(), 'waygrade-download-')), download.suggestedFilename());
    await download.saveAs(file);
    expect(readFileSync(file).subarray(0, 5).toString()).toBe('%PDF-');

    const receipt = await waitForMail(buyer.email, 'Receipt WGR-');
    expect(receipt.text).toContain(`Corvane ${model}`);
    await page.close();
  });

  it('lets a coordinator refund the order, which ends the buyer’s access and tells the buyer', async () => {
    const [order] = await db.select().from(orders).where(eq(orders.buyerId, buyer.id));
    expect(order).toMatchObject({ status: 'paid' });
    const page = await coordinatorBrowser.newPage();
    await signIn(page, coordinator.email, coordinator.password);
    await page.goto('/admin/orders');
    const row = page.getByRole('row').filter({ hasText: buyer.email });
    await row.getByText('Refund…').click();
    await row.getByLabel(/Reason, sent to the buyer/).fill('Bought twice by mistake');
    await screenshot(page, 'admin-orders-refund');
    await row.getByRole('button', { name: 'Refund and revoke access' }).click();
    await row.getByText('Bought twice by mistake').waitFor();
    await row.getByText('↩ Refunded').waitFor();

    const buyerPage = await buyerBrowser.newPage();
    const response = await buyerPage.request.get(`/api/reports/${reportId}/pdf`);
    expect(response.status()).toBe(404);
    const notice = await waitForMail(buyer.email, 'Refund of');
    expect(notice.text).toContain('Bought twice by mistake');
    await page.close();
    await buyerPage.close();
  });
});
