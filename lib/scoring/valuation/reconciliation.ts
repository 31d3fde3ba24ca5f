import { fmt, roundTo } from '../format-number';
import { formatMoney, money, multiplyMoney } from '../money';
import type { ValuationTables } from './valuation-tables';
import type { CostApproach, LiquidationValue, Reconciliation, SalesComparison } from './valuation-types';

/**
 * Reconciliation: sales comparison is the primary approach for used machine tools when enough
 * sales are known [practice], so it carries `salesComparisonWeight` (0.75) and the cost approach the
 * rest; with no usable sales the cost approach alone. Orderly and forced liquidation values come
 * from auction and liquidation sales where there are enough, else from the fixed ratios (the
 * fallback, labelled so); each is kept at or below the value above it (FLV ≤ OLV ≤ FMV).
 */
export function liquidationValue(
  evidence: SalesComparison | null,
  fmv: number,
  ratio: number,
  ceiling: number,
  name: string,
  currency: string,
): LiquidationValue {
  if (evidence) {
    const value = Math.min(evidence.indicatedValue.amountMinor, ceiling);
    const capped = value < evidence.indicatedValue.amountMinor;
    return {
      value: money(value, currency),
      basis: 'comparable-sales',
      working: [
        `${name} from ${evidence.comparablesUsed} sales: ${formatMoney(evidence.indicatedValue)}${capped ? `, above the value it follows, so held at ${formatMoney(money(ceiling, currency))}` : ''}`,
      ],
    };
  }
  const value = Math.min(multiplyMoney(money(fmv, currency), ratio).amountMinor, ceiling);
  return { value: money(value, currency), basis: 'fallback-ratio', working: [`${name} = FMV × ${ratio} (fallback ratio: too few sales of that kind) = ${formatMoney(money(value, currency))}`] };
}

export function reconcile(
  cost: CostApproach | null,
  sales: SalesComparison | null,
  orderly: SalesComparison | null,
  forced: SalesComparison | null,
  tables: ValuationTables,
): Reconciliation | null {
  if (!cost && !sales) return null;
  const c = tables.currency;
  const ws = !sales ? 0 : !cost ? 1 : tables.salesComparisonWeight;
  const wc = 1 - ws;
  const costFmv = cost?.fairMarketValue.amountMinor ?? 0;
  const salesValue = sales?.indicatedValue.amountMinor ?? 0;
  const fmv = money(wc * costFmv + ws * salesValue, c);
  const olv = liquidationValue(orderly, fmv.amountMinor, tables.orderlyLiquidationRatio, fmv.amountMinor, 'OLV', c);
  const flv = liquidationValue(forced, fmv.amountMinor, tables.forcedLiquidationRatio, olv.value.amountMinor, 'FLV', c);
  const working = [
    sales
      ? `sales comparison ${formatMoney(sales.indicatedValue)} from ${sales.comparablesUsed} sales, weight ${fmt(ws, 2)}${cost ? ' (the primary approach when enough sales are known)' : ''}`
      : 'sales comparison not available, weight 0',
    cost ? `cost approach ${formatMoney(cost.fairMarketValue)}, weight ${fmt(wc, 2)}` : 'cost approach not available (no age and no condition)',
    `FMV = ${fmt(ws, 2)} × ${formatMoney(money(salesValue, c))} + ${fmt(wc, 2)} × ${formatMoney(money(costFmv, c))} = ${formatMoney(fmv)}`,
    ...olv.working,
    ...flv.working,
  ];
  return {
    weights: { costApproach: roundTo(wc, 3), salesComparison: roundTo(ws, 3) },
    fairMarketValue: fmv,
    orderlyLiquidationValue: olv.value,
    forcedLiquidationValue: flv.value,
    working,
  };
}
