import 'server-only';
import { eq } from 'drizzle-orm';
import { db, primaryOf } from '@/db/client';
import type { Database } from '@/db/client';
import { reportPdfJobs, reportPdfs } from '@/db/schema';
import { findReportForDocument, findReportVersion } from '@/db/queries/report-document';
import { collectReleaseFacts } from '@/db/queries/release-facts';
import { env } from '@/lib/env';
import { publicFileUrl } from '@/lib/storage/file-url';
import { AppError } from '@/lib/errors';
import { loadReportPhotos } from './load-report-photos';
import { REPORT_PDF_LAYOUT } from './pdf-layout';
import { renderReportPdf } from './render-report-pdf';
import type { ReportDocumentData } from './report-document-data';
import { sha256Hex } from './sha256';

export function verificationUrl(code: string) {
  return `${env().APP_URL.replace(/\/$/, '')}/verify/${code}`;
}

type Reader = Pick<Database, 'select'>;

/**
 * Renders one report version as it stands: a draft with the listing as it is now, a released
 * version with what was sealed with it. `complete` is false when a photo could not be fetched.
 */
export async function renderReportVersion(reportId: number) {
  const report = await findReportForDocument(reportId);
  if (!report) throw new AppError('not_found');
  // The display size (about screen width) prints sharply at the photo's size on the page; the
  // original can be many megabytes.
  const { photos, complete } = await loadReportPhotos(
    report.photos.map((p) => ({ section: p.section, caption: p.caption, url: p.displayKey ? publicFileUrl(p.displayKey) : p.originalUrl })),
  );
  // A draft shows what its release would keep; a released version shows the copy kept with it.
  const releaseFacts =
    report.status === 'draft'
      ? await collectReleaseFacts(db, { machineId: report.machineId, inspectionId: report.inspectionId, motorPowerKw: report.result.machine.motorPowerKw })
      : report.releaseFacts;
  const data: ReportDocumentData = {
    reportId: report.id,
    version: report.version,
    verificationCode: report.verificationCode,
    verificationUrl: verificationUrl(report.verificationCode),
    releasedAt: report.releasedAt,
    machine: report.machine,
    inspectorName: report.inspectorName,
    reviewerName: report.reviewerName,
    result: report.result,
    releaseFacts,
    photos,
  };
  return { status: report.status, pdf: await renderReportPdf(data), complete };
}

export type StoredReportPdf = { pdf: Buffer; sha256: string };

/** The file sealed with a released version, checked against its recorded digest; null until it is rendered. */
export async function findStoredReportPdf(reader: Reader, reportId: number): Promise<StoredReportPdf | null> {
  const [row] = await reader.select({ pdf: reportPdfs.pdf, sha256: reportPdfs.sha256 }).from(reportPdfs).where(eq(reportPdfs.reportId, reportId)).limit(1);
  if (!row) return null;
  const pdf = Buffer.from(row.pdf);
  // Never hand out bytes that are not the ones recorded: a damaged copy is an error, not a file.
  if (sha256Hex(pdf) !== row.sha256) throw new Error(`Stored PDF of report ${reportId} does not match its recorded SHA-256`);
  return { pdf, sha256: row.sha256 };
}

export const PDF_NOT_READY = "The report's file is still being prepared: a photo could not be fetched yet. Please try again in a minute.";

/**
 * Renders a released version's PDF once and stores it with its SHA-256. The version's job row is
 * locked for the render, so the worker and a download (or two app servers) never render the same
 * version twice: whoever waits finds the file stored. A render missing a photo is not stored.
 */
export async function sealReportPdf(reportId: number, render = renderReportVersion): Promise<StoredReportPdf & { rendered: boolean }> {
  // The job row exists before the transaction locks it: an INSERT IGNORE inside it would take a shared
  // lock first, and two callers upgrading theirs to the FOR UPDATE lock deadlock.
  await db.insert(reportPdfJobs).ignore().values({ reportId, nextAttemptAt: new Date() });
  return db.transaction(async (tx) => {
    const [job] = await tx.select({ attempts: reportPdfJobs.attempts }).from(reportPdfJobs).where(eq(reportPdfJobs.reportId, reportId)).for('update');
    const stored = await findStoredReportPdf(tx, reportId);
    if (stored) return { ...stored, rendered: false };
    const { status, pdf, complete } = await render(reportId);
    if (status === 'draft') throw new AppError('conflict', 'A draft report is not sealed; release it first.');
    if (!complete) throw new AppError('unavailable', PDF_NOT_READY);
    const sha256 = sha256Hex(pdf);
    await tx.insert(reportPdfs).values({ reportId, sha256, byteLength: pdf.length, pdf, layout: REPORT_PDF_LAYOUT });
    await tx.update(reportPdfJobs).set({ doneAt: new Date(), attempts: (job?.attempts ?? 0) + 1, lastError: null }).where(eq(reportPdfJobs.reportId, reportId));
    return { pdf, sha256, rendered: true };
  });
}

/**
 * The PDF of one report version. A released or withdrawn version is served as stored at release
 * (sealed now, once, if the worker has not done it yet); a draft is rendered every time, never stored.
 */
export async function reportPdf(reportId: number, render = renderReportVersion): Promise<{ pdf: Buffer; sha256: string | null; fromStore: boolean }> {
  const stored = await findStoredReportPdf(primaryOf(db), reportId);
  if (stored) return { ...stored, fromStore: true };
  const version = await findReportVersion(reportId);
  if (!version) throw new AppError('not_found');
  if (version.status === 'draft') return { pdf: (await render(reportId)).pdf, sha256: null, fromStore: false };
  const sealed = await sealReportPdf(reportId, render);
  return { pdf: sealed.pdf, sha256: sealed.sha256, fromStore: !sealed.rendered };
}
