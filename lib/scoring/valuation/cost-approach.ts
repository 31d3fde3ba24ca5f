import { fmt, roundTo } from '../format-number';
import type { ConditionGrade } from '../grading/condition-scale';
import { formatMoney, money, multiplyMoney, type Money } from '../money';
import { effectiveAge, percentGoodLevelled } from './age-life';
import { replacementCostNew } from './replacement-cost';
import type { ValuationTables } from './valuation-tables';
import type { CostApproach, ValuePremise } from './valuation-types';

/**
 * Cost approach by the breakdown method [src: machinery & equipment appraisal, cost approach]:
 * replacement cost new (RCN) − curable physical deterioration (the cost to cure, deducted once) −
 * incurable physical deterioration (age-life on what remains, the effective age being the actual
 * age) = fair market value. Functional and economic obsolescence are not known to Waygrade and are
 * not deducted; the working says so. Never below what the machine fetches for parts. On the
 * parts-or-rebuild premise the value is that parts figure alone.
 */
export interface CostApproachInput {
  latheType: 'general-purpose' | 'toolroom';
  swingMm: number;
  distanceBetweenCentresMm: number;
  actualAgeYears: number | null;
  condition: ConditionGrade | null;
  /** Repairs the findings call for, in any currency (only the valuation's currency is deducted). */
  repairTotal: Money;
  premise: ValuePremise['id'];
  tables: ValuationTables;
}

export function costApproach(input: CostApproachInput): CostApproach | null {
  const { tables } = input;
  const c = tables.currency;
  const life = tables.normalUsefulLifeYears;
  const conditionPg = input.condition === null ? null : tables.conditionPercentGood[input.condition];
  const ea = effectiveAge(input.actualAgeYears, conditionPg, life);
  if (ea === null) return null;
  const rcn = replacementCostNew(input.latheType, input.swingMm, input.distanceBetweenCentresMm, tables);
  const partsValue = multiplyMoney(rcn.cost, tables.partsShareOfReplacementCost);
  const sameCurrency = input.repairTotal.currency === c;
  const cure = sameCurrency ? input.repairTotal.amountMinor : 0;
  const head = [
    `replacement cost new (RCN) = ${rcn.basis} = ${formatMoney(rcn.cost)}`,
    `actual age = ${input.actualAgeYears === null ? 'unknown (no year)' : `${input.actualAgeYears} years`}; normal useful life = ${life} years; residual ${fmt(tables.residualPercentGood * 100, 1)} % of RCN`,
  ];
  const ratios = (fmv: Money) => {
    const olv = multiplyMoney(fmv, tables.orderlyLiquidationRatio);
    const flv = multiplyMoney(fmv, tables.forcedLiquidationRatio);
    return {
      olv,
      flv,
      lines: [
        `orderly liquidation value (OLV) = FMV × ${tables.orderlyLiquidationRatio} (fallback ratio) = ${formatMoney(olv)}`,
        `forced liquidation value (FLV) = FMV × ${tables.forcedLiquidationRatio} (fallback ratio) = ${formatMoney(flv)}`,
      ],
    };
  };

  if (input.premise === 'parts-or-rebuild') {
    const r = ratios(partsValue);
    return {
      replacementCostNew: rcn.cost,
      replacementCostBasis: rcn.basis,
      normalUsefulLifeYears: life,
      actualAgeYears: input.actualAgeYears,
      effectiveAgeYears: roundTo(ea, 3),
      percentGood: tables.partsShareOfReplacementCost,
      repairDeduction: money(0, c),
      incurableDeterioration: money(rcn.cost.amountMinor - partsValue.amountMinor, c),
      depreciatedValue: partsValue,
      fairMarketValue: partsValue,
      orderlyLiquidationValue: r.olv,
      forcedLiquidationValue: r.flv,
      working: [
        head[0]!,
        'premise: parts or rebuild; a buyer pays for what can be salvaged or rebuilt, so neither the age-life nor the cost to cure applies',
        `fair market value (FMV) = RCN × ${tables.partsShareOfReplacementCost} (parts-or-rebuild share) = ${formatMoney(partsValue)}`,
        ...r.lines,
      ],
    };
  }

  const remainder = Math.max(0, rcn.cost.amountMinor - cure);
  const percentGood = percentGoodLevelled(ea, life, tables.residualPercentGood);
  const depreciated = money(remainder * percentGood, c);
  const incurable = money(remainder - depreciated.amountMinor, c);
  const floored = depreciated.amountMinor < partsValue.amountMinor;
  const fmv = floored ? partsValue : depreciated;
  const r = ratios(fmv);
  const working = [
    ...head,
    `curable physical deterioration (cost to cure, the repairs the findings call for) = ${formatMoney(money(cure, c))}${sameCurrency ? '' : ` (repair catalogue in ${input.repairTotal.currency}, not deducted)`}`,
    `RCN less cost to cure = ${formatMoney(money(remainder, c))}`,
    `effective age = ${input.actualAgeYears === null ? `no year: life × (1 − ${conditionPg} for ${input.condition}) = ${fmt(ea, 2)} years` : `actual age, ${fmt(ea, 2)} years (not moved by condition: the cure already pays for the wear)`}`,
    `percent good = ${tables.residualPercentGood} + ${fmt(1 - tables.residualPercentGood, 2)} × max(0, 1 − ${fmt(ea, 2)}/${life}) = ${fmt(percentGood * 100, 1)} %`,
    `incurable physical deterioration = ${formatMoney(money(remainder, c))} × (1 − ${fmt(percentGood, 4)}) = ${formatMoney(incurable)}`,
    'functional and economic obsolescence: none known, none deducted',
    `fair market value (FMV) = RCN − cost to cure − incurable = ${formatMoney(depreciated)}${
      floored ? `; below the parts value RCN × ${tables.partsShareOfReplacementCost} = ${formatMoney(partsValue)}, which applies (the cure costs more than the machine is worth)` : ''
    }`,
    ...r.lines,
  ];
  return {
    replacementCostNew: rcn.cost,
    replacementCostBasis: rcn.basis,
    normalUsefulLifeYears: life,
    actualAgeYears: input.actualAgeYears,
    effectiveAgeYears: roundTo(ea, 3),
    percentGood: roundTo(percentGood, 4),
    repairDeduction: money(cure, c),
    incurableDeterioration: incurable,
    depreciatedValue: depreciated,
    fairMarketValue: fmv,
    orderlyLiquidationValue: r.olv,
    forcedLiquidationValue: r.flv,
    working,
  };
}
