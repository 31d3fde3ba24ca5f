import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { machineDisclosures, machineInclusions, machineMovingSheets, machines, surveys } from '@/db/schema';
import type { Database } from '@/db/client';
import type { ReleaseFacts } from '@/lib/decision/release-facts';
import { surveyThermalStates } from '@/lib/survey/thermal-state';
import { missingToolingMinor } from '@/lib/decision/inclusions-value';

type Reader = Pick<Database, 'select'>;

const parseJson = (value: unknown) => (typeof value === 'string' ? (JSON.parse(value) as unknown) : value);

/** The nameplate supply the inspector recorded in the survey, if complete. */
function nameplateSupply(survey: unknown): { voltage: number; phases: 1 | 3 } | null {
  const supply = (survey as { machine?: { supply?: { voltage?: unknown; phases?: unknown } } } | null)?.machine?.supply;
  if (!supply || typeof supply.voltage !== 'number' || (supply.phases !== 1 && supply.phases !== 3)) return null;
  return { voltage: supply.voltage, phases: supply.phases };
}

/** Reads what a report version sets beside its findings, as it stands now, to be kept with the release. */
export async function collectReleaseFacts(tx: Reader, input: { machineId: number; inspectionId: number; motorPowerKw: number | null }): Promise<ReleaseFacts> {
  const [machine] = await tx.select({ askingPriceMinor: machines.askingPriceMinor, currency: machines.currency, motorKw: machines.motorKw }).from(machines).where(eq(machines.id, input.machineId));
  const [disclosure] = await tx.select().from(machineDisclosures).where(eq(machineDisclosures.machineId, input.machineId));
  const [moving] = await tx.select({ weightKg: machineMovingSheets.weightKg, siteAccess: machineMovingSheets.siteAccess }).from(machineMovingSheets).where(eq(machineMovingSheets.machineId, input.machineId));
  const inclusions = await tx.select().from(machineInclusions).where(eq(machineInclusions.machineId, input.machineId)).orderBy(asc(machineInclusions.id));
  const [survey] = await tx.select({ data: surveys.data }).from(surveys).where(eq(surveys.inspectionId, input.inspectionId));
  const surveyData = survey ? parseJson(survey.data) : null;
  const currency = machine?.currency ?? 'EUR';
  const supply = nameplateSupply(surveyData);
  // The motor as scored from the survey, else as listed (the same order as the report page).
  const motorKw = input.motorPowerKw ?? (machine?.motorKw == null ? null : Number(machine.motorKw));
  return {
    disclosure: disclosure
      ? {
          knownFaults: disclosure.knownFaults,
          repairsAndRebuilds: disclosure.repairsAndRebuilds,
          crashesOrDrops: disclosure.crashesOrDrops,
          usage: disclosure.usage,
          usageNotes: disclosure.usageNotes,
          supplyVoltage: disclosure.supplyVoltage,
          supplyPhases: disclosure.supplyPhases === 1 || disclosure.supplyPhases === 3 ? disclosure.supplyPhases : null,
          included: disclosure.included,
          saleTerm: disclosure.saleTerm,
          answeredAt: disclosure.updatedAt.toISOString(),
        }
      : null,
    landedCostBasis: {
      currency,
      askingPriceMinor: machine?.askingPriceMinor ?? null,
      missingToolingMinor: missingToolingMinor(inclusions, currency),
      weightKg: moving?.weightKg ?? null,
      siteAccess: moving?.siteAccess ?? null,
      nameplate: supply ? { ...supply, motorKw } : null,
    },
    thermalStates: surveyThermalStates(surveyData),
  };
}
