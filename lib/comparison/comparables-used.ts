import type { Valuation } from '@/lib/scoring/valuation/valuation-types';

export type ComparableUse = { comparableId: number | null; description: string; priceMinor: number; adjustment: number; adjustedMinor: number; currency: string };

/**
 * The comparable sales a valuation's sales comparison used. The app hands the scoring library each
 * sale with a description starting "#<comparable id>" (db/queries/scoring-inputs.ts), which is how
 * a used sale is traced back to its record. Results stored before the grid had no outliers.
 */
export function comparablesUsed(valuation: Valuation | null | undefined): ComparableUse[] {
  // An outlier is shown on the grid but carries no weight, so it was not used.
  return (valuation?.salesComparison?.adjustedPrices ?? []).filter((p) => p.outlier !== true).map((p) => {
    const match = /^#(\d+)\s*(.*)$/.exec(p.description);
    return {
      comparableId: match ? Number(match[1]) : null,
      description: match ? match[2]! : p.description,
      priceMinor: p.price.amountMinor,
      adjustment: p.adjustment,
      adjustedMinor: p.adjusted.amountMinor,
      currency: p.adjusted.currency,
    };
  });
}
