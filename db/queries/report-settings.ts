import 'server-only';
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { reportSettings } from '@/db/schema';
import { DEFAULT_VALIDITY_DAYS } from '@/lib/decision/report-currency';

/** Days a report stays current; the default until the coordinator sets one. */
export async function findReportValidityDays(): Promise<number> {
  const [row] = await db.select({ validityDays: reportSettings.validityDays }).from(reportSettings).where(eq(reportSettings.id, 1)).limit(1);
  return row?.validityDays ?? DEFAULT_VALIDITY_DAYS;
}
