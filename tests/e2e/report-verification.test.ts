import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import type { BrowserContext } from 'playwright-core';
import { closeDatabase, db } from '@/db/client';
import { reports } from '@/db/schema';
import { insertDraftReport, releaseDraftReport } from '@/db/queries/report-writes';
import type { ScoringResult } from '@/lib/scoring';
import { sealReportPdf } from '@/lib/pdf/report-pdf';
import { openBrowser, screenshot } from '../support/browser';
import { createReleasedReport } from '../support/purchase-fixtures';

async function codeOf(reportId: number) {
  const [row] = await db.select({ code: reports.verificationCode, result: reports.result, machineId: reports.machineId }).from(reports).where(eq(reports.id, reportId));
  return row!;
}

describe('the public report check', () => {
  let browser: BrowserContext;
  let firstCode = '';
  let correctedCode = '';

  beforeAll(async () => {
    const { reportId, inspectionId, seller, coordinator } = await createReleasedReport({ maker: 'Oldreth', model: 'T560', serialNumber: 'OL-55120' });
    const first = await codeOf(reportId);
    firstCode = first.code;
    // A correction: the same inspection released again as version 2.
    const corrected = await db.transaction(async (tx) => {
      const draft = await insertDraftReport(tx, { inspectionId, machineId: first.machineId, surveyVersion: 6, inspectorId: null, result: first.result as ScoringResult });
      await releaseDraftReport(tx, { reportId: draft.reportId, reviewerId: coordinator.id, sellerId: seller.id });
      return draft.reportId;
    });
    correctedCode = (await codeOf(corrected)).code;
    browser = await openBrowser({ width: 390, height: 844 });
  });
  afterAll(async () => {
    await browser?.close();
    await closeDatabase();
  });

  it('confirms the current version of a genuine report without showing what buyers pay for', async () => {
    const page = await browser.newPage();
    await page.goto(`/verify/${correctedCode}`);
    await page.getByText('Genuine Waygrade report').waitFor();
    await page.getByText('This is the current version of the report.').waitFor();
    const text = (await page.locator('main').textContent()) ?? '';
    expect(text).toContain('Oldreth T560, serial OL-55120');
    expect(text).toContain('version 2');
    // No money figure (fee, repair cost or value) and no measured reading appears.
    expect(text).not.toMatch(/€|EUR|\d mm\b/);
    await screenshot(page, 'verify-genuine');
    await page.close();
  });

  it('says an earlier version is genuine but replaced, and links to the current one', async () => {
    const page = await browser.newPage();
    await page.goto(`/verify/${firstCode}`);
    await page.getByText('Genuine, but replaced by a newer version').waitFor();
    await page.getByRole('link', { name: correctedCode }).click();
    await page.getByText('This is the current version of the report.').waitFor();
    await page.close();
  });

  it('accepts the file released under the code and rejects a changed copy, computing its SHA-256 in the browser', async () => {
    const [row] = await db.select({ id: reports.id }).from(reports).where(eq(reports.verificationCode, correctedCode));
    const { pdf, sha256 } = await sealReportPdf(row!.id);
    const page = await browser.newPage();
    const uploads: string[] = [];
    page.on('request', (request) => {
      if (request.method() !== 'GET') uploads.push(`${request.method()} ${request.url()}`);
    });
    await page.goto(`/verify/${correctedCode}`);
    await page.getByTestId('released-file-sha256').getByText(sha256).waitFor();
    const input = page.getByTestId('released-file-input');
    await input.setInputFiles({ name: 'report.pdf', mimeType: 'application/pdf', buffer: pdf });
    await page.getByText('This file is the report released under this code.').waitFor();
    await screenshot(page, 'verify-file-genuine');
    // One byte changed in the middle of the file: it still opens, but it is not the released file.
    const altered = Buffer.from(pdf);
    const middle = Math.floor(altered.length / 2);
    altered[middle] = altered[middle]! ^ 0x01;
    await input.setInputFiles({ name: 'report.pdf', mimeType: 'application/pdf', buffer: altered });
    await page.getByText('This file is not the released report.').waitFor();
    expect(await page.getByTestId('released-file-verdict').textContent()).not.toContain('This file is the report released');
    // Nothing was sent anywhere: the check ran in the browser.
    expect(uploads).toEqual([]);
    await page.close();
  });

  it('tells an unknown code from a genuine one, whether typed by hand or malformed', async () => {
    const page = await browser.newPage();
    await page.goto('/verify');
    await page.getByLabel('Report code').fill(`${correctedCode.replaceAll('-', ' ').toLowerCase()}`);
    await page.getByRole('button', { name: 'Check' }).click();
    await page.getByText('Genuine Waygrade report').waitFor();

    await page.goto('/verify/WG-2222-2222-2222');
    await page.getByText('Not a Waygrade report').waitFor();
    await page.getByText('No report issued by Waygrade carries this code.', { exact: false }).waitFor();
    await screenshot(page, 'verify-unknown');

    await page.goto('/verify/not-a-code');
    await page.getByText('A report code looks like WG-7K3P-Q9XD-4MRT').waitFor();
    await page.close();
  });
});
