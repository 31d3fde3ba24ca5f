import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import { reportAccessGrants, reports } from '@/db/schema';
import { primaryOf, type Database } from '@/db/client';

type Reader = Pick<Database, 'select'>;

const grantedReport = alias(reports, 'granted_report');

/**
 * May this person download this report? Yes with an unrevoked grant for it or for another version
 * of the same inspection: a buyer who paid keeps every later correction, as the receipt promises.
 * Read from the primary: the buyer downloads straight after the payment's grant is written, before
 * a replica may have it.
 */
export async function hasReportAccess(reader: Reader, userId: string, reportId: number, options: { locking?: boolean } = {}): Promise<boolean> {
  const query = primaryOf(reader)
    .select({ id: reportAccessGrants.id })
    .from(reports)
    .innerJoin(grantedReport, eq(grantedReport.inspectionId, reports.inspectionId))
    .innerJoin(reportAccessGrants, eq(reportAccessGrants.reportId, grantedReport.id))
    .where(and(eq(reports.id, reportId), eq(reportAccessGrants.userId, userId), isNull(reportAccessGrants.revokedAt)))
    .limit(1);
  // `locking` reads the latest commit rather than the transaction's snapshot: a grant another
  // transaction wrote while this one waited for a lock is seen.
  const [row] = options.locking ? await query.for('update') : await query;
  return Boolean(row);
}
