import 'server-only';
import { sql, type AnyColumn } from 'drizzle-orm';
import { reports } from '@/db/schema';

/**
 * Whether a report version's grade is provisional (too little measured for a firm grade), read from
 * its stored scoring result. Results scored before 1.2 carry no flag: their grade was released firm.
 */
export function provisionalOf(report: { result: AnyColumn } = reports) {
  return sql<boolean>`COALESCE(JSON_EXTRACT(${report.result}, '$.provisional') = 'true', FALSE)`.mapWith((value: unknown) => Number(value) === 1);
}
