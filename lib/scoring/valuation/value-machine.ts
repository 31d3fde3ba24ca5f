import type { ConditionGrade } from '../grading/condition-scale';
import type { Money } from '../money';
import { costApproach } from './cost-approach';
import { reconcile } from './reconciliation';
import { salesComparison } from './sales-comparison';
import type { ValuationTables } from './valuation-tables';
import type { ComparableSale, Valuation } from './valuation-types';

export interface ValueMachineInput {
  latheType: 'general-purpose' | 'toolroom';
  swingMm: number;
  distanceBetweenCentresMm: number;
  actualAgeYears: number | null;
  condition: ConditionGrade | null;
  repairTotal: Money;
  comparableSales: readonly ComparableSale[];
  tables: ValuationTables;
}

/** Cost approach, sales comparison when there are enough sales, and their reconciliation. */
export function valueMachine(input: ValueMachineInput): Valuation {
  const notes: string[] = [];
  const cost = costApproach(input);
  if (!cost) notes.push('Cost approach not made: neither the year of manufacture nor a condition grade is known.');
  if (input.actualAgeYears === null && cost) notes.push('Year of manufacture or inspection date unknown: effective age taken from condition alone.');
  const sales = salesComparison(input.comparableSales, input.condition, input.tables);
  if (sales.note) notes.push(sales.note);
  return {
    currency: input.tables.currency,
    costApproach: cost,
    salesComparison: sales.result,
    reconciliation: reconcile(cost, sales.result, input.tables),
    notes,
  };
}
