// A large data set for benchmarks: 10,000 lathes with surveys and scored reports, added to the
// database in DATABASE_URL. Usage: npm run db:seed-large [-- --machines 10000]
import { snapshotOf } from '@/lib/reports/machine-snapshot';
import { randomUUID } from 'node:crypto';
import { count, eq } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { inspections, machineInclusions, machineMovingSheets, machines, reports, reportSubsystemScores, surveys, users } from '@/db/schema';
import { SITE_ACCESS } from '@/lib/decision/rigging-estimate';
import { hashPassword } from '@/lib/auth/password';
import { sizeClassForSwing } from '@/lib/machine-size';
import { DEAL_BREAKER_ITEMS, scoreSurvey, SURVEY_FORMAT_VERSION } from '@/lib/scoring';
import { newVerificationCode } from '@/lib/verification-code';
import { demoSurvey } from './demo-survey';
import { seededRandom } from './random';
import { LATHE_MODELS, WORKSHOPS } from './scenario';
import { shownScore } from '@/lib/scoring/grading/condition-scale';

const CHUNK = 250;
// Each report carries its full result (about 20 KB of JSON): insert them in small batches.
const REPORT_BATCH = 50;
const LARGE_SET_MARK = 'bulk-seller@large.waygrade.example';
const DAY_MS = 86_400_000;

/** Things sellers list with a lathe, with a replacement cost new in euro cents (invented figures). */
const INCLUSION_CHOICES = [
  { kind: 'chuck', description: 'Three-jaw chuck', costMinor: 45_000 },
  { kind: 'chuck', description: 'Four-jaw independent chuck', costMinor: 60_000 },
  { kind: 'faceplate', description: 'Faceplate', costMinor: 25_000 },
  { kind: 'steady-rest', description: 'Fixed steady', costMinor: 38_000 },
  { kind: 'travelling-rest', description: 'Travelling steady', costMinor: 30_000 },
  { kind: 'tool-post', description: 'Quick-change tool post with holders', costMinor: 52_000 },
  { kind: 'collets', description: 'Collet set with closer', costMinor: 70_000 },
  { kind: 'dro', description: 'Two-axis digital readout', costMinor: 110_000 },
  { kind: 'manuals', description: 'Operating and parts manuals', costMinor: 6_000 },
] as const;
const INCLUSION_CONDITIONS_BY_LIKELIHOOD = ['good', 'good', 'usable', 'usable', 'usable', 'worn', 'worn', 'missing'] as const;

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
      const inspectedOn = new Date(Date.UTC(2025, 0, 1) + random.int(0, 680) * DAY_MS).toISOString().slice(0, 10);
      const wear = random.between(0.02, 1);
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
          // Listed a few days to a few months before the inspection was booked.
          createdAt: new Date(Date.parse(`${inspectedOn}T10:00:00Z`) - random.int(3, 120) * DAY_MS),
        },
        wear,
        inspectedOn,
        // Most sellers fill in the moving sheet: weight grows with the swing (about 2 t at 460 mm).
        moving:
          random.next() < 0.85
            ? { weightKg: Math.round(0.2 * swingMm ** 1.5 * random.between(0.85, 1.15)), siteAccess: random.pick([...SITE_ACCESS, 'ground-level-wide', 'ground-level-wide'] as const) }
            : null,
        inclusions:
          random.next() < 0.7
            ? INCLUSION_CHOICES.filter(() => random.next() < 0.45).map((item) => ({ ...item, condition: random.pick(INCLUSION_CONDITIONS_BY_LIKELIHOOD) }))
            : [],
        // Deal-breakers are rare and come with wear: about one machine in twelve.
        dealBreakers: random.next() < 0.04 + wear * 0.08 ? DEAL_BREAKER_ITEMS.filter(() => random.next() < 0.35) : [],
      };
    });
    const machineIds = await db.insert(machines).values(plans.map((p) => p.machine)).$returningId();
    const movingSheets = plans.flatMap((p, i) => (p.moving ? [{ machineId: machineIds[i]!.id, ...p.moving }] : []));
    if (movingSheets.length) await db.insert(machineMovingSheets).values(movingSheets);
    const inclusionRows = plans.flatMap((p, i) =>
      p.inclusions.map((item) => ({ machineId: machineIds[i]!.id, kind: item.kind, description: item.description, condition: item.condition, replacementCostMinor: item.costMinor })),
    );
    if (inclusionRows.length) await db.insert(machineInclusions).values(inclusionRows);
    const inspectionIds = await db
      .insert(inspections)
      .values(machineIds.map(({ id }, i) => ({ machineId: id, requestedById: sellerId, status: 'released' as const, inspectorId, scheduledAt: new Date(`${plans[i]!.inspectedOn}T09:00:00Z`), feeMinor: 49_000 })))
      .$returningId();
    const surveysData = plans.map((p) => {
      const survey = demoSurvey(p.machine, { wear: p.wear, random, inspectedOn: p.inspectedOn });
      if (p.dealBreakers.length === 0) return survey;
      return { ...survey, dealBreakers: Object.fromEntries(p.dealBreakers.map((item) => [item.id, { present: true, note: `${item.label}: seen on site` }])) };
    });
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
      overallScore: shownScore(result.overall.score ?? 0),
      confidence: result.confidence.value.toFixed(3),
      safetyFindings: result.safetyFindings.length,
      fairMarketValueMinor: result.valuation.reconciliation?.fairMarketValue.amountMinor ?? result.valuation.costApproach?.fairMarketValue.amountMinor ?? null,
      repairEstimateMinor: result.repairEstimate.total.amountMinor,
      currency: result.valuation.currency,
      verificationCode: newVerificationCode(),
      // What the report states about the machine, sealed as a release through the app would seal it.
      machineSnapshot: snapshotOf({ machineType: 'centre_lathe', currency: 'EUR', accessories: null, ...plans[i]!.machine }),
      inspectorId,
      releasedAt: new Date(`${plans[i]!.inspectedOn}T16:00:00Z`),
    }));
    const reportIds: Array<{ id: number }> = [];
    for (let start = 0; start < reportRows.length; start += REPORT_BATCH) {
      reportIds.push(...(await db.insert(reports).values(reportRows.slice(start, start + REPORT_BATCH)).$returningId()));
    }
    await db.insert(reportSubsystemScores).values(
      results.flatMap((result, i) =>
        result.subsystems.map((s) => ({ reportId: reportIds[i]!.id, subsystem: s.id, score: s.score === null ? null : shownScore(s.score), grade: s.grade })),
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
