import 'server-only';
import { and, asc, count, desc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { inspections, inspectionStatusEvents, machineDisclosures, machineInclusions, machineMovingSheets, machines, reports, users } from '@/db/schema';
import { provisionalOf } from './report-provisional';

/** One machine as its seller (or a coordinator) sees it. */
export async function getMachine(machineId: number) {
  const [row] = await db.select().from(machines).where(eq(machines.id, machineId));
  return row ?? null;
}

/**
 * What the seller has told beyond the listing: when the disclosure was last answered, the moving
 * sheet's weight and access, and how many things are listed as coming with the machine.
 */
export async function findListingExtras(machineId: number) {
  const [[disclosure], [moving], [inclusions]] = await Promise.all([
    db.select({ answeredAt: machineDisclosures.updatedAt }).from(machineDisclosures).where(eq(machineDisclosures.machineId, machineId)),
    db.select({ weightKg: machineMovingSheets.weightKg, siteAccess: machineMovingSheets.siteAccess }).from(machineMovingSheets).where(eq(machineMovingSheets.machineId, machineId)),
    db.select({ items: count() }).from(machineInclusions).where(eq(machineInclusions.machineId, machineId)),
  ]);
  return { disclosureAnsweredAt: disclosure?.answeredAt ?? null, movingSheet: moving ?? null, inclusions: inclusions?.items ?? 0 };
}

/** Every inspection of a machine, newest first, each with its status history. */
export async function listMachineInspections(machineId: number) {
  const rows = await db
    .select({
      id: inspections.id,
      status: inspections.status,
      scheduledAt: inspections.scheduledAt,
      preferredDates: inspections.preferredDates,
      siteContactName: inspections.siteContactName,
      cancelReason: inspections.cancelReason,
      inspectorName: users.name,
      createdAt: inspections.createdAt,
    })
    .from(inspections)
    .leftJoin(users, eq(users.id, inspections.inspectorId))
    .where(eq(inspections.machineId, machineId))
    .orderBy(desc(inspections.id));
  const events = rows.length
    ? await db
        .select({
          inspectionId: inspectionStatusEvents.inspectionId,
          toStatus: inspectionStatusEvents.toStatus,
          note: inspectionStatusEvents.note,
          createdAt: inspectionStatusEvents.createdAt,
        })
        .from(inspectionStatusEvents)
        .innerJoin(inspections, eq(inspections.id, inspectionStatusEvents.inspectionId))
        .where(eq(inspections.machineId, machineId))
        .orderBy(asc(inspectionStatusEvents.createdAt), asc(inspectionStatusEvents.id))
    : [];
  const releasedReports = await db
    .select({ id: reports.id, inspectionId: reports.inspectionId, version: reports.version, overallCondition: reports.overallCondition, overallProvisional: provisionalOf(), verificationCode: reports.verificationCode, releasedAt: reports.releasedAt })
    .from(reports)
    .where(and(eq(reports.machineId, machineId), eq(reports.status, 'released')))
    .orderBy(desc(reports.version));
  return rows.map((row) => ({
    ...row,
    events: events.filter((e) => e.inspectionId === row.id),
    reports: releasedReports.filter((r) => r.inspectionId === row.id),
  }));
}
