import 'server-only';
import { and, desc, eq, ne } from 'drizzle-orm';
import { db } from '@/db/client';
import { machines, reportPdfs, reports } from '@/db/schema';
import { sealedMachineOf } from './sealed-machine';
import { provisionalOf } from './report-provisional';

/** What the public may learn from a verification code: genuineness and version, nothing paid for. */
export async function findReportByVerificationCode(code: string) {
  const [row] = await db
    .select({
      id: reports.id,
      inspectionId: reports.inspectionId,
      version: reports.version,
      status: reports.status,
      releasedAt: reports.releasedAt,
      withdrawnAt: reports.withdrawnAt,
      // Open to everyone in the catalogue too; the checks, photos and values are not.
      overallCondition: reports.overallCondition,
      overallProvisional: provisionalOf(),
      // As sealed with the version: the listing may have been edited since.
      maker: sealedMachineOf().maker,
      model: sealedMachineOf().model,
      serialNumber: sealedMachineOf().serialNumber,
      // The stored file's digest; null until the file is rendered.
      pdfSha256: reportPdfs.sha256,
    })
    .from(reports)
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .leftJoin(reportPdfs, eq(reportPdfs.reportId, reports.id))
    .where(and(eq(reports.verificationCode, code), ne(reports.status, 'draft')))
    .limit(1);
  if (!row) return null;
  const [newest] = await db
    .select({ version: reports.version, releasedAt: reports.releasedAt, verificationCode: reports.verificationCode })
    .from(reports)
    .where(and(eq(reports.inspectionId, row.inspectionId), eq(reports.status, 'released')))
    .orderBy(desc(reports.version))
    .limit(1);
  return { ...row, newerVersion: newest && newest.version > row.version ? newest : null };
}
