import { afterAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { machineDisclosures, machineInclusions, machineMovingSheets, machines, reports, surveys } from '@/db/schema';
import { parseReleaseFacts } from '@/lib/decision/release-facts';
import { releaseReport } from '@/lib/workflow/review';
import { createAccount } from '../support/accounts';
import { createInspection, createMachine, createSubmittedSurvey } from '../support/workflow-fixtures';

afterAll(async () => {
  await closeDatabase();
});

async function databaseRefusal(statement: Promise<unknown>) {
  try {
    await statement;
    return 'statement was accepted';
  } catch (error) {
    return String((error as { cause?: { message?: string } }).cause?.message ?? (error as Error).message);
  }
}

async function storedFacts(reportId: number) {
  const [row] = await db.select({ releaseFacts: reports.releaseFacts }).from(reports).where(eq(reports.id, reportId));
  return parseReleaseFacts(row!.releaseFacts);
}

describe('facts kept with a released report', () => {
  it('copies the disclosure, the landed-cost basis and the thermal states at release, and keeps them when the listing changes', async () => {
    const [seller, coordinator, inspector] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector')]);
    const machineId = await createMachine(seller.id, { askingPriceMinor: 640_000, currency: 'EUR' });
    await db.insert(machineDisclosures).values({ machineId, knownFaults: '', repairsAndRebuilds: '', crashesOrDrops: '', usage: 'hobby', usageNotes: '', supplyVoltage: 400, supplyPhases: 3, included: 'Steady', saleTerm: 'as-is' });
    await db.insert(machineMovingSheets).values({ machineId, weightKg: 1450, siteAccess: 'upper-floor-or-basement' });
    await db.insert(machineInclusions).values([
      { machineId, kind: 'chuck', description: '4-jaw chuck', condition: 'missing', replacementCostMinor: 48_000, currency: 'EUR' },
      { machineId, kind: 'steady-rest', description: 'Fixed steady', condition: 'good', replacementCostMinor: 30_000, currency: 'EUR' },
    ]);
    const inspectionId = await createInspection(machineId, seller.id, 'in_review', inspector.id);
    const { reportId } = await createSubmittedSurvey(inspectionId);
    // The inspector states the spindle was measured 45 minutes after a cold start: warm (30 min rule, common practice).
    const [survey] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
    const data = (typeof survey!.data === 'string' ? JSON.parse(survey!.data) : survey!.data) as Record<string, Record<string, unknown>>;
    data.powerRun = { startState: 'cold', minutesRunBeforeReadings: 0, startedAt: '2026-11-20T08:00:00.000Z' };
    data.spindle = { ...data.spindle, thermal: { measuredAt: '2026-11-20T08:45:00.000Z' } };
    await db.update(surveys).set({ data }).where(eq(surveys.inspectionId, inspectionId));

    expect(await storedFacts(reportId)).toBeNull();
    expect(await releaseReport.execute(coordinator.actor, { inspectionId, reportId })).toMatchObject({ ok: true });

    const kept = await storedFacts(reportId);
    expect(kept?.disclosure).toMatchObject({ knownFaults: '', saleTerm: 'as-is', supplyVoltage: 400, supplyPhases: 3 });
    expect(kept?.landedCostBasis).toEqual({
      currency: 'EUR',
      askingPriceMinor: 640_000,
      missingToolingMinor: 48_000,
      weightKg: 1450,
      siteAccess: 'upper-floor-or-basement',
      nameplate: { voltage: 400, phases: 3, motorKw: 2.2 },
    });
    expect(kept?.thermalStates.find((t) => t.section === 'spindle')).toMatchObject({ state: 'warm', source: 'power-run-clock', minutesRun: 45 });

    // The listing changes after release; the released version keeps what it was released with.
    await db.update(machineDisclosures).set({ knownFaults: 'Noisy back gear' }).where(eq(machineDisclosures.machineId, machineId));
    await db.update(machines).set({ askingPriceMinor: 590_000 }).where(eq(machines.id, machineId));
    const later = await storedFacts(reportId);
    expect(later?.disclosure?.knownFaults).toBe('');
    expect(later?.landedCostBasis.askingPriceMinor).toBe(640_000);

    // And the database refuses to rewrite the copy.
    await expect(databaseRefusal(db.update(reports).set({ releaseFacts: { ...kept, disclosure: null } }).where(eq(reports.id, reportId)))).resolves.toMatch(/cannot be changed/);
  });
});
