import { fmt, roundTo } from '../format-number';
import type { ConditionGrade } from '../grading/condition-scale';
import { formatMoney, money, multiplyMoney, type Money } from '../money';
import { effectiveAge, percentGoodByAgeLife } from './age-life';
import { replacementCostNew } from './replacement-cost';
import type { ValuationTables } from './valuation-tables';
import type { CostApproach } from './valuation-types';

/**
 * Cost approach [src: machinery & equipment appraisal definitions of value]: replacement cost new
 * × percent good (age-life, effective age moved by condition) − cost of the repairs the findings
 * call for = fair market value, never below the residual value; orderly and forced liquidation values as shares of it.
 */
export interface CostApproachInput {
  latheType: 'general-purpose' | 'toolroom';
  swingMm: number;
  distanceBetweenCentresMm: number;
  actualAgeYears: number | null;
  condition: ConditionGrade | null;
  repairTotal: Money;
  tables: ValuationTables;
}

export function costApproach(input: CostApproachInput): CostApproach | null {
  const { tables } = input;
  const life = tables.normalUsefulLifeYears;
  const conditionPg = input.condition === null ? null : tables.conditionPercentGood[input.condition];
  const ea = effectiveAge(input.actualAgeYears, conditionPg, life);
  if (ea === null) return null;
  const rcn = replacementCostNew(input.latheType, input.swingMm, input.distanceBetweenCentresMm, tables);
  const percentGood = percentGoodByAgeLife(ea, life, tables.residualPercentGood);
  const depreciated = multiplyMoney(rcn.cost, percentGood);
  const repairs = input.repairTotal.currency === tables.currency ? input.repairTotal.amountMinor : 0;
  // Never below the residual value: a complete machine of its kind still sells for parts or as a
  // project even when a full repair would cost more than it is worth (common practice).
  const floor = multiplyMoney(rcn.cost, tables.residualPercentGood);
  const floored = depreciated.amountMinor - repairs < floor.amountMinor;
  const fmv = money(Math.max(floor.amountMinor, depreciated.amountMinor - repairs), tables.currency);
  const olv = multiplyMoney(fmv, tables.orderlyLiquidationRatio);
  const flv = multiplyMoney(fmv, tables.forcedLiquidationRatio);
  const working = [
    `replacement cost new (RCN) = ${rcn.basis} = ${formatMoney(rcn.cost)}`,
    `actual age = ${input.actualAgeYears === null ? 'unknown (no year)' : `${input.actualAgeYears} years`}; normal useful life = ${life} years`,
    `effective age = ${conditionPg === null ? 'actual age (no condition grade)' : input.actualAgeYears === null ? `life × (1 − ${conditionPg} for ${input.condition})` : `(min(actual age, life) + life × (1 − ${conditionPg} for ${input.condition})) / 2`} = ${fmt(ea, 2)} years`,
    `percent good = 1 − ${fmt(ea, 2)}/${life} = ${fmt(percentGood * 100, 1)} %${percentGood === tables.residualPercentGood ? ' (residual floor)' : ''}`,
    `depreciated value = RCN × percent good = ${formatMoney(depreciated)}`,
    `repairs the findings call for = ${formatMoney(money(repairs, tables.currency))}${input.repairTotal.currency !== tables.currency ? ` (repair catalogue in ${input.repairTotal.currency}, not deducted)` : ''}`,
    `fair market value (FMV) = max(residual RCN × ${tables.residualPercentGood} = ${formatMoney(floor)}, depreciated value − repairs) = ${formatMoney(fmv)}${floored ? ' (repairs exceed the depreciated value: a full repair is not economic; residual value applies)' : ''}`,
    `orderly liquidation value (OLV) = FMV × ${tables.orderlyLiquidationRatio} = ${formatMoney(olv)}`,
    `forced liquidation value (FLV) = FMV × ${tables.forcedLiquidationRatio} = ${formatMoney(flv)}`,
  ];
  return {
    replacementCostNew: rcn.cost,
    replacementCostBasis: rcn.basis,
    normalUsefulLifeYears: life,
    actualAgeYears: input.actualAgeYears,
    effectiveAgeYears: roundTo(ea, 3),
    percentGood: roundTo(percentGood, 4),
    depreciatedValue: depreciated,
    repairDeduction: money(repairs, tables.currency),
    fairMarketValue: fmv,
    orderlyLiquidationValue: olv,
    forcedLiquidationValue: flv,
    working,
  };
}
