import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHash, randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { reportPdfJobs, reportPdfs, reports } from '@/db/schema';
import { exportComparison } from '@/lib/comparison/export-comparison';
import { listComparisonPage } from '@/lib/comparison/list-comparison-page';
import { renderReportVersion, reportPdf, sealReportPdf } from '@/lib/pdf/report-pdf';
import { releaseReport } from '@/lib/workflow/review';
import { updateMachine } from '@/lib/workflow/machines';
import { createAccount, type TestAccount } from '../support/accounts';
import { pdfToText } from '../support/pdf-text';
import { sessionCookie } from '../support/private-stack';
import { createInspection, createMachine, createSubmittedSurvey } from '../support/workflow-fixtures';

const APP_URL = process.env.APP_URL ?? 'http://localhost:3100';
const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');
const cookieOf = (account: TestAccount) => sessionCookie({ id: account.id, role: account.role, name: account.name, email: account.email, sessionVersion: 0 });

/** A page's visible words: tags and React's text separators removed, whitespace collapsed. */
async function pageText(path: string, account: TestAccount | null) {
  const response = await fetch(`${APP_URL}${path}`, { headers: account ? { cookie: await cookieOf(account) } : {}, redirect: 'manual' });
  expect(response.status, path).toBe(200);
  const html = await response.text();
  return html
    .replace(/<script[\s\S]*?<\/script>/g, ' ')
    .replace(/<!-- -->/g, '')
    .replace(/<[^>]+>/g, ' ')
    .replace(/&amp;/g, '&')
    .replace(/&#x27;/g, "'")
    .replace(/\s+/g, ' ');
}

async function databaseRefusal(statement: Promise<unknown>) {
  try {
    await statement;
    return 'statement was accepted';
  } catch (error) {
    return String((error as { cause?: { message?: string } }).cause?.message ?? (error as Error).message);
  }
}

async function releasedLathe(seller: TestAccount, coordinator: TestAccount, inspector: TestAccount, listing: Parameters<typeof createMachine>[1]) {
  const machineId = await createMachine(seller.id, listing);
  const inspectionId = await createInspection(machineId, seller.id, 'in_review', inspector.id);
  const { reportId } = await createSubmittedSurvey(inspectionId);
  expect(await releaseReport.execute(coordinator.actor, { inspectionId, reportId })).toMatchObject({ ok: true });
  return { machineId, reportId };
}

afterAll(async () => {
  await closeDatabase();
});

describe('a released report after the seller edits the listing', () => {
  const tag = randomUUID().slice(0, 8);
  const maker = `Sealwick ${tag}`;
  const listing = {
    maker,
    model: 'SW-460',
    serialNumber: `SW-${tag}`,
    latheKind: 'general_purpose' as const,
    yearBuilt: 1991,
    swingMm: 460,
    betweenCentresMm: 1500,
    spindleBoreMm: 52,
    motorKw: '5.50',
    supplyVoltage: 400,
    supplyPhases: 3,
    sizeClass: 'medium' as const,
    town: 'Oldhythe',
    region: 'Fenmark',
    askingPriceMinor: 720_000,
    accessories: 'Fixed steady',
  };
  // Every field of the listing form changed at once.
  const edit = {
    maker: `Renamed Works ${tag}`,
    model: 'RX-9',
    serialNumber: `RX-${tag}`,
    latheKind: 'toolroom' as const,
    yearBuilt: 2015,
    swingMm: 520,
    betweenCentresMm: 2000,
    spindleBoreMm: 80,
    motorKw: 7.5,
    supplyVoltage: 230,
    supplyPhases: 1,
    town: 'Newhythe',
    region: 'Elsewhere',
    askingPrice: 6_500,
    accessories: 'Nothing',
    description: 'Freshly repainted',
    listingStatus: 'listed' as const,
  };
  let seller: TestAccount, coordinator: TestAccount, dealer: TestAccount;
  let reportId: number, otherReportId: number, machineId: number;
  let sealedBytes: Buffer, recordedSha: string, code: string;

  beforeAll(async () => {
    let inspector: TestAccount;
    [seller, coordinator, inspector, dealer] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector'), createAccount('dealer')]);
    ({ machineId, reportId } = await releasedLathe(seller, coordinator, inspector, listing));
    ({ reportId: otherReportId } = await releasedLathe(seller, coordinator, inspector, { maker: `Other ${tag}` }));
    // What the background worker does for each released version (the app server's own worker may be first; the lock makes that the same).
    await sealReportPdf(reportId);
    await sealReportPdf(otherReportId);
    const [stored] = await db.select().from(reportPdfs).where(eq(reportPdfs.reportId, reportId));
    sealedBytes = Buffer.from(stored!.pdf);
    recordedSha = stored!.sha256;
    const [report] = await db.select({ code: reports.verificationCode }).from(reports).where(eq(reports.id, reportId));
    code = report!.code;
    expect(await updateMachine.execute(seller.actor, { machineId, ...edit })).toMatchObject({ ok: true });
  }, 120_000);

  it('keeps on the report page what was released, with the listing’s new words beside it', async () => {
    const text = await pageText(`/reports/${reportId}`, coordinator);
    expect(text).toContain(`${maker} SW-460`);
    expect(text).toContain('Oldhythe, Fenmark');
    expect(text).toContain('General-purpose centre lathe');
    expect(text).toMatch(/Swing over bed 460 mm Listing now says 520 mm — changed since the report/);
    expect(text).toMatch(/Between centres 1,500 mm Listing now says 2,000 mm — changed since the report/);
    expect(text).toMatch(/Built 1991 Listing now says 2015 — changed since the report/);
    expect(text).toMatch(/Asking price at release €7,200 Listing now says €6,500 — changed since the report/);
    expect(text).toContain(`Serial number: SW-${tag} Listing now says RX-${tag} — changed since the report`);
    expect(text).toContain('Spindle bore: 52 mm Listing now says 80 mm — changed since the report');
    // The new maker appears only inside the note that says the listing changed.
    expect(text.split(`Renamed Works ${tag}`).length - 1).toBe(text.split(`Listing now says Renamed Works ${tag} — changed since the report`).length - 1);
  });

  it('serves the PDF sealed at release, byte for byte, with its recorded SHA-256', async () => {
    expect(sha256(sealedBytes)).toBe(recordedSha);
    const response = await fetch(`${APP_URL}/api/reports/${reportId}/pdf`, { headers: { cookie: await cookieOf(coordinator) } });
    expect(response.status).toBe(200);
    const bytes = Buffer.from(await response.arrayBuffer());
    expect(sha256(bytes)).toBe(recordedSha);
    expect(response.headers.get('x-waygrade-report-cache')).toBe('hit');
    expect(response.headers.get('repr-digest')).toBe(`sha-256=:${Buffer.from(recordedSha, 'hex').toString('base64')}:`);
    const text = pdfToText(bytes);
    expect(text).toContain(maker);
    expect(text).not.toContain('Renamed Works');
  });

  it('names the released machine and the file’s SHA-256 on the public verify page', async () => {
    const text = await pageText(`/verify/${code}`, null);
    expect(text).toContain(`${maker} SW-460, serial SW-${tag}`);
    expect(text).toContain(recordedSha);
    expect(text).not.toContain('Renamed Works');
  });

  it('keeps the released facts in the comparison table, its CSV and side by side', async () => {
    const page = await listComparisonPage.execute(dealer.actor, { q: tag });
    expect(page.ok).toBe(true);
    const row = page.ok ? page.data.rows.find((r) => r.reportId === reportId) : undefined;
    expect(row).toMatchObject({ maker, model: 'SW-460', swingMm: 460, betweenCentresMm: 1500, yearBuilt: 1991, town: 'Oldhythe', region: 'Fenmark' });
    // The asking price is the listing's own today, as the table's price column says.
    expect(row).toMatchObject({ askingPriceMinor: 650_000 });

    const csv = await exportComparison.execute(dealer.actor, { q: tag });
    expect(csv.ok).toBe(true);
    const text = csv.ok ? csv.data.csv : '';
    expect(text).toContain(maker);
    expect(text).not.toContain('Renamed Works');
    expect(text).not.toContain('Newhythe');

    const side = await pageText(`/compare/side-by-side?reports=${reportId},${otherReportId}`, dealer);
    expect(side).toContain(maker);
    expect(side).not.toContain('Renamed Works');
    expect(side).not.toContain('Newhythe');
  });
});

describe('the sealed copy in the database', () => {
  it('refuses to change the machine sealed with a released version, or its stored file', async () => {
    const [seller, coordinator, inspector] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector')]);
    const { reportId } = await releasedLathe(seller, coordinator, inspector, {});
    await sealReportPdf(reportId);
    const [row] = await db.select({ machineSnapshot: reports.machineSnapshot }).from(reports).where(eq(reports.id, reportId));
    const sealed = (typeof row!.machineSnapshot === 'string' ? JSON.parse(row!.machineSnapshot) : row!.machineSnapshot) as Record<string, unknown>;
    expect(sealed).toMatchObject({ maker: 'Corvane', swingMm: 330 });

    await expect(databaseRefusal(db.update(reports).set({ machineSnapshot: { ...sealed, swingMm: 999 } }).where(eq(reports.id, reportId)))).resolves.toMatch(/cannot be changed/);
    await expect(databaseRefusal(db.update(reports).set({ machineSnapshot: null }).where(eq(reports.id, reportId)))).resolves.toMatch(/cannot be changed/);
    await expect(databaseRefusal(db.update(reportPdfs).set({ pdf: Buffer.from('%PDF-forged') }).where(eq(reportPdfs.reportId, reportId)))).resolves.toMatch(/cannot be changed/);
    await expect(databaseRefusal(db.update(reportPdfs).set({ sha256: '0'.repeat(64) }).where(eq(reportPdfs.reportId, reportId)))).resolves.toMatch(/cannot be changed/);
    await expect(databaseRefusal(db.delete(reportPdfs).where(eq(reportPdfs.reportId, reportId)))).resolves.toMatch(/cannot be deleted/);
  }, 60_000);

  it('refuses a release without the sealed machine, and a stored file for a draft', async () => {
    const [seller, inspector] = await Promise.all([createAccount('seller'), createAccount('inspector')]);
    const machineId = await createMachine(seller.id);
    const inspectionId = await createInspection(machineId, seller.id, 'in_review', inspector.id);
    const { reportId } = await createSubmittedSurvey(inspectionId);
    await expect(databaseRefusal(db.update(reports).set({ status: 'released', releasedAt: new Date() }).where(eq(reports.id, reportId)))).resolves.toMatch(/reports_released_sealed/);
    await expect(
      databaseRefusal(db.insert(reportPdfs).values({ reportId, sha256: sha256(Buffer.from('%PDF')), byteLength: 4, pdf: Buffer.from('%PDF'), layout: 4 })),
    ).resolves.toMatch(/draft report has no sealed file/);
  }, 60_000);
});

describe('downloading a released report', () => {
  it('serves the stored file without rendering, and renders a version not yet stored once however many ask', async () => {
    const [seller, coordinator, inspector] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector')]);
    const { reportId } = await releasedLathe(seller, coordinator, inspector, {});
    // Kept from the app server's worker, which shares this database, so the downloads below are the first to ask.
    await db.update(reportPdfJobs).set({ nextAttemptAt: new Date(Date.now() + 86_400_000) }).where(eq(reportPdfJobs.reportId, reportId));
    // The worker has not run: three downloads at once render once between them; the others wait for the lock and find the file.
    let renders = 0;
    const countingRender = async (id: number) => {
      renders += 1;
      return renderReportVersion(id);
    };
    const first = await Promise.all([reportPdf(reportId, countingRender), reportPdf(reportId, countingRender), reportPdf(reportId, countingRender)]);
    expect(renders).toBe(1);
    const [stored] = await db.select({ sha256: reportPdfs.sha256 }).from(reportPdfs).where(eq(reportPdfs.reportId, reportId));
    for (const answer of first) expect(sha256(answer.pdf)).toBe(stored!.sha256);
    const [job] = await db.select().from(reportPdfJobs).where(eq(reportPdfJobs.reportId, reportId));
    expect(job!.doneAt).not.toBeNull();

    // Afterwards a download never renders: a renderer that fails proves it is not called.
    const refuse = async (): Promise<never> => {
      throw new Error('rendered on download');
    };
    const later = await reportPdf(reportId, refuse);
    expect(later.fromStore).toBe(true);
    expect(sha256(later.pdf)).toBe(stored!.sha256);
  }, 120_000);
});
