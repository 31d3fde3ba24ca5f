import 'server-only';
import { db } from '@/db/client';
import { findReportForDocument } from '@/db/queries/report-document';
import { collectReleaseFacts } from '@/db/queries/release-facts';
import { env } from '@/lib/env';
import { publicFileUrl } from '@/lib/storage/file-url';
import { AppError } from '@/lib/errors';
import { loadReportPhotos } from './load-report-photos';
import { pdfCache } from './pdf-cache';
import { renderReportPdf } from './render-report-pdf';
import type { ReportDocumentData } from './report-document-data';

export function verificationUrl(code: string) {
  return `${env().APP_URL.replace(/\/$/, '')}/verify/${code}`;
}

/**
 * The PDF of one report version: from the cache when a released or withdrawn version has been
 * rendered before, otherwise rendered now. Drafts are rendered every time and never cached.
 */
export async function reportPdf(reportId: number, cache = pdfCache()): Promise<{ pdf: Buffer; fromCache: boolean }> {
  const report = await findReportForDocument(reportId);
  if (!report) throw new AppError('not_found');
  const cacheable = report.status !== 'draft';
  const cacheKey = { reportId: report.id, version: report.version, verificationCode: report.verificationCode };
  if (cacheable) {
    const cached = await cache.get(cacheKey);
    if (cached) return { pdf: cached, fromCache: true };
  }
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
  const pdf = await renderReportPdf(data);
  if (cacheable && complete) await cache.put(cacheKey, pdf);
  return { pdf, fromCache: false };
}
