import type { ConditionGrade } from '../grading/condition-scale';
import type { Money } from '../money';
import type { SaleKind } from './valuation-tables';

/** A sale of a similar machine, given by the caller (the app's sales records). */
export interface ComparableSale {
  price: Money;
  description?: string;
  soldOn?: string;
  condition?: ConditionGrade;
  swingOverBedMm?: number;
  betweenCentresMm?: number;
  yearBuilt?: number;
  saleKind?: SaleKind;
  /** Chucks, steadies and toolpost sold with it; absent when not recorded. */
  toolingIncluded?: boolean;
}

/** The premise the machine is valued on. */
export interface ValuePremise {
  id: 'as-is-in-use' | 'parts-or-rebuild';
  label: string;
  explanation: string;
}

export interface CostApproach {
  replacementCostNew: Money;
  replacementCostBasis: string;
  normalUsefulLifeYears: number;
  actualAgeYears: number | null;
  effectiveAgeYears: number;
  percentGood: number;
  /** Curable physical deterioration: the cost to cure, deducted once. */
  repairDeduction: Money;
  /** Incurable physical deterioration: age-life on what remains after the cure. */
  incurableDeterioration: Money;
  depreciatedValue: Money;
  fairMarketValue: Money;
  orderlyLiquidationValue: Money;
  forcedLiquidationValue: Money;
  working: string[];
}

export type GridFactor = 'size' | 'age' | 'condition' | 'tooling' | 'sale-kind' | 'time';

/** One line of the adjustment grid: a factor on the comparable's price and why. */
export interface GridAdjustment {
  factor: GridFactor;
  multiplier: number;
  basis: string;
}

export interface AdjustedSale {
  description: string;
  price: Money;
  saleKind: SaleKind | null;
  soldOn: string | null;
  grid: GridAdjustment[];
  /** Product of the grid's multipliers. */
  adjustment: number;
  adjusted: Money;
  /** Sum of |multiplier − 1| plus a penalty per unrecorded fact: how far the sale is from the subject. */
  grossAdjustment: number;
  /** Share in the indicated value (0 for an outlier). */
  weight: number;
  outlier: boolean;
}

export interface SalesComparison {
  comparablesGiven: number;
  comparablesUsed: number;
  adjustedPrices: AdjustedSale[];
  indicatedValue: Money;
  working: string[];
}

/** Orderly or forced liquidation value, from auction or liquidation sales, or the fallback ratio. */
export interface LiquidationValue {
  value: Money;
  basis: 'comparable-sales' | 'fallback-ratio';
  working: string[];
}

export interface Reconciliation {
  weights: { costApproach: number; salesComparison: number };
  fairMarketValue: Money;
  orderlyLiquidationValue: Money;
  forcedLiquidationValue: Money;
  working: string[];
}

/** A value stated as a range when too little of the machine was measured. */
export interface ValueRange {
  low: Money;
  high: Money;
  explanation: string;
}

export interface Valuation {
  currency: string;
  premise: ValuePremise;
  /** The inspection date: the day the value holds for (null when the survey gives none). */
  effectiveDate: string | null;
  /** The grade the value is worked from (Salvage on the parts-or-rebuild premise). */
  conditionValued: ConditionGrade | null;
  costApproach: CostApproach | null;
  salesComparison: SalesComparison | null;
  orderlyLiquidation: LiquidationValue | null;
  forcedLiquidation: LiquidationValue | null;
  reconciliation: Reconciliation | null;
  /** Fair market value from the worst case of the unmeasured checks up to the value as measured. */
  range: ValueRange | null;
  /**
   * The cost to cure, split as the landed cost shows it: repairs needed before use (safety
   * findings), repairs to restore accuracy, and the allowance for unmeasured checks at their worst.
   * Their sum is what the cost approach deducts, unless the premise is parts or rebuild.
   */
  costToCure: { beforeUse: Money; forAccuracy: Money; unmeasuredAllowance: Money; deductedInValue: boolean };
  notes: string[];
}
