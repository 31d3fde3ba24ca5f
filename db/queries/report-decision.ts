import 'server-only';
import { asc, eq, sql } from 'drizzle-orm';
import { db } from '@/db/client';
import { inspections, machineInclusions, machinePriceChanges, machineMovingSheets, machines, reports, surveys } from '@/db/schema';
import type { SupplySpec } from '@/lib/decision/phase-converter';
import { parseReleaseFacts } from '@/lib/decision/release-facts';
import { findReportValidityDays } from './report-settings';
import type { ScoringResult } from '@/lib/scoring';

/** The nameplate supply the inspector recorded in the survey (its machine.supply, as JSON), if any. */
function nameplateSupply(json: unknown): SupplySpec | null {
  const supply = (typeof json === 'string' ? JSON.parse(json) : json) as { voltage?: unknown; phases?: unknown } | null;
  if (!supply || typeof supply.voltage !== 'number' || (supply.phases !== 1 && supply.phases !== 3)) return null;
  return { voltage: supply.voltage, phases: supply.phases };
}

/**
 * What the report page needs to set the listing beside the findings: the scoring result, the
 * nameplate from the survey, the listing's price and motor, and when the machine was inspected.
 */
export async function findReportDecisionFacts(reportId: number) {
  const [row] = await db
    .select({
      machineId: reports.machineId,
      result: reports.result,
      releaseFacts: reports.releaseFacts,
      releasedAt: reports.releasedAt,
      repairEstimateMinor: reports.repairEstimateMinor,
      reportCurrency: reports.currency,
      // Only the nameplate supply: the whole survey is not needed here.
      surveySupply: sql<string | null>`JSON_EXTRACT(${surveys.data}, '$.machine.supply')`,
      surveySubmittedAt: surveys.submittedAt,
      scheduledAt: inspections.scheduledAt,
      askingPriceMinor: machines.askingPriceMinor,
      machineCurrency: machines.currency,
      motorKw: machines.motorKw,
      listedAt: machines.createdAt,
      listingStatus: machines.listingStatus,
    })
    .from(reports)
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .innerJoin(inspections, eq(inspections.id, reports.inspectionId))
    .leftJoin(surveys, eq(surveys.inspectionId, reports.inspectionId))
    .where(eq(reports.id, reportId))
    .limit(1);
  if (!row) return null;
  const result = (typeof row.result === 'string' ? JSON.parse(row.result) : row.result) as ScoringResult;
  const [[moving], inclusions, priceHistory, validityDays] = await Promise.all([
    db.select().from(machineMovingSheets).where(eq(machineMovingSheets.machineId, row.machineId)).limit(1),
    db.select().from(machineInclusions).where(eq(machineInclusions.machineId, row.machineId)).orderBy(asc(machineInclusions.id)),
    db
      .select({ askingPriceMinor: machinePriceChanges.askingPriceMinor, currency: machinePriceChanges.currency, changedAt: machinePriceChanges.createdAt })
      .from(machinePriceChanges)
      .where(eq(machinePriceChanges.machineId, row.machineId))
      .orderBy(asc(machinePriceChanges.createdAt), asc(machinePriceChanges.id)),
    findReportValidityDays(),
  ]);
  const inspectedOn = result.machine.inspectedOn ? new Date(`${result.machine.inspectedOn.slice(0, 10)}T00:00:00Z`) : (row.scheduledAt ?? row.surveySubmittedAt ?? row.releasedAt);
  return {
    machineId: row.machineId,
    result,
    nameplate: nameplateSupply(row.surveySupply),
    /** The disclosure, landed-cost basis and thermal states as kept at release; null on drafts and older versions. */
    releaseFacts: parseReleaseFacts(row.releaseFacts),
    askingPriceMinor: row.askingPriceMinor,
    currency: row.machineCurrency,
    motorKw: row.motorKw === null ? null : Number(row.motorKw),
    repairEstimateMinor: result.repairEstimate.total.currency === row.machineCurrency ? result.repairEstimate.total.amountMinor : null,
    inspectedOn,
    validityDays,
    listedAt: row.listedAt,
    listingStatus: row.listingStatus,
    movingSheet: moving ?? null,
    inclusions,
    priceHistory,
  };
}

export type ReportDecisionFacts = NonNullable<Awaited<ReturnType<typeof findReportDecisionFacts>>>;
