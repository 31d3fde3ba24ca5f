import type { ConditionGrade } from '../grading/condition-scale';

export const SALE_KINDS = ['dealer_retail', 'private', 'auction', 'liquidation'] as const;
export type SaleKind = (typeof SALE_KINDS)[number];

/**
 * Valuation inputs as plain data (demo figures, editable later). Where each figure comes from:
 *  - Replacement cost new by lathe type and swing: invented demo prices in EUR cents for a new
 *    manual lathe of like size and type; longer beds add a share per extra metre between centres.
 *  - Normal useful life of a manual centre lathe: 50 years [from memory: manual lathes commonly
 *    stay in productive use for 40–60 years and keep a market throughout].
 *  - Residual percent good 15 % [common practice: published percent-good tables for machinery level
 *    off rather than reach zero; a complete manual lathe that runs still sells as a working machine].
 *    Age-life then works on the share above it (see percentGoodLevelled).
 *  - Parts-or-rebuild share of replacement cost new, 8 % [from memory: what a rebuilder or a parts
 *    buyer pays for a complete machine that cannot be used as it stands].
 *  - Condition factors the sales grid compares grades by [common practice, Waygrade's figures].
 *  - Sale-kind levels against fair market value: a private sale between a willing buyer and seller
 *    is the reference; a dealer's retail price carries cleaning, warranty and margin (+10 %); an
 *    auction brings about the orderly liquidation ratio, a liquidation the forced one [common practice].
 *  - Liquidation ratios to fair market value, the fallback when too few auction or liquidation sales
 *    are known: orderly 65 %, forced 40 % [common practice].
 *  - Age on the sales grid: 1 % a year of build-year difference, at most ±25 % [common practice];
 *    time since sale: +0.25 % a month [from memory: used machine prices follow general price
 *    inflation, about 3 % a year]; tooling (chucks, steadies, toolpost) ±8 % [common practice].
 *  - Similarity weight 1 / (0.10 + gross adjustment), 15 % gross added for each fact a sale lacks;
 *    an adjusted price more than 35 % from the median of the adjusted prices is an outlier, shown
 *    and left out of the weighting [Waygrade rule, common practice].
 *  - Below 85 % of the check weight measured the value is stated as a range: the examples show that
 *    leaving out one heavy section (bed and ways, spindle, electrical and safety) takes a complete
 *    survey to 78–84 %, so below 85 % at least one whole heavy area is usually unseen [Waygrade rule].
 */
export interface ValuationTables {
  currency: string;
  replacementCostNew: readonly { upToSwingMm: number; generalPurposeMinor: number }[];
  toolroomFactor: number;
  extraPerMetreBetweenCentresAbove1m: number;
  normalUsefulLifeYears: number;
  /** Percent good never falls below this: an old machine that runs still sells. */
  residualPercentGood: number;
  partsShareOfReplacementCost: number;
  conditionPercentGood: Readonly<Record<ConditionGrade, number>>;
  saleKindLevel: Readonly<Record<SaleKind, number>>;
  orderlyLiquidationRatio: number;
  forcedLiquidationRatio: number;
  agePerYear: number;
  ageLimit: number;
  timePerMonth: number;
  toolingShare: number;
  missingFactPenalty: number;
  outlierBand: number;
  minimumComparables: number;
  minimumLiquidationComparables: number;
  salesComparisonWeight: number;
  rangeBelowConfidence: number;
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
  normalUsefulLifeYears: 50,
  residualPercentGood: 0.15,
  partsShareOfReplacementCost: 0.08,
  conditionPercentGood: {
    Excellent: 0.85,
    'Very good': 0.7,
    Good: 0.55,
    Fair: 0.4,
    Poor: 0.25,
    Salvage: 0.08,
  },
  saleKindLevel: { dealer_retail: 1.1, private: 1, auction: 0.65, liquidation: 0.4 },
  orderlyLiquidationRatio: 0.65,
  forcedLiquidationRatio: 0.4,
  agePerYear: 0.01,
  ageLimit: 0.25,
  timePerMonth: 0.0025,
  toolingShare: 0.08,
  missingFactPenalty: 0.15,
  outlierBand: 0.35,
  minimumComparables: 5,
  minimumLiquidationComparables: 3,
  salesComparisonWeight: 0.75,
  rangeBelowConfidence: 0.85,
};
