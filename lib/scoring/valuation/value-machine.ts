import { fmt } from '../format-number';
import { gradeRank, type ConditionGrade } from '../grading/condition-scale';
import { formatMoney, money, type Money } from '../money';
import type { RepairEstimate } from '../repair/repair-estimate';
import { costApproach } from './cost-approach';
import { reconcile } from './reconciliation';
import { salesComparison, type GridSubject } from './sales-comparison';
import type { ValuationTables } from './valuation-tables';
import type { ComparableSale, CostApproach, Reconciliation, SalesComparison, Valuation, ValuePremise } from './valuation-types';

export interface ValueMachineInput {
  latheType: 'general-purpose' | 'toolroom';
  swingMm: number;
  distanceBetweenCentresMm: number;
  yearBuilt: number | null;
  actualAgeYears: number | null;
  /** The inspection date (YYYY-MM-DD): the date the value holds for. */
  effectiveDate: string | null;
  condition: ConditionGrade | null;
  repairs: RepairEstimate;
  /** Checks whose findings are "fix before use": their repairs are needed before the machine runs. */
  safetyCheckIds: readonly string[];
  dealBreakers: readonly { label: string }[];
  /** Share of the check weight measured, 0–1. */
  confidence: number;
  /** The grade and repairs with every unmeasured check at its worst (null: all measured). */
  worstCase: { condition: ConditionGrade | null; repairs: RepairEstimate; unmeasured: number } | null;
  toolingIncluded?: boolean | null;
  comparableSales: readonly ComparableSale[];
  tables: ValuationTables;
}

interface Approaches {
  cost: CostApproach | null;
  sales: SalesComparison | null;
  reconciliation: Reconciliation | null;
  orderly: SalesComparison | null;
  forced: SalesComparison | null;
  notes: string[];
}

/** The worse of two grades; an ungraded worst case leaves the grade found. */
function worseOf(found: ConditionGrade, worst: ConditionGrade | null): ConditionGrade {
  return worst !== null && gradeRank(worst) > gradeRank(found) ? worst : found;
}

function premiseOf(dealBreakers: readonly { label: string }[]): ValuePremise {
  if (dealBreakers.length) {
    return {
      id: 'parts-or-rebuild',
      label: 'Parts or rebuild, as is, where is',
      explanation: `Deal-breaker found (${dealBreakers.map((d) => d.label).join('; ')}): a fault that usually costs more to put right than the machine is worth. The machine is valued as the trade sells such a machine, to a rebuilder or for parts, and on the Salvage grade.`,
    };
  }
  return {
    id: 'as-is-in-use',
    label: 'Fair market value, as is, where is, for continued use',
    explanation: 'Valued as it stands on the inspection date, for a buyer who will put it to work after the repairs listed.',
  };
}

function appraise(input: ValueMachineInput, premise: ValuePremise, condition: ConditionGrade | null, repairTotal: Money): Approaches {
  const notes: string[] = [];
  const cost = costApproach({ ...input, condition, repairTotal, premise: premise.id });
  if (!cost) notes.push('Cost approach not made: neither the year of manufacture nor a condition grade is known.');
  const subject: GridSubject = {
    latheType: input.latheType,
    swingMm: input.swingMm,
    distanceBetweenCentresMm: input.distanceBetweenCentresMm,
    yearBuilt: input.yearBuilt,
    condition,
    toolingIncluded: input.toolingIncluded ?? null,
    effectiveDate: input.effectiveDate,
  };
  const sales = salesComparison(input.comparableSales, subject, input.tables, 'fair-market');
  if (sales.note) notes.push(sales.note);
  const orderly = salesComparison(input.comparableSales, subject, input.tables, 'orderly-liquidation');
  const forced = salesComparison(input.comparableSales, subject, input.tables, 'forced-liquidation');
  for (const n of [orderly.note, forced.note]) if (n) notes.push(n);
  return {
    cost,
    sales: sales.result,
    orderly: orderly.result,
    forced: forced.result,
    reconciliation: reconcile(cost, sales.result, orderly.result, forced.result, input.tables),
    notes,
  };
}

/**
 * The cost to cure as the landed cost shows it: repairs on lines a safety finding calls for come
 * before use, the rest restore accuracy, and what the unmeasured checks at their worst add is an
 * allowance of its own. The three sum to the cure the cost approach deducts.
 */
function splitRepairs(measured: RepairEstimate, valued: RepairEstimate, safetyCheckIds: readonly string[], deducted: boolean, currency: string): Valuation['costToCure'] {
  let beforeUse = 0;
  if (measured.total.currency === currency) {
    for (const line of measured.lines) if (line.triggeredBy.some((id) => safetyCheckIds.includes(id))) beforeUse += line.cost.amountMinor;
  }
  const all = measured.total.currency === currency ? measured.total.amountMinor : 0;
  const valuedTotal = valued.total.currency === currency ? valued.total.amountMinor : 0;
  return {
    beforeUse: money(beforeUse, currency),
    forAccuracy: money(all - beforeUse, currency),
    unmeasuredAllowance: money(valuedTotal - all, currency),
    deductedInValue: deducted,
  };
}

/**
 * The valuation: premise (parts or rebuild when a deal-breaker is found), the cost approach by the
 * breakdown method, the sales comparison on its grid, liquidation values from auction and
 * liquidation sales, and their reconciliation. Missing evidence never helps: the figures are worked
 * with every unmeasured check at its worst; the value as measured is the top of the range, which
 * is stated as the value below `rangeBelowConfidence`.
 */
export function valueMachine(input: ValueMachineInput): Valuation {
  const { tables } = input;
  const c = tables.currency;
  const premise = premiseOf(input.dealBreakers);
  const partsPremise = premise.id === 'parts-or-rebuild';
  const graded = partsPremise ? 'Salvage' : input.condition;
  const worst = input.worstCase;
  // With nothing graded there is no evidence to take at its worst: no grade is valued rather than a guess.
  // The worst case never values a better grade than the one found (damage can hold the grade lower).
  const valued = worst && graded !== null ? worseOf(graded, worst.condition) : graded;
  const repairsValued = worst ? worst.repairs : input.repairs;
  const shown = appraise(input, premise, valued, repairsValued.total);
  const notes = [...shown.notes];
  if (input.actualAgeYears === null && shown.cost) notes.push('Year of manufacture or inspection date unknown: effective age taken from the condition grade alone.');
  if (input.effectiveDate === null) notes.push('No inspection date: the value holds for the date of this report, and sales are not adjusted for time.');

  let range: Valuation['range'] = null;
  if (worst && shown.reconciliation) {
    // The same grade and cure as measured give the same figures: no second appraisal then.
    const sameAsShown = valued === graded && repairsValued.total.amountMinor === input.repairs.total.amountMinor;
    const asMeasured = sameAsShown ? shown.reconciliation : appraise(input, premise, graded, input.repairs.total).reconciliation;
    const low = shown.reconciliation.fairMarketValue;
    const high = money(Math.max(low.amountMinor, asMeasured?.fairMarketValue.amountMinor ?? low.amountMinor), c);
    const measuredPct = fmt(input.confidence * 100, 1);
    if (input.confidence < tables.rangeBelowConfidence) {
      range = {
        low,
        high,
        explanation: `Only ${measuredPct} % of the check weight was measured, under the ${fmt(tables.rangeBelowConfidence * 100, 0)} % a point value needs: fair market value ${formatMoney(low)} to ${formatMoney(high)}. The low figure takes the ${worst.unmeasured} unmeasured checks at their worst (the working below); the high one takes the machine as measured. Measuring them narrows the range.`,
      };
    } else if (high.amountMinor > low.amountMinor) {
      notes.push(
        `${worst.unmeasured} checks were not measured (${measuredPct} % of the check weight measured); the value takes them at their worst. With them as good as the rest it could be up to ${formatMoney(high)}.`,
      );
    }
  }

  return {
    currency: c,
    premise,
    effectiveDate: input.effectiveDate,
    conditionValued: valued,
    costApproach: shown.cost,
    salesComparison: shown.sales,
    orderlyLiquidation: shown.reconciliation
      ? { value: shown.reconciliation.orderlyLiquidationValue, basis: shown.orderly ? 'comparable-sales' : 'fallback-ratio', working: shown.orderly?.working ?? [] }
      : null,
    forcedLiquidation: shown.reconciliation
      ? { value: shown.reconciliation.forcedLiquidationValue, basis: shown.forced ? 'comparable-sales' : 'fallback-ratio', working: shown.forced?.working ?? [] }
      : null,
    reconciliation: shown.reconciliation,
    range,
    costToCure: splitRepairs(input.repairs, repairsValued, input.safetyCheckIds, !partsPremise, c),
    notes,
  };
}
