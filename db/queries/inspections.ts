import 'server-only';
import { and, asc, count, desc, eq, gte, inArray, isNull, sql } from 'drizzle-orm';
import { db } from '@/db/client';
import { inspectionFees, inspections, inspectionStatusEvents, machines, photos, reinspectionRequests, reports, surveys, users } from '@/db/schema';
import type { InspectionStatus } from '@/db/schema/inspections';
import type { SizeClass } from '@/lib/machine-size';

/** The coordinator's queue: inspections in the given statuses, oldest request first. */
export async function listInspectionQueue(statuses: InspectionStatus[]) {
  return db
    .select({
      id: inspections.id,
      status: inspections.status,
      createdAt: inspections.createdAt,
      scheduledAt: inspections.scheduledAt,
      preferredDates: inspections.preferredDates,
      maker: machines.maker,
      model: machines.model,
      swingMm: machines.swingMm,
      betweenCentresMm: machines.betweenCentresMm,
      sizeClass: machines.sizeClass,
      town: machines.town,
      region: machines.region,
      inspectorName: users.name,
      // Opened by a paid re-inspection request rather than by the seller.
      reinspection: sql`exists (select 1 from ${reinspectionRequests} where ${reinspectionRequests.inspectionId} = ${inspections.id})`.mapWith((v) => Number(v) === 1),
    })
    .from(inspections)
    .innerJoin(machines, eq(machines.id, inspections.machineId))
    .leftJoin(users, eq(users.id, inspections.inspectorId))
    .where(inArray(inspections.status, statuses))
    .orderBy(asc(inspections.createdAt));
}

export async function countOpenInspections() {
  return db
    .select({ status: inspections.status, total: count() })
    .from(inspections)
    .where(inArray(inspections.status, ['requested', 'booked', 'on_site', 'in_review']))
    .groupBy(inspections.status);
}

/** One inspection with its machine, seller and people, for the coordinator's page. */
export async function getInspection(inspectionId: number) {
  const [row] = await db
    .select({ inspection: inspections, machine: machines, sellerName: users.name, sellerEmail: users.email })
    .from(inspections)
    .innerJoin(machines, eq(machines.id, inspections.machineId))
    .innerJoin(users, eq(users.id, machines.sellerId))
    .where(eq(inspections.id, inspectionId));
  if (!row) return null;
  const events = await db
    .select({ toStatus: inspectionStatusEvents.toStatus, note: inspectionStatusEvents.note, createdAt: inspectionStatusEvents.createdAt, actorName: users.name })
    .from(inspectionStatusEvents)
    .leftJoin(users, eq(users.id, inspectionStatusEvents.actorId))
    .where(eq(inspectionStatusEvents.inspectionId, inspectionId))
    .orderBy(asc(inspectionStatusEvents.createdAt), asc(inspectionStatusEvents.id));
  const [inspector] = row.inspection.inspectorId
    ? await db.select({ name: users.name, email: users.email }).from(users).where(eq(users.id, row.inspection.inspectorId))
    : [];
  return { ...row, events, inspector: inspector ?? null };
}

/** Active inspectors with their upcoming booked jobs, so the coordinator can spread the work. */
export async function listInspectorsWithJobs(from = new Date()) {
  const inspectors = await db
    .select({ id: users.id, name: users.name, email: users.email })
    .from(users)
    .where(and(eq(users.role, 'inspector'), isNull(users.deactivatedAt)))
    .orderBy(asc(users.name));
  const jobs = await db
    .select({ inspectorId: inspections.inspectorId, id: inspections.id, scheduledAt: inspections.scheduledAt, town: machines.town, status: inspections.status })
    .from(inspections)
    .innerJoin(machines, eq(machines.id, inspections.machineId))
    .where(and(inArray(inspections.status, ['booked', 'on_site']), gte(inspections.scheduledAt, new Date(from.getTime() - 24 * 60 * 60 * 1000))))
    .orderBy(asc(inspections.scheduledAt));
  return inspectors.map((inspector) => ({ ...inspector, jobs: jobs.filter((job) => job.inspectorId === inspector.id) }));
}

export async function getFee(sizeClass: SizeClass) {
  const [fee] = await db
    .select({ amountMinor: inspectionFees.amountMinor, currency: inspectionFees.currency })
    .from(inspectionFees)
    .where(and(eq(inspectionFees.machineType, 'centre_lathe'), eq(inspectionFees.sizeClass, sizeClass)));
  return fee ?? null;
}

/** What the coordinator reviews: the newest report of the inspection, the raw survey and its photos. */
export async function getReviewBundle(inspectionId: number) {
  const [report] = await db.select().from(reports).where(eq(reports.inspectionId, inspectionId)).orderBy(desc(reports.version)).limit(1);
  const [survey] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
  const surveyPhotos = await db.select().from(photos).where(eq(photos.inspectionId, inspectionId)).orderBy(asc(photos.section), asc(photos.id));
  return { report: report ?? null, survey: survey ?? null, photos: surveyPhotos };
}

/** The newest step on an inspection's timeline, with its note (e.g. why a survey was sent back). */
export async function findLatestStatusEvent(inspectionId: number) {
  const [row] = await db
    .select({ fromStatus: inspectionStatusEvents.fromStatus, toStatus: inspectionStatusEvents.toStatus, note: inspectionStatusEvents.note, createdAt: inspectionStatusEvents.createdAt })
    .from(inspectionStatusEvents)
    .where(eq(inspectionStatusEvents.inspectionId, inspectionId))
    .orderBy(desc(inspectionStatusEvents.createdAt), desc(inspectionStatusEvents.id))
    .limit(1);
  return row ?? null;
}
