import type { ConditionGrade } from '@/lib/scoring/grading/condition-scale';
import type { SubsystemKey } from '@/lib/validation/comparison-query';

/**
 * One machine in the comparison table, as /api/compare sends it. Money in minor units. The value,
 * the price ÷ value ratio and the repair estimate come with the report: they are null unless the
 * reader bought it (`hasDetails`).
 */
export type ComparisonRow = {
  reportId: number;
  machineId: number;
  maker: string;
  model: string;
  kind: 'general_purpose' | 'toolroom';
  swingMm: number;
  betweenCentresMm: number;
  yearBuilt: number | null;
  town: string;
  region: string;
  overallCondition: ConditionGrade;
  overallScore: number;
  /** Too little was measured for a firm grade: the grade is shown as provisional. */
  overallProvisional: boolean;
  /** 0–1: share of the survey's checks that were measured. */
  confidence: number;
  askingPriceMinor: number | null;
  priceCurrency: string;
  hasDetails: boolean;
  fairMarketValueMinor: number | null;
  /** Asking price ÷ fair market value: below 1 is priced under the estimated value. */
  priceToValue: number | null;
  repairEstimateMinor: number | null;
  valueCurrency: string;
  releasedAt: string;
  /**
   * What the machine costs standing in the reader's shop at the table's assumptions
   * (landed-cost-basis.ts); null without the report, like the report page's own figure.
   */
  landedCostMinor: number | null;
  /** Parts of the landed cost that are not known and so left out (the figure is then "at least"). */
  landedCostNotKnown: LandedCostPart[];
  /** Inclusions at their condition's share of replacement cost; null without the report or when none are listed. */
  inclusionsValueMinor: number | null;
  /** Deal-breakers the report records: the count for everyone, each by id and in words with the report. */
  dealBreakerCount: number;
  dealBreakers: Array<{ id: string; label: string }>;
  /** Whole UTC days since the listing went up. */
  daysListed: number;
  /** Day of the inspection, its age in whole UTC days, the last day the report is current and whether it is past it. */
  inspectedOn: string;
  reportAgeDays: number;
  validUntil: string;
  stale: boolean;
  subsystems: Record<SubsystemKey, { score: number | null; grade: ConditionGrade | null }>;
};

export const LANDED_COST_PARTS = ['asking price', 'rigging', 'phase converter', 'missing tooling', 'repairs'] as const;
export type LandedCostPart = (typeof LANDED_COST_PARTS)[number];

/** `landedCostBasis`: what this reader's landed-cost figures assume, in words (landed-cost-basis.ts). */
export type ComparisonPage = { rows: ComparisonRow[]; total: number; page: number; pageSize: number; landedCostBasis: string };

export const LATHE_KIND_LABELS: Record<ComparisonRow['kind'], string> = {
  general_purpose: 'General purpose',
  toolroom: 'Toolroom',
};

/** A whole number of days in words: "1 day", "12 days". */
export const dayCount = (n: number) => `${n.toLocaleString('en-GB')} day${n === 1 ? '' : 's'}`;
