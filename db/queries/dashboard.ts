import 'server-only';
import { and, count, desc, eq, inArray, isNull, sql } from 'drizzle-orm';
import { db } from '@/db/client';
import { inspections, machines, orders, reportAccessGrants, reports, users } from '@/db/schema';
import type { MachineSearch } from '@/lib/validation/list-filters';
import { makerOrModelContains } from './like-pattern';
import { provisionalOf } from './report-provisional';
import { sealedMachineOf } from './sealed-machine';

/** Machines per page of a seller's list. */
export const SELLER_MACHINES_PAGE_SIZE = 25;

/**
 * One page of a seller's machines, last changed first, with the status of each one's latest
 * inspection, and how many there are in all; `q` looks for a maker or model.
 */
export async function listSellerMachines(sellerId: string, filters: MachineSearch, pageSize = SELLER_MACHINES_PAGE_SIZE) {
  const where = and(eq(machines.sellerId, sellerId), filters.q ? makerOrModelContains(filters.q) : undefined);
  // The latest inspection of each machine on the page only, by the machine index.
  const latestInspection = sql`(select max(${inspections.id}) from ${inspections} where ${inspections.machineId} = ${machines.id})`;
  const [rows, [total]] = await Promise.all([
    db
      .select({
        id: machines.id,
        maker: machines.maker,
        model: machines.model,
        swingMm: machines.swingMm,
        betweenCentresMm: machines.betweenCentresMm,
        yearBuilt: machines.yearBuilt,
        listingStatus: machines.listingStatus,
        inspectionStatus: inspections.status,
        scheduledAt: inspections.scheduledAt,
      })
      .from(machines)
      .leftJoin(inspections, eq(inspections.id, latestInspection))
      .where(where)
      .orderBy(desc(machines.updatedAt), desc(machines.id))
      .limit(pageSize)
      .offset((filters.page - 1) * pageSize),
    db.select({ total: count() }).from(machines).where(where),
  ]);
  return { rows, total: total?.total ?? 0 };
}

/** Inspections assigned to an inspector that are not finished. */
export async function listInspectorJobs(inspectorId: string) {
  return db
    .select({
      id: inspections.id,
      status: inspections.status,
      scheduledAt: inspections.scheduledAt,
      maker: machines.maker,
      model: machines.model,
      town: machines.town,
    })
    .from(inspections)
    .innerJoin(machines, eq(machines.id, inspections.machineId))
    .where(and(eq(inspections.inspectorId, inspectorId), inArray(inspections.status, ['booked', 'on_site', 'in_review'])))
    .orderBy(inspections.scheduledAt);
}

export async function countInspectionsByStatus() {
  return db.select({ status: inspections.status, total: count() }).from(inspections).groupBy(inspections.status);
}

export async function countUsersByRole() {
  return db.select({ role: users.role, total: count() }).from(users).where(isNull(users.deactivatedAt)).groupBy(users.role);
}

/** The newest released reports: machine summary and overall condition only. */
export async function listRecentReleasedReports(limit: number) {
  return db
    .select({
      id: reports.id,
      // As sealed with the version: the listing may have been edited since.
      maker: sealedMachineOf().maker,
      model: sealedMachineOf().model,
      swingMm: sealedMachineOf().swingMm,
      betweenCentresMm: sealedMachineOf().betweenCentresMm,
      yearBuilt: sealedMachineOf().yearBuilt,
      town: sealedMachineOf().town,
      overallCondition: reports.overallCondition,
      overallProvisional: provisionalOf(),
      releasedAt: reports.releasedAt,
    })
    .from(reports)
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .where(eq(reports.status, 'released'))
    .orderBy(desc(reports.releasedAt))
    .limit(limit);
}

/** Reports a person may download, with the order that granted them where there is one. */
export async function listGrantedReports(userId: string) {
  return db
    .select({
      reportId: reports.id,
      maker: sealedMachineOf().maker,
      model: sealedMachineOf().model,
      overallCondition: reports.overallCondition,
      overallProvisional: provisionalOf(),
      reason: reportAccessGrants.reason,
      grantedAt: reportAccessGrants.grantedAt,
      amountMinor: orders.amountMinor,
      currency: orders.currency,
    })
    .from(reportAccessGrants)
    .innerJoin(reports, eq(reports.id, reportAccessGrants.reportId))
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .leftJoin(orders, eq(orders.id, reportAccessGrants.orderId))
    .where(and(eq(reportAccessGrants.userId, userId), isNull(reportAccessGrants.revokedAt)))
    .orderBy(desc(reportAccessGrants.grantedAt));
}
