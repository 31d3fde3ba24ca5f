import 'server-only';
import { and, count, desc, eq, isNull, sql } from 'drizzle-orm';
import { db } from '@/db/client';
import { inspectionFees, machines, reportAccessGrants, reports } from '@/db/schema';
import type { MachineSearch } from '@/lib/validation/list-filters';
import { makerOrModelContains } from './like-pattern';
import { sealedMachineOf } from './sealed-machine';
import { provisionalOf } from './report-provisional';

/** Machines per page of the catalogue: a dozen rows of two cards. */
export const CATALOGUE_PAGE_SIZE = 24;

const sealed = sealedMachineOf();

/** What anyone browsing may see of a report: the machine and its overall condition, nothing bought. */
const catalogueColumns = {
  id: reports.id,
  version: reports.version,
  overallCondition: reports.overallCondition,
  overallProvisional: provisionalOf(),
  releasedAt: reports.releasedAt,
  machineId: machines.id,
  // What the released version states, not what the listing says today.
  maker: sealed.maker,
  model: sealed.model,
  latheKind: sealed.latheKind,
  yearBuilt: sealed.yearBuilt,
  swingMm: sealed.swingMm,
  betweenCentresMm: sealed.betweenCentresMm,
  sizeClass: machines.sizeClass,
  town: sealed.town,
  region: sealed.region,
  askingPriceMinor: machines.askingPriceMinor,
  machineCurrency: machines.currency,
  sellerId: machines.sellerId,
  feeMinor: inspectionFees.amountMinor,
  feeCurrency: inspectionFees.currency,
};

/** Inspections this person holds an unrevoked grant for (any version), as a joinable subquery. */
function accessibleInspections(userId: string) {
  return db
    .selectDistinct({ inspectionId: reports.inspectionId })
    .from(reportAccessGrants)
    .innerJoin(reports, eq(reports.id, reportAccessGrants.reportId))
    .where(and(eq(reportAccessGrants.userId, userId), isNull(reportAccessGrants.revokedAt)))
    .as('accessible');
}

/**
 * One page of the current released version of every inspected machine, newest first, with the fee to
 * buy it, and how many there are in all; `q` looks for a maker or model.
 */
export async function listCatalogueReports(userId: string, filters: MachineSearch) {
  const accessible = accessibleInspections(userId);
  const where = and(eq(reports.status, 'released'), isNull(reports.supersededById), filters.q ? makerOrModelContains(filters.q) : undefined);
  const [rows, [total]] = await Promise.all([
    db
      .select({ ...catalogueColumns, hasAccess: sql<number>`${accessible.inspectionId} is not null` })
      .from(reports)
      .innerJoin(machines, eq(machines.id, reports.machineId))
      .leftJoin(inspectionFees, and(eq(inspectionFees.machineType, machines.machineType), eq(inspectionFees.sizeClass, machines.sizeClass)))
      .leftJoin(accessible, eq(accessible.inspectionId, reports.inspectionId))
      .where(where)
      .orderBy(desc(reports.releasedAt), desc(reports.id))
      .limit(CATALOGUE_PAGE_SIZE)
      .offset((filters.page - 1) * CATALOGUE_PAGE_SIZE),
    db.select({ total: count() }).from(reports).innerJoin(machines, eq(machines.id, reports.machineId)).where(where),
  ]);
  return { rows: rows.map((row) => ({ ...row, hasAccess: Boolean(Number(row.hasAccess)) })), total: total?.total ?? 0 };
}

/** One released report's open summary, or null when it is not (or no longer) for sale. */
export async function findCatalogueReport(reportId: number, userId: string) {
  const accessible = accessibleInspections(userId);
  const [row] = await db
    .select({
      ...catalogueColumns,
      status: reports.status,
      supersededById: reports.supersededById,
      safetyFindings: reports.safetyFindings,
      confidence: reports.confidence,
      hasAccess: sql<number>`${accessible.inspectionId} is not null`,
    })
    .from(reports)
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .leftJoin(inspectionFees, and(eq(inspectionFees.machineType, machines.machineType), eq(inspectionFees.sizeClass, machines.sizeClass)))
    .leftJoin(accessible, eq(accessible.inspectionId, reports.inspectionId))
    .where(and(eq(reports.id, reportId), eq(reports.status, 'released')))
    .limit(1);
  return row ? { ...row, hasAccess: Boolean(Number(row.hasAccess)) } : null;
}
