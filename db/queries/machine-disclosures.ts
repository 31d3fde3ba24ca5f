import 'server-only';
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { machineDisclosures } from '@/db/schema';
import type { SellerDisclosure } from '@/lib/decision/seller-disclosure';

/** The seller's disclosure for a machine, or null when the seller has not answered yet. */
export async function findMachineDisclosure(machineId: number): Promise<(SellerDisclosure & { updatedAt: Date }) | null> {
  const [row] = await db.select().from(machineDisclosures).where(eq(machineDisclosures.machineId, machineId)).limit(1);
  if (!row) return null;
  return {
    knownFaults: row.knownFaults,
    repairsAndRebuilds: row.repairsAndRebuilds,
    crashesOrDrops: row.crashesOrDrops,
    usage: row.usage,
    usageNotes: row.usageNotes,
    supplyVoltage: row.supplyVoltage,
    supplyPhases: row.supplyPhases === 1 || row.supplyPhases === 3 ? row.supplyPhases : null,
    included: row.included,
    saleTerm: row.saleTerm,
    updatedAt: row.updatedAt,
  };
}
