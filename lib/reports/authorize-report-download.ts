import 'server-only';
import { db } from '@/db/client';
import { findReportVersion } from '@/db/queries/report-document';
import { hasReportAccess } from '@/db/queries/report-access';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { reportDownloadFilename } from '@/lib/pdf/download-filename';
import { reportIdSchema } from '@/lib/validation/payments';

/**
 * Checked on every download: a coordinator may read any report (drafts included, for review);
 * anyone else needs an unrevoked grant for the report or an earlier version of it. Each download
 * is audited, so Waygrade can say later which version a person received.
 */
export const authorizeReportDownload = defineOperation({
  name: 'report.download',
  entityType: 'report',
  access: 'report.download.granted',
  input: reportIdSchema,
  authorize: async ({ actor, input }) => actor!.role === 'admin' || hasReportAccess(db, actor!.id, input.reportId),
  async run({ actor, input }) {
    const report = await findReportVersion(input.reportId);
    if (!report || (report.status === 'draft' && actor!.role !== 'admin')) throw new AppError('not_found');
    return {
      data: { reportId: report.id, version: report.version, status: report.status, filename: reportDownloadFilename(report) },
      entityId: report.id,
      detail: { version: report.version },
    };
  },
});
