import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { inspections, machines, surveys } from '@/db/schema';
import type { InspectionStatus } from '@/db/schema/inspections';
import { insertDraftReport } from '@/db/queries/report-writes';
import { demoSurvey } from '@/db/seed/demo-survey';
import { seededRandom } from '@/db/seed/random';
import { scoreSurvey, SURVEY_FORMAT_VERSION } from '@/lib/scoring';

/** A listed lathe owned by the given seller. */
export async function createMachine(sellerId: string, overrides: Partial<typeof machines.$inferInsert> = {}) {
  const [row] = await db
    .insert(machines)
    .values({
      sellerId,
      maker: 'Corvane',
      model: 'CL-330',
      serialNumber: `T${Math.floor(Math.random() * 1e6)}`,
      yearBuilt: 2004,
      swingMm: 330,
      betweenCentresMm: 1000,
      spindleBoreMm: 38,
      motorKw: '2.20',
      supplyVoltage: 400,
      supplyPhases: 3,
      sizeClass: 'small',
      town: 'Kellbrook',
      region: 'Brenmark',
      askingPriceMinor: 640_000,
      listingStatus: 'listed',
      ...overrides,
    })
    .$returningId();
  return row!.id;
}

/** An inspection at the given status, assigned when past "requested". */
export async function createInspection(machineId: number, requestedById: string, status: InspectionStatus, inspectorId: string | null = null) {
  const [row] = await db
    .insert(inspections)
    .values({
      machineId,
      requestedById,
      status,
      preferredDates: ['2027-01-11'],
      siteContactName: 'Site contact',
      siteContactPhone: '+00 555 0199',
      inspectorId,
      scheduledAt: inspectorId ? new Date(Date.now() + 3 * 24 * 60 * 60 * 1000) : null,
      feeMinor: 39_000,
    })
    .$returningId();
  return row!.id;
}

/** A submitted survey with its scored draft report, as the inspector's submit leaves it. */
export async function createSubmittedSurvey(inspectionId: number, wear = 0.4) {
  const [inspection] = await db.select().from(inspections).where(eq(inspections.id, inspectionId));
  const [machine] = await db.select().from(machines).where(eq(machines.id, inspection!.machineId));
  const survey = demoSurvey(machine!, { wear, random: seededRandom(inspectionId), inspectedOn: '2026-11-20' });
  await db.insert(surveys).values({ inspectionId, formatVersion: SURVEY_FORMAT_VERSION, version: 5, data: survey, submittedAt: new Date() });
  const result = scoreSurvey(survey, { asOfYear: 2026 });
  return db.transaction((tx) => insertDraftReport(tx, { inspectionId, machineId: machine!.id, surveyVersion: 5, inspectorId: inspection!.inspectorId, result }));
}
