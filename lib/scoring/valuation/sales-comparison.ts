import { fmt, roundTo } from '../format-number';
import type { ConditionGrade } from '../grading/condition-scale';
import { formatMoney, money, multiplyMoney } from '../money';
import { median } from './median';
import { replacementCostNew } from './replacement-cost';
import type { SaleKind, ValuationTables } from './valuation-tables';
import type { AdjustedSale, ComparableSale, GridAdjustment, SalesComparison } from './valuation-types';

/** The machine being valued, as the grid compares sales with it. */
export interface GridSubject {
  latheType: 'general-purpose' | 'toolroom';
  swingMm: number;
  distanceBetweenCentresMm: number;
  yearBuilt: number | null;
  condition: ConditionGrade | null;
  toolingIncluded: boolean | null;
  effectiveDate: string | null;
}

/**
 * Which value the grid indicates: fair market value from sales of every kind, each brought to the
 * level of a private sale; orderly liquidation value from auction sales; forced liquidation value
 * from liquidation sales [src: machinery & equipment appraisal definitions of value; practice].
 */
export type GridTarget = 'fair-market' | 'orderly-liquidation' | 'forced-liquidation';

const KIND_WORDS: Record<SaleKind, string> = { dealer_retail: 'dealer retail', private: 'private sale', auction: 'auction', liquidation: 'liquidation' };
const TARGET_KIND: Record<Exclude<GridTarget, 'fair-market'>, SaleKind> = { 'orderly-liquidation': 'auction', 'forced-liquidation': 'liquidation' };

/** A grid multiplier as the change it makes: 1.05 → "+5.0 %", 0.9 → "−10.0 %". */
export function gridPercent(multiplier: number): string {
  return `${multiplier >= 1 ? '+' : '−'}${fmt(Math.abs(multiplier - 1) * 100, 1)} %`;
}

function dayNumber(isoDate: string): number {
  return Date.UTC(Number(isoDate.slice(0, 4)), Number(isoDate.slice(5, 7)) - 1, Number(isoDate.slice(8, 10))) / 86_400_000;
}

function leftOutNote(otherCurrency: number, ungraded: number): string | null {
  const parts = [
    otherCurrency ? `${otherCurrency} in another currency or without a price` : '',
    ungraded ? `${ungraded} without a condition grade (they cannot be adjusted for condition)` : '',
  ].filter(Boolean);
  return parts.length ? `Comparables left out: ${parts.join('; ')}.` : null;
}

/** Each line of the grid for one sale, with its basis; unrecorded facts add to the gross adjustment. */
function gridFor(sale: ComparableSale, subject: GridSubject, target: GridTarget, tables: ValuationTables): { grid: GridAdjustment[]; missing: number } {
  const grid: GridAdjustment[] = [];
  let missing = 0;

  const swing = sale.swingOverBedMm ?? subject.swingMm;
  const centres = sale.betweenCentresMm ?? subject.distanceBetweenCentresMm;
  const subjectRcn = replacementCostNew(subject.latheType, subject.swingMm, subject.distanceBetweenCentresMm, tables).cost.amountMinor;
  const saleRcn = replacementCostNew(subject.latheType, swing, centres, tables).cost.amountMinor;
  const size = subjectRcn / saleRcn;
  grid.push({
    factor: 'size',
    multiplier: size,
    basis:
      sale.swingOverBedMm === undefined
        ? 'size not recorded: taken as the subject’s'
        : `replacement cost new of ${fmt(subject.swingMm, 0)} × ${fmt(subject.distanceBetweenCentresMm, 0)} mm over ${fmt(swing, 0)} × ${fmt(centres, 0)} mm${sale.betweenCentresMm === undefined ? ' (centres not recorded: the subject’s)' : ''}`,
  });
  if (sale.swingOverBedMm === undefined) missing++;

  if (sale.yearBuilt !== undefined && subject.yearBuilt !== null) {
    const years = subject.yearBuilt - sale.yearBuilt;
    const change = Math.max(-tables.ageLimit, Math.min(tables.ageLimit, tables.agePerYear * years));
    grid.push({ factor: 'age', multiplier: 1 + change, basis: `built ${sale.yearBuilt}, subject ${subject.yearBuilt}: ${fmt(tables.agePerYear * 100, 1)} % a year, at most ${fmt(tables.ageLimit * 100, 0)} %` });
  } else {
    grid.push({ factor: 'age', multiplier: 1, basis: sale.yearBuilt === undefined ? 'year not recorded: no adjustment' : 'subject’s year unknown: no adjustment' });
    missing++;
  }

  if (sale.condition !== undefined && subject.condition !== null) {
    const ratio = tables.conditionPercentGood[subject.condition] / tables.conditionPercentGood[sale.condition];
    grid.push({ factor: 'condition', multiplier: ratio, basis: `${sale.condition} to ${subject.condition}: ${tables.conditionPercentGood[subject.condition]} / ${tables.conditionPercentGood[sale.condition]}` });
  } else {
    grid.push({ factor: 'condition', multiplier: 1, basis: sale.condition === undefined ? 'grade not recorded: no adjustment' : 'subject not graded: no adjustment' });
    missing++;
  }

  if (sale.toolingIncluded !== undefined && subject.toolingIncluded !== null) {
    const m = sale.toolingIncluded === subject.toolingIncluded ? 1 : subject.toolingIncluded ? 1 + tables.toolingShare : 1 - tables.toolingShare;
    grid.push({ factor: 'tooling', multiplier: m, basis: m === 1 ? 'tooling as the subject’s' : `tooling ${sale.toolingIncluded ? 'included' : 'not included'} in the sale: ${fmt(tables.toolingShare * 100, 0)} % of the price` });
  } else {
    grid.push({ factor: 'tooling', multiplier: 1, basis: 'tooling not recorded: no adjustment' });
  }

  if (target !== 'fair-market') {
    grid.push({ factor: 'sale-kind', multiplier: 1, basis: `${KIND_WORDS[TARGET_KIND[target]]}, the evidence for this value: no adjustment` });
  } else if (sale.saleKind !== undefined) {
    const level = tables.saleKindLevel[sale.saleKind];
    grid.push({ factor: 'sale-kind', multiplier: 1 / level, basis: `${KIND_WORDS[sale.saleKind]} sells at ${fmt(level, 2)} × a private sale: ÷ ${fmt(level, 2)}` });
  } else {
    grid.push({ factor: 'sale-kind', multiplier: 1, basis: 'kind of sale not recorded: no adjustment' });
    missing++;
  }

  if (sale.soldOn !== undefined && subject.effectiveDate !== null) {
    const months = Math.max(0, (dayNumber(subject.effectiveDate) - dayNumber(sale.soldOn)) / 30.4375);
    grid.push({ factor: 'time', multiplier: 1 + tables.timePerMonth * months, basis: `sold ${sale.soldOn}, ${fmt(months, 1)} months before ${subject.effectiveDate}: ${fmt(tables.timePerMonth * 100, 2)} % a month` });
  } else {
    grid.push({ factor: 'time', multiplier: 1, basis: sale.soldOn === undefined ? 'sale date not recorded: no adjustment' : 'no effective date: no adjustment' });
    missing++;
  }
  return { grid, missing };
}

/**
 * Sales comparison on an adjustment grid: each sale's price times its size, age, condition,
 * tooling, sale-kind and time adjustments, every one with its basis; sales weighted by similarity
 * (the smaller the gross adjustment, the larger the weight); an adjusted price far from the median
 * is an outlier, shown and left out. Needs `minimumComparables` sales in the valuation's currency
 * (`minimumLiquidationComparables` for the liquidation values) and at least that many, less one,
 * once outliers are left out. See valuation-tables.ts for where each figure comes from.
 */
export function salesComparison(
  comparables: readonly ComparableSale[],
  subject: GridSubject,
  tables: ValuationTables,
  target: GridTarget = 'fair-market',
): { result: SalesComparison | null; note: string | null } {
  const kind = target === 'fair-market' ? null : TARGET_KIND[target];
  // A graded subject is compared only with graded sales: an ungraded sale cannot be adjusted for
  // condition, and leaving it unadjusted would let the subject's grade change which sales look odd.
  const priced = comparables.filter((c) => c.price.currency === tables.currency && c.price.amountMinor > 0 && (kind === null || c.saleKind === kind));
  const usable = subject.condition === null ? priced : priced.filter((c) => c.condition !== undefined);
  const ungraded = priced.length - usable.length;
  const needed = kind === null ? tables.minimumComparables : tables.minimumLiquidationComparables;
  const what = kind === null ? 'comparable sales' : `${KIND_WORDS[kind]} sales`;
  if (usable.length < needed) {
    return {
      result: null,
      note: `Sales comparison${kind ? ` for the ${target.replace('-', ' ')} value` : ''} not made: ${usable.length} usable ${what} in ${tables.currency}, at least ${needed} needed.${ungraded ? ` ${ungraded} without a condition grade left out.` : ''}`,
    };
  }
  const rows: AdjustedSale[] = usable.map((sale, i) => {
    const { grid, missing } = gridFor(sale, subject, target, tables);
    let adjustment = 1;
    let gross = tables.missingFactPenalty * missing;
    for (const g of grid) {
      adjustment *= g.multiplier;
      gross += Math.abs(g.multiplier - 1);
    }
    for (const g of grid) g.multiplier = roundTo(g.multiplier, 4);
    return {
      description: sale.description ?? `comparable ${i + 1}`,
      price: sale.price,
      saleKind: sale.saleKind ?? null,
      soldOn: sale.soldOn ?? null,
      grid,
      adjustment: roundTo(adjustment, 4),
      adjusted: multiplyMoney(sale.price, adjustment),
      grossAdjustment: roundTo(gross, 4),
      weight: 0,
      outlier: false,
    };
  });
  const mid = median(rows.map((r) => r.adjusted.amountMinor));
  for (const r of rows) r.outlier = Math.abs(r.adjusted.amountMinor / mid - 1) > tables.outlierBand;
  const kept = rows.filter((r) => !r.outlier);
  if (kept.length < needed - 1) {
    return { result: null, note: `Sales comparison${kind ? ` for the ${target.replace('-', ' ')} value` : ''} not made: ${rows.length - kept.length} of ${rows.length} ${what} are outliers, too few remain.` };
  }
  const raw = kept.map((r) => 1 / (0.1 + r.grossAdjustment));
  const total = raw.reduce((s, w) => s + w, 0);
  let indicatedMinor = 0;
  kept.forEach((r, i) => {
    r.weight = roundTo(raw[i]! / total, 4);
    indicatedMinor += (raw[i]! / total) * r.adjusted.amountMinor;
  });
  const indicated = money(indicatedMinor, tables.currency);
  const working = [
    ...rows.map(
      (r) =>
        `${r.description}: ${formatMoney(r.price)} × ${r.grid.map((g) => `${fmt(g.multiplier, 3)} ${g.factor}`).join(' × ')} = ${formatMoney(r.adjusted)}; gross ${fmt(r.grossAdjustment * 100, 1)} %${
          r.outlier ? `; outlier (more than ${fmt(tables.outlierBand * 100, 0)} % from the median ${formatMoney(money(mid, tables.currency))}), left out` : `; weight ${fmt(r.weight * 100, 1)} %`
        }`,
    ),
    `similarity weights 1 / (0.10 + gross adjustment), ${fmt(tables.missingFactPenalty * 100, 0)} % gross for each fact not recorded`,
    `indicated value = weighted mean of ${kept.length} adjusted prices = ${formatMoney(indicated)}`,
  ];
  return {
    result: { comparablesGiven: comparables.length, comparablesUsed: kept.length, adjustedPrices: rows, indicatedValue: indicated, working },
    note: kind === null ? leftOutNote(comparables.length - priced.length, ungraded) : null,
  };
}
