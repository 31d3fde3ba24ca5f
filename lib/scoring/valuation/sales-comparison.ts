import { fmt, roundTo } from '../format-number';
import type { ConditionGrade } from '../grading/condition-scale';
import { formatMoney, money, multiplyMoney } from '../money';
import { median } from './median';
import type { ValuationTables } from './valuation-tables';
import type { ComparableSale, SalesComparison } from './valuation-types';

/**
 * Sales comparison: each comparable's price is adjusted for condition by the ratio of the percent
 * good the two condition grades imply (when the comparable's grade is known), and the median of the
 * adjusted prices is the indicated value — the median keeps one odd sale from moving it. Needs at
 * least `minimumComparables` sales in the report currency.
 */
export function salesComparison(
  comparables: readonly ComparableSale[],
  subjectCondition: ConditionGrade | null,
  tables: ValuationTables,
): { result: SalesComparison | null; note: string | null } {
  const usable = comparables.filter((c) => c.price.currency === tables.currency && c.price.amountMinor > 0);
  if (usable.length < tables.minimumComparables) {
    return {
      result: null,
      note: `Sales comparison not made: ${usable.length} usable comparable sales in ${tables.currency}, at least ${tables.minimumComparables} needed.`,
    };
  }
  const subjectPg = subjectCondition === null ? null : tables.conditionPercentGood[subjectCondition];
  const adjustedPrices = usable.map((c, i) => {
    const compPg = c.condition ? tables.conditionPercentGood[c.condition] : null;
    const adjustment = subjectPg !== null && compPg !== null ? subjectPg / compPg : 1;
    return {
      description: c.description ?? `comparable ${i + 1}`,
      price: c.price,
      adjustment: roundTo(adjustment, 4),
      adjusted: multiplyMoney(c.price, adjustment),
    };
  });
  const indicated = money(median(adjustedPrices.map((a) => a.adjusted.amountMinor)), tables.currency);
  const working = [
    ...adjustedPrices.map(
      (a) => `${a.description}: ${formatMoney(a.price)} × ${fmt(a.adjustment, 3)} (condition) = ${formatMoney(a.adjusted)}`,
    ),
    `indicated value = median of ${adjustedPrices.length} adjusted prices = ${formatMoney(indicated)}`,
  ];
  return {
    result: {
      comparablesGiven: comparables.length,
      comparablesUsed: usable.length,
      adjustedPrices,
      indicatedValue: indicated,
      working,
    },
    note: usable.length < comparables.length ? `${comparables.length - usable.length} comparables in another currency or without a price were left out.` : null,
  };
}
