import 'server-only';
import { and, asc, eq, isNull, lte } from 'drizzle-orm';
import { db } from '@/db/client';
import { reportPdfJobs } from '@/db/schema';
import { env } from '@/lib/env';
import { sealReportPdf } from './report-pdf';

/** How the worker retries a version whose photos could not all be fetched: a minute, doubling up to an hour. */
export function pdfRetryDelayMs(attemptsSoFar: number) {
  return Math.min(60_000 * 2 ** Math.max(0, attemptsSoFar - 1), 60 * 60_000);
}

export type PdfJobSummary = { sealed: number; retrying: number };

/**
 * Renders and stores the PDF of every released version waiting for one, oldest first, one at a time
 * (a render takes a core for about a second). Used by the interval worker and by tests.
 */
export async function sealPendingReportPdfs(options: { now?: Date; limit?: number } = {}): Promise<PdfJobSummary> {
  const now = options.now ?? new Date();
  const due = await db
    .select({ reportId: reportPdfJobs.reportId, attempts: reportPdfJobs.attempts })
    .from(reportPdfJobs)
    .where(and(isNull(reportPdfJobs.doneAt), lte(reportPdfJobs.nextAttemptAt, now)))
    .orderBy(asc(reportPdfJobs.nextAttemptAt))
    .limit(options.limit ?? 5);
  const summary: PdfJobSummary = { sealed: 0, retrying: 0 };
  for (const job of due) {
    try {
      await sealReportPdf(job.reportId);
      summary.sealed += 1;
    } catch (error) {
      const attempts = job.attempts + 1;
      await db
        .update(reportPdfJobs)
        .set({ attempts, nextAttemptAt: new Date(now.getTime() + pdfRetryDelayMs(attempts)), lastError: (error instanceof Error ? error.message : String(error)).slice(0, 2000) })
        .where(and(eq(reportPdfJobs.reportId, job.reportId), isNull(reportPdfJobs.doneAt)));
      summary.retrying += 1;
    }
  }
  return summary;
}

const globalForWorker = globalThis as unknown as { waygradePdfWorker?: ReturnType<typeof setInterval> };

/** Seals released reports' PDFs every few seconds in this process; safe on every app server (the job row is locked per render). */
export function startReportPdfWorker() {
  const intervalMs = env().REPORT_PDF_WORKER_INTERVAL_MS;
  if (globalForWorker.waygradePdfWorker || intervalMs === 0) return;
  let running = false;
  const timer = setInterval(() => {
    if (running) return;
    running = true;
    sealPendingReportPdfs()
      .catch((error: unknown) => console.error('[report-pdf] sealing stored PDFs failed; will try again', error))
      .finally(() => {
        running = false;
      });
  }, intervalMs);
  timer.unref?.();
  globalForWorker.waygradePdfWorker = timer;
}
