import 'server-only';
import { count, desc } from 'drizzle-orm';
import { comparableSales } from '@/db/schema';
import type { Database } from '@/db/client';
import type { ComparableSale } from '@/lib/validation/comparable-sale';

type Reader = Pick<Database, 'select'>;
type Writer = Pick<Database, 'insert'>;

const INSERT_BATCH = 500;

/** Adds sales (prices in whole units → minor units); returns how many went in. */
export async function insertComparableSales(writer: Writer, sales: readonly ComparableSale[], createdById: string) {
  for (let start = 0; start < sales.length; start += INSERT_BATCH) {
    await writer.insert(comparableSales).values(
      sales.slice(start, start + INSERT_BATCH).map((s) => ({
        machineType: 'centre_lathe' as const,
        description: s.description,
        yearBuilt: s.yearBuilt ?? null,
        swingMm: s.swingMm,
        betweenCentresMm: s.betweenCentresMm ?? null,
        condition: s.condition ?? null,
        saleKind: s.saleKind,
        priceMinor: s.price * 100,
        currency: s.currency,
        soldOn: s.soldOn,
        region: s.region ?? null,
        source: s.source ?? null,
        createdById,
      })),
    );
  }
  return sales.length;
}

export const COMPARABLE_SALES_PAGE = 50;

/** Newest sales first, one page at a time, with the total on record. */
export async function listComparableSales(reader: Reader, page: number) {
  const [rows, [total]] = await Promise.all([
    reader
      .select()
      .from(comparableSales)
      .orderBy(desc(comparableSales.soldOn), desc(comparableSales.id))
      .limit(COMPARABLE_SALES_PAGE)
      .offset((page - 1) * COMPARABLE_SALES_PAGE),
    reader.select({ n: count() }).from(comparableSales),
  ]);
  return { rows, total: total?.n ?? 0 };
}
