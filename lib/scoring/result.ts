import type { ValueWithUnit, Permissible } from './check-definition';
import type { CheckBand } from './grading/bands';
import type { ConditionGrade } from './grading/condition-scale';
import type { SourceMark } from './source-marks';
import type { SubsystemId } from './subsystems';
import type { Money } from './money';
import type { Valuation } from './valuation/valuation-types';
import type { RepairEstimate } from './repair/repair-estimate';

/** Everything the scorer returns. Plain data only, so it survives JSON.stringify unchanged. */

export interface CheckExplanation {
  inputs: string[];
  formula: string;
  source: string;
  sourceMark: SourceMark | null;
  text: string;
}

export interface CheckResult {
  id: string;
  subsystem: SubsystemId;
  label: string;
  status: 'measured' | 'not-measured';
  measured: (ValueWithUnit & { text?: string }) | null;
  permissible: Permissible | null;
  q: number | null;
  band: CheckBand | null;
  bandLabel: string;
  score: number | null;
  weight: number;
  explanation: CheckExplanation;
  details: Record<string, string | number | boolean | null>;
}

export interface SubsystemResult {
  id: SubsystemId;
  label: string;
  score: number | null;
  grade: ConditionGrade | null;
  measuredChecks: number;
  totalChecks: number;
  worstCheckId: string | null;
  explanation: string;
}

export interface SafetyFinding {
  checkId: string;
  message: string;
  action: 'fix before use';
}

/** A fault that heads the report whatever the grade. */
export interface DealBreaker {
  id: string;
  label: string;
  evidence: string;
  photoRequired: boolean;
}

export interface PlotPoint {
  x: number;
  y: number;
}

export interface PlotSeries {
  bedProfile: {
    xUnit: 'mm';
    yUnit: 'µm';
    points: PlotPoint[];
    endPointLine: PlotPoint[];
    leastSquaresLine: PlotPoint[];
    shape: 'convex' | 'concave' | 'straight';
  } | null;
  bedTwist: { xUnit: 'mm'; yUnit: 'mm/m'; points: PlotPoint[] } | null;
  /** Way wear along the bed (thickest station = 0), drawn beside the level profile. */
  bedWear: { xUnit: 'mm'; yUnit: 'µm'; points: PlotPoint[]; carriageBindsAtMm: number | null } | null;
  /** Each measured check's q, the wear picture at a glance (1 = new-machine limit). */
  checkRatios: { checkId: string; label: string; q: number; band: CheckBand }[];
  subsystemScores: { subsystem: SubsystemId; label: string; score: number }[];
}

export interface MachineSummary {
  machineType: 'centre-lathe';
  latheType: 'general-purpose' | 'toolroom';
  maker: string | null;
  model: string | null;
  serialNumber: string | null;
  year: number | null;
  swingOverBedMm: number;
  distanceBetweenCentresMm: number;
  spindleBoreMm: number | null;
  motorPowerKw: number | null;
  sizeClass: string;
  inspectedOn: string | null;
}

export interface ScoringResult {
  scoringVersion: string;
  surveyFormatVersion: number;
  machine: MachineSummary;
  checks: CheckResult[];
  subsystems: SubsystemResult[];
  overall: {
    score: number | null;
    condition: ConditionGrade | null;
    explanation: string;
  };
  confidence: {
    value: number;
    measuredChecks: number;
    totalChecks: number;
    missing: { checkId: string; label: string; reason: string }[];
    explanation: string;
  };
  safetyFindings: SafetyFinding[];
  dealBreakers: DealBreaker[];
  notInspected: { id: string; label: string; reason: string }[];
  repairEstimate: RepairEstimate;
  valuation: Valuation;
  plots: PlotSeries;
  notices: string[];
}

export type { Money };
