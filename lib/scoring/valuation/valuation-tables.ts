import type { ConditionGrade } from '../grading/condition-scale';

/**
 * Valuation inputs as plain data (demo figures, editable later).
 *  - Replacement cost new by lathe type and swing: invented demo prices in EUR cents for a new
 *    manual lathe of like size and type; longer beds add a share per extra metre between centres.
 *  - Normal useful life of a manual centre lathe: 25 years (common practice).
 *  - Percent good each condition grade implies (common practice, used to move effective age).
 *  - Liquidation ratios to fair market value: orderly 65 %, forced 40 % (common practice).
 */
export interface ValuationTables {
  currency: string;
  replacementCostNew: readonly { upToSwingMm: number; generalPurposeMinor: number }[];
  toolroomFactor: number;
  extraPerMetreBetweenCentresAbove1m: number;
  normalUsefulLifeYears: number;
  conditionPercentGood: Readonly<Record<ConditionGrade, number>>;
  /** Percent good never falls below this: an old machine that runs still sells. */
  residualPercentGood: number;
  orderlyLiquidationRatio: number;
  forcedLiquidationRatio: number;
  minimumComparables: number;
}

export const defaultValuationTables: ValuationTables = {
  currency: 'EUR',
  replacementCostNew: [
    { upToSwingMm: 300, generalPurposeMinor: 1_200_000 },
    { upToSwingMm: 450, generalPurposeMinor: 2_800_000 },
    { upToSwingMm: 600, generalPurposeMinor: 4_800_000 },
    { upToSwingMm: 800, generalPurposeMinor: 7_500_000 },
    { upToSwingMm: 1200, generalPurposeMinor: 13_000_000 },
    { upToSwingMm: Number.POSITIVE_INFINITY, generalPurposeMinor: 22_000_000 },
  ],
  toolroomFactor: 1.6,
  extraPerMetreBetweenCentresAbove1m: 0.12,
  normalUsefulLifeYears: 25,
  conditionPercentGood: {
    Excellent: 0.85,
    'Very good': 0.7,
    Good: 0.55,
    Fair: 0.4,
    Poor: 0.25,
    Salvage: 0.08,
  },
  residualPercentGood: 0.05,
  orderlyLiquidationRatio: 0.65,
  forcedLiquidationRatio: 0.4,
  minimumComparables: 5,
};
