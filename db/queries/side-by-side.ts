import 'server-only';
import { inArray } from 'drizzle-orm';
import { comparableSales, comparisonEntries, reports } from '@/db/schema';
import type { Database } from '@/db/client';
import type { ScoringResult } from '@/lib/scoring/result';

type Reader = Pick<Database, 'select'>;

/** The current released reports among these ids, in the order asked for. */
export async function loadComparisonEntries(reader: Reader, reportIds: readonly number[]) {
  const rows = await reader.select().from(comparisonEntries).where(inArray(comparisonEntries.reportId, [...reportIds]));
  const byId = new Map(rows.map((r) => [r.reportId, r]));
  return reportIds.map((id) => byId.get(id)).filter((row): row is (typeof rows)[number] => Boolean(row));
}
export type ComparisonEntry = Awaited<ReturnType<typeof loadComparisonEntries>>[number];

/** Full scoring results (checks, valuation) of reports the reader may see in full. */
export async function loadReportResults(reader: Reader, reportIds: readonly number[]) {
  if (reportIds.length === 0) return new Map<number, ScoringResult>();
  const rows = await reader.select({ id: reports.id, result: reports.result }).from(reports).where(inArray(reports.id, [...reportIds]));
  return new Map(rows.map((r) => [r.id, (typeof r.result === 'string' ? JSON.parse(r.result) : r.result) as ScoringResult]));
}

/** Comparable sales by id, for showing which ones a valuation used. */
export async function loadComparableSalesByIds(reader: Reader, ids: readonly number[]) {
  if (ids.length === 0) return new Map<number, typeof comparableSales.$inferSelect>();
  const rows = await reader.select().from(comparableSales).where(inArray(comparableSales.id, [...ids]));
  return new Map(rows.map((r) => [r.id, r]));
}
