// A large data set for benchmarks: 10,000 lathes with surveys and scored reports, added to the
// database in DATABASE_URL. Usage: npm run db:seed-large [-- --machines 10000]
import { randomUUID } from 'node:crypto';
import { count, eq } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { inspections, machines, reports, reportSubsystemScores, surveys, users } from '@/db/schema';
import { hashPassword } from '@/lib/auth/password';
import { sizeClassForSwing } from '@/lib/machine-size';
import { scoreSurvey, SURVEY_FORMAT_VERSION } from '@/lib/scoring';
import { newVerificationCode } from '@/lib/verification-code';
import { demoSurvey } from './demo-survey';
import { seededRandom } from './random';
import { LATHE_MODELS, WORKSHOPS } from './scenario';

const CHUNK = 250;
// Each report carries its full result (about 20 KB of JSON): insert them in small batches.
const REPORT_BATCH = 50;
const LARGE_SET_MARK = 'bulk-seller@large.waygrade.example';

export async function seedLarge(total: number, log = console.log) {
  const random = seededRandom(10_000);
  const [existing] = await db.select({ n: count() }).from(users).where(eq(users.email, LARGE_SET_MARK));
  if (existing && existing.n > 0) {
    log('Large data set: already present, left as it is');
    return 0;
  }
  const passwordHash = await hashPassword(randomUUID());
  const sellerId = randomUUID();
  const inspectorId = randomUUID();
  await db.insert(users).values([
    { id: sellerId, email: LARGE_SET_MARK, name: 'Bulk seller', role: 'seller', passwordHash, emailVerified: new Date() },
    { id: inspectorId, email: 'bulk-inspector@large.waygrade.example', name: 'Bulk inspector', role: 'inspector', passwordHash, emailVerified: new Date() },
  ]);

  const started = Date.now();
  for (let offset = 0; offset < total; offset += CHUNK) {
    const size = Math.min(CHUNK, total - offset);
    const plans = Array.from({ length: size }, () => {
      const model = random.pick(LATHE_MODELS);
      const workshop = random.pick(WORKSHOPS);
      const yearBuilt = random.int(1965, 2021);
      const swingMm = model.swingMm;
      return {
        machine: {
          sellerId,
          latheKind: model.kind,
          maker: model.maker,
          model: model.model,
          serialNumber: `${model.maker.slice(0, 2).toUpperCase()}${random.int(100000, 999999)}`,
          yearBuilt,
          swingMm,
          betweenCentresMm: random.pick(model.centres),
          spindleBoreMm: model.boreMm,
          motorKw: model.motorKw.toFixed(2),
          supplyVoltage: model.phases === 1 ? 230 : 400,
          supplyPhases: model.phases,
          sizeClass: sizeClassForSwing(swingMm),
          town: workshop.town,
          region: workshop.region,
          askingPriceMinor: Math.round((swingMm * 60 * random.between(0.2, 1.1)) / 50) * 5000,
          listingStatus: 'listed' as const,
        },
        wear: random.between(0.02, 1),
        inspectedOn: new Date(Date.UTC(2025, 0, 1) + random.int(0, 680) * 86_400_000).toISOString().slice(0, 10),
      };
    });
    const machineIds = await db.insert(machines).values(plans.map((p) => p.machine)).$returningId();
    const inspectionIds = await db
      .insert(inspections)
      .values(machineIds.map(({ id }, i) => ({ machineId: id, requestedById: sellerId, status: 'released' as const, inspectorId, scheduledAt: new Date(`${plans[i]!.inspectedOn}T09:00:00Z`), feeMinor: 49_000 })))
      .$returningId();
    const surveysData = plans.map((p) => demoSurvey(p.machine, { wear: p.wear, random, inspectedOn: p.inspectedOn }));
    await db.insert(surveys).values(inspectionIds.map(({ id }, i) => ({ inspectionId: id, formatVersion: SURVEY_FORMAT_VERSION, version: 1, data: surveysData[i]!, submittedAt: new Date() })));
    const results = surveysData.map((survey) => scoreSurvey(survey));
    const reportRows = results.map((result, i) => ({
      inspectionId: inspectionIds[i]!.id,
      machineId: machineIds[i]!.id,
      version: 1,
      status: 'released' as const,
      scoringVersion: result.scoringVersion,
      surveyFormatVersion: result.surveyFormatVersion,
      surveyVersion: 1,
      result,
      overallCondition: result.overall.condition ?? 'Salvage',
      overallScore: Math.round(result.overall.score ?? 0),
      confidence: result.confidence.value.toFixed(3),
      safetyFindings: result.safetyFindings.length,
      fairMarketValueMinor: result.valuation.reconciliation?.fairMarketValue.amountMinor ?? result.valuation.costApproach?.fairMarketValue.amountMinor ?? null,
      repairEstimateMinor: result.repairEstimate.total.amountMinor,
      currency: result.valuation.currency,
      verificationCode: newVerificationCode(),
      inspectorId,
      releasedAt: new Date(`${plans[i]!.inspectedOn}T16:00:00Z`),
    }));
    const reportIds: Array<{ id: number }> = [];
    for (let start = 0; start < reportRows.length; start += REPORT_BATCH) {
      reportIds.push(...(await db.insert(reports).values(reportRows.slice(start, start + REPORT_BATCH)).$returningId()));
    }
    await db.insert(reportSubsystemScores).values(
      results.flatMap((result, i) =>
        result.subsystems.map((s) => ({ reportId: reportIds[i]!.id, subsystem: s.id, score: s.score === null ? null : Math.round(s.score), grade: s.grade })),
      ),
    );
    log(`Large data set: ${offset + size} of ${total} machines (${Math.round((Date.now() - started) / 1000)} s)`);
  }
  return total;
}

const argument = process.argv.indexOf('--machines');
const total = argument > 0 ? Number(process.argv[argument + 1]) : 10_000;
seedLarge(total)
  .catch((error) => {
    const cause = (error as { cause?: { message?: string } }).cause?.message;
    console.error('Large seeding failed:', cause ?? (error instanceof Error ? error.message.slice(0, 300) : error));
    process.exitCode = 1;
  })
  .finally(() => closeDatabase());
