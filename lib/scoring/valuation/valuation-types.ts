import type { ConditionGrade } from '../grading/condition-scale';
import type { Money } from '../money';

/** A sale of a similar machine, given by the caller (the app's sales records). */
export interface ComparableSale {
  price: Money;
  description?: string;
  soldOn?: string;
  condition?: ConditionGrade;
  swingOverBedMm?: number;
}

export interface CostApproach {
  replacementCostNew: Money;
  replacementCostBasis: string;
  normalUsefulLifeYears: number;
  actualAgeYears: number | null;
  effectiveAgeYears: number;
  percentGood: number;
  depreciatedValue: Money;
  repairDeduction: Money;
  fairMarketValue: Money;
  orderlyLiquidationValue: Money;
  forcedLiquidationValue: Money;
  working: string[];
}

export interface SalesComparison {
  comparablesGiven: number;
  comparablesUsed: number;
  adjustedPrices: { description: string; price: Money; adjustment: number; adjusted: Money }[];
  indicatedValue: Money;
  working: string[];
}

export interface Reconciliation {
  weights: { costApproach: number; salesComparison: number };
  fairMarketValue: Money;
  orderlyLiquidationValue: Money;
  forcedLiquidationValue: Money;
  working: string[];
}

export interface Valuation {
  currency: string;
  costApproach: CostApproach | null;
  salesComparison: SalesComparison | null;
  reconciliation: Reconciliation | null;
  notes: string[];
}
