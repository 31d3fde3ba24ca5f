import 'server-only';
import { and, count, desc, eq, inArray, isNull, sql } from 'drizzle-orm';
import { db } from '@/db/client';
import { inspections, machines, orders, reportAccessGrants, reports, users } from '@/db/schema';

/** A seller's machines with the status of their latest inspection. */
export async function listSellerMachines(sellerId: string) {
  const latest = db
    .select({ machineId: inspections.machineId, id: sql<number>`max(${inspections.id})`.as('latest_id') })
    .from(inspections)
    .groupBy(inspections.machineId)
    .as('latest');
  return db
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
    .leftJoin(latest, eq(latest.machineId, machines.id))
    .leftJoin(inspections, eq(inspections.id, latest.id))
    .where(eq(machines.sellerId, sellerId))
    .orderBy(desc(machines.updatedAt));
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
      maker: machines.maker,
      model: machines.model,
      swingMm: machines.swingMm,
      betweenCentresMm: machines.betweenCentresMm,
      yearBuilt: machines.yearBuilt,
      town: machines.town,
      overallCondition: reports.overallCondition,
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
      maker: machines.maker,
      model: machines.model,
      overallCondition: reports.overallCondition,
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
