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
  subsystems: Record<SubsystemKey, { score: number | null; grade: ConditionGrade | null }>;
};

export type ComparisonPage = { rows: ComparisonRow[]; total: number; page: number; pageSize: number };

export const LATHE_KIND_LABELS: Record<ComparisonRow['kind'], string> = {
  general_purpose: 'General purpose',
  toolroom: 'Toolroom',
};
