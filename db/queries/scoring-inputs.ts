import 'server-only';
import { and, between, desc, eq } from 'drizzle-orm';
import { comparableSales, repairCostItems } from '@/db/schema';
import type { Database } from '@/db/client';
import { defaultRepairCostCatalogue, type ComparableSale, type RepairCostCatalogue, type ScoreOptions } from '@/lib/scoring';

type Reader = Pick<Database, 'select'>;

// Comparable sales count when the swing is within this share of the subject's (common practice, no source).
const COMPARABLE_SWING_BAND = 0.15;
const MAX_COMPARABLES = 12;

/** The repair catalogue with the admins' current prices over the library's rules. */
export async function loadRepairCatalogue(reader: Reader): Promise<RepairCostCatalogue> {
  const rows = await reader.select().from(repairCostItems);
  if (rows.length === 0) return defaultRepairCostCatalogue;
  const byCode = new Map(rows.map((row) => [row.code, row]));
  return {
    ...defaultRepairCostCatalogue,
    id: 'waygrade-catalogue',
    description: 'Repair costs as kept by Waygrade’s coordinators',
    actions: defaultRepairCostCatalogue.actions.map((action) => {
      const row = byCode.get(action.id);
      return row ? { ...action, label: row.label, costMinor: row.costMinor } : action;
    }),
  };
}

/** Recent sales of lathes of similar swing, newest first, with what the valuation's adjustment grid reads. */
export async function loadComparableSales(reader: Reader, swingMm: number): Promise<ComparableSale[]> {
  const rows = await reader
    .select()
    .from(comparableSales)
    .where(
      and(
        eq(comparableSales.machineType, 'centre_lathe'),
        between(comparableSales.swingMm, Math.floor(swingMm * (1 - COMPARABLE_SWING_BAND)), Math.ceil(swingMm * (1 + COMPARABLE_SWING_BAND))),
      ),
    )
    .orderBy(desc(comparableSales.soldOn))
    .limit(MAX_COMPARABLES);
  return rows.map((row) => ({
    price: { amountMinor: row.priceMinor, currency: row.currency },
    description: `#${row.id} ${row.description}`,
    soldOn: row.soldOn,
    swingOverBedMm: row.swingMm,
    saleKind: row.saleKind,
    ...(row.betweenCentresMm !== null ? { betweenCentresMm: row.betweenCentresMm } : {}),
    ...(row.yearBuilt !== null ? { yearBuilt: row.yearBuilt } : {}),
    ...(row.condition ? { condition: row.condition } : {}),
  }));
}

export async function loadScoreOptions(reader: Reader, swingMm: number, asOfYear: number): Promise<ScoreOptions> {
  const [costCatalogue, sales] = await Promise.all([loadRepairCatalogue(reader), loadComparableSales(reader, swingMm)]);
  return { costCatalogue, comparableSales: sales, asOfYear };
}
