import type { CheckNature, ValueWithUnit, Permissible } from './check-definition';
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
  /** Condition (what the grade is about) or a set-up or service item (priced, listed, weighing lightly). */
  nature: CheckNature;
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

/**
 * What the inspector answered "yes" to on the hidden-damage and deal-breaker checklists, with its
 * consequence: "fix before use" (safety), a deal-breaker, a ceiling on the overall grade, or noted.
 */
export interface DamageFinding {
  id: string;
  label: string;
  evidence: string;
  consequence: 'safety' | 'deal-breaker' | 'grade-ceiling' | 'noted';
  /** The best overall grade the machine can have with this finding, when it sets one. */
  gradeCeiling: ConditionGrade | null;
  text: string;
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
    shape: 'convex' | 'concave' | 'mixed' | 'straight';
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
  /**
   * True when the grade rests on too little evidence to sign: confidence below
   * FIRM_GRADE_CONFIDENCE or a whole survey area without a single measured check. Shown as
   * "provisional" wherever the grade is shown; the value is then given as a range.
   */
  provisional: boolean;
  /** Why the grade is provisional, one line each (empty when it is firm). */
  provisionalReasons: string[];
  safetyFindings: SafetyFinding[];
  damageFindings: DamageFinding[];
  dealBreakers: DealBreaker[];
  notInspected: { id: string; label: string; reason: string }[];
  repairEstimate: RepairEstimate;
  valuation: Valuation;
  plots: PlotSeries;
  notices: string[];
}

export type { Money };
