import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { inspections, machines, surveys, users } from '@/db/schema';
import { primaryOf, type Database } from '@/db/client';

type Reader = Pick<Database, 'select'>;
type Writer = Pick<Database, 'select' | 'insert' | 'update'>;

/**
 * The inspection with the facts of its machine the survey starts from; `lock` holds the row until commit.
 * Read from the primary: the survey page opens straight after "start visit" moved it on site.
 */
export async function findInspectionWithMachine(reader: Reader, inspectionId: number, options: { lock?: boolean } = {}) {
  const query = primaryOf(reader)
    .select({
      id: inspections.id,
      status: inspections.status,
      inspectorId: inspections.inspectorId,
      scheduledAt: inspections.scheduledAt,
      siteAccessNotes: inspections.siteAccessNotes,
      siteContactName: inspections.siteContactName,
      siteContactPhone: inspections.siteContactPhone,
      machineId: machines.id,
      latheKind: machines.latheKind,
      maker: machines.maker,
      model: machines.model,
      serialNumber: machines.serialNumber,
      yearBuilt: machines.yearBuilt,
      swingMm: machines.swingMm,
      betweenCentresMm: machines.betweenCentresMm,
      spindleBoreMm: machines.spindleBoreMm,
      motorKw: machines.motorKw,
      supplyVoltage: machines.supplyVoltage,
      supplyPhases: machines.supplyPhases,
      town: machines.town,
      region: machines.region,
    })
    .from(inspections)
    .innerJoin(machines, eq(machines.id, inspections.machineId))
    .where(eq(inspections.id, inspectionId));
  const [row] = options.lock ? await query.for('update') : await query;
  return row ?? null;
}

/** Read from the primary: an inspector opens the survey moments after being assigned, before a replica may have the row. */
export async function isInspectionAssignedTo(reader: Reader, inspectionId: number, inspectorId: string) {
  const [row] = await primaryOf(reader)
    .select({ id: inspections.id })
    .from(inspections)
    .where(and(eq(inspections.id, inspectionId), eq(inspections.inspectorId, inspectorId)));
  return Boolean(row);
}

/**
 * Read from the primary: the version handed to the phone is the base of its next autosave, and a
 * replica a moment behind would make that save look like another device's (409).
 * `lock` reads the latest commit and holds the row until this transaction ends: an autosave and a
 * submission of the same survey then take turns, and the second sees what the first did.
 */
export async function findSurvey(reader: Reader, inspectionId: number, options: { lock?: boolean } = {}) {
  const query = primaryOf(reader).select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
  const [row] = options.lock ? await query.for('update') : await query;
  return row ?? null;
}

export async function insertSurvey(writer: Writer, input: { inspectionId: number; formatVersion: number; data: unknown; userId: string }) {
  await writer.insert(surveys).values({
    inspectionId: input.inspectionId,
    formatVersion: input.formatVersion,
    version: 1,
    data: input.data,
    updatedById: input.userId,
  });
}

/**
 * Stores the whole survey only if nobody saved since `baseVersion` and it is not yet submitted.
 * One conditional UPDATE, so two devices saving at the same moment cannot both win.
 * Returns the new version, or null when the condition failed.
 */
export async function updateSurveyIfCurrent(writer: Writer, input: { inspectionId: number; baseVersion: number; data: unknown; userId: string }) {
  const [result] = await writer
    .update(surveys)
    .set({ data: input.data, version: sql`${surveys.version} + 1`, updatedById: input.userId })
    .where(and(eq(surveys.inspectionId, input.inspectionId), eq(surveys.version, input.baseVersion), isNull(surveys.submittedAt)));
  return result.affectedRows === 1 ? input.baseVersion + 1 : null;
}

export async function markSurveySubmitted(writer: Writer, inspectionId: number, at: Date) {
  await writer.update(surveys).set({ submittedAt: at }).where(eq(surveys.inspectionId, inspectionId));
}

/** Active coordinators, who are told when a survey is waiting for review. */
export async function listActiveCoordinators(reader: Reader) {
  return reader
    .select({ name: users.name, email: users.email })
    .from(users)
    .where(and(eq(users.role, 'admin'), isNull(users.deactivatedAt)));
}
