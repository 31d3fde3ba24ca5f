import { fmt, roundTo } from '../format-number';
import { formatMoney, money, multiplyMoney } from '../money';
import type { ValuationTables } from './valuation-tables';
import type { CostApproach, Reconciliation, SalesComparison } from './valuation-types';

/**
 * Reconciliation: the cost approach alone when there are no usable sales; otherwise a weighted
 * blend in which the market evidence counts more the more sales there are — 0.1 per comparable, up
 * to 0.7 (Waygrade rule, common practice). Liquidation values follow from the reconciled FMV.
 */
export function salesWeight(comparablesUsed: number): number {
  return Math.min(0.7, 0.1 * comparablesUsed);
}

export function reconcile(
  cost: CostApproach | null,
  sales: SalesComparison | null,
  tables: ValuationTables,
): Reconciliation | null {
  if (!cost && !sales) return null;
  const ws = !sales ? 0 : !cost ? 1 : salesWeight(sales.comparablesUsed);
  const wc = 1 - ws;
  const costFmv = cost?.fairMarketValue.amountMinor ?? 0;
  const salesValue = sales?.indicatedValue.amountMinor ?? 0;
  const fmv = money(wc * costFmv + ws * salesValue, tables.currency);
  const olv = multiplyMoney(fmv, tables.orderlyLiquidationRatio);
  const flv = multiplyMoney(fmv, tables.forcedLiquidationRatio);
  const working = [
    cost ? `cost approach FMV ${formatMoney(cost.fairMarketValue)}, weight ${fmt(wc, 2)}` : 'cost approach not available (no age and no condition)',
    sales
      ? `sales comparison ${formatMoney(sales.indicatedValue)} from ${sales.comparablesUsed} sales, weight ${fmt(ws, 2)}${cost ? ' (0.1 per sale, at most 0.7)' : ''}`
      : 'sales comparison not available, weight 0',
    `FMV = ${fmt(wc, 2)} × ${formatMoney(money(costFmv, tables.currency))} + ${fmt(ws, 2)} × ${formatMoney(money(salesValue, tables.currency))} = ${formatMoney(fmv)}`,
    `OLV = FMV × ${tables.orderlyLiquidationRatio} = ${formatMoney(olv)}; FLV = FMV × ${tables.forcedLiquidationRatio} = ${formatMoney(flv)}`,
  ];
  return {
    weights: { costApproach: roundTo(wc, 3), salesComparison: roundTo(ws, 3) },
    fairMarketValue: fmv,
    orderlyLiquidationValue: olv,
    forcedLiquidationValue: flv,
    working,
  };
}
