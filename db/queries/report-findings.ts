import 'server-only';
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { reports } from '@/db/schema';
import type { ScoringResult } from '@/lib/scoring';

export type ReportFindings = Pick<ScoringResult, 'dealBreakers' | 'notInspected'>;

/**
 * The deal-breakers and the list of what was not inspected, from the stored scoring result of one
 * report. Results stored before scoring 1.1 carry neither, and read as empty lists.
 */
export async function findReportFindings(reportId: number): Promise<ReportFindings | null> {
  const [row] = await db.select({ result: reports.result }).from(reports).where(eq(reports.id, reportId)).limit(1);
  if (!row) return null;
  const result = (typeof row.result === 'string' ? JSON.parse(row.result) : row.result) as Partial<ScoringResult> | null;
  return { dealBreakers: result?.dealBreakers ?? [], notInspected: result?.notInspected ?? [] };
}
