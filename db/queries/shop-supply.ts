import 'server-only';
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { buyerShopProfiles } from '@/db/schema';
import type { SupplySpec } from '@/lib/decision/phase-converter';

/** The buyer's shop supply, or null when they have not given it. */
export async function findShopSupply(userId: string): Promise<SupplySpec | null> {
  const [row] = await db.select().from(buyerShopProfiles).where(eq(buyerShopProfiles.userId, userId)).limit(1);
  if (!row || (row.supplyPhases !== 1 && row.supplyPhases !== 3)) return null;
  return { voltage: row.supplyVoltage, phases: row.supplyPhases };
}
