import 'server-only';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { db } from '@/db/client';
import { inspections, machines, surveys } from '@/db/schema';

/** An inspector's open jobs, soonest first, with how far each survey has got. */
export async function listJobsForInspector(inspectorId: string) {
  return db
    .select({
      id: inspections.id,
      status: inspections.status,
      scheduledAt: inspections.scheduledAt,
      maker: machines.maker,
      model: machines.model,
      swingMm: machines.swingMm,
      betweenCentresMm: machines.betweenCentresMm,
      town: machines.town,
      region: machines.region,
      surveyData: surveys.data,
      surveyUpdatedAt: surveys.updatedAt,
      submittedAt: surveys.submittedAt,
    })
    .from(inspections)
    .innerJoin(machines, eq(machines.id, inspections.machineId))
    .leftJoin(surveys, eq(surveys.inspectionId, inspections.id))
    .where(and(eq(inspections.inspectorId, inspectorId), inArray(inspections.status, ['booked', 'on_site', 'in_review'])))
    .orderBy(asc(inspections.scheduledAt), asc(inspections.id));
}
