/**
 * Waygrade scoring library: from on-site readings to a graded, costed, valued condition report.
 * Pure and deterministic: no I/O, no clock, no randomness.
 */
export { SCORING_VERSION, SURVEY_FORMAT_VERSION } from './version';

// Survey format
export { latheSurveySchema, type LatheSurvey, type ParsedLatheSurvey } from './survey/lathe-survey';
export { ALL_RUBRICS, DEVICE_STATES, OIL_LEVELS, type Rubric, type RubricLevel, type DeviceState, type OilLevel } from './survey/rubrics';

// Scoring
export { scoreSurvey, safeScoreSurvey, scoreParsedSurvey, REPORT_NOTICES, type ScoreOptions, type SafeScoreResult } from './score-survey';
export { SurveyValidationError, type SurveyIssue } from './errors';
export type {
  ScoringResult,
  CheckResult,
  CheckExplanation,
  SubsystemResult,
  SafetyFinding,
  DealBreaker,
  PlotSeries,
  PlotPoint,
  MachineSummary,
} from './result';
export { CHECK_BANDS, BAND_TABLE, bandFor, type CheckBand, type BandDefinition } from './grading/bands';
export { CONDITION_GRADES, CONDITION_SCALE, gradeForScore, shownScore, type ConditionGrade } from './grading/condition-scale';
export { SUBSYSTEMS, SUBSYSTEM_TABLE, type SubsystemId } from './subsystems';
export { LATHE_CHECKS } from './lathe/lathe-checks';
export { LATHE_LIMITS, SWING_CLASSES, bedStraightnessLimitMm, classFactor } from './limits/lathe-limits';
export { formatReportText } from './report-text';
export {
  HIDDEN_DAMAGE_ITEMS,
  DEAL_BREAKER_ITEMS,
  NOT_INSPECTED_AREAS,
  type HiddenDamageId,
  type DealBreakerId,
} from './survey/condition-findings';
export { AREA_LABELS } from './grading/not-inspected';
export { REPORT_STATEMENTS, GRADE_SCALE_TEXT } from './report-statements';

// Repair and valuation
export { defaultRepairCostCatalogue } from './repair/default-repair-cost-catalogue';
export type { RepairCostCatalogue, RepairAction, RepairRule } from './repair/cost-catalogue';
export { estimateRepairs, type RepairEstimate, type RepairLine } from './repair/repair-estimate';
export { defaultValuationTables, SALE_KINDS, type SaleKind, type ValuationTables } from './valuation/valuation-tables';
export type {
  AdjustedSale,
  ComparableSale,
  CostApproach,
  GridAdjustment,
  LiquidationValue,
  Reconciliation,
  SalesComparison,
  Valuation,
  ValuePremise,
  ValueRange,
} from './valuation/valuation-types';
export { percentGoodByAgeLife, percentGoodLevelled, effectiveAge } from './valuation/age-life';
export { costApproach } from './valuation/cost-approach';
export { salesComparison, gridPercent } from './valuation/sales-comparison';
export { reconcile } from './valuation/reconciliation';
export { money, formatMoney, type Money } from './money';

// Computation modules for live results beside the survey inputs
export {
  levelProfile,
  heightProfile,
  bedTwist,
  straightnessAgainst,
  endPointLine,
  worstLocalStraightness,
  type LevelProfile,
  type ProfileShape,
} from './measure/level-profile';
export { wayWearProfile, type WayWear, type WayWearPoint } from './measure/way-wear';
export { leastSquaresLine, type Line, type Point } from './measure/least-squares-line';
export { scaleTolerance, IS_6040_SCALING_RULE, type ScaledTolerance, type ScalingRule } from './measure/tolerance-scaling';
export { deviationRatio, ratioFromKnots, type AllowedDirection } from './measure/deviation-ratio';
export { twoCollarTest, type TwoCollarInput, type TwoCollarResult } from './measure/two-collar';
export { tailstockAlignmentFromIndicator, type TailstockAlignment, type TailstockMove } from './measure/tailstock-alignment';
export { faceShape } from './measure/facing';
export { backlashMm, type BacklashInput } from './measure/backlash';
export {
  beltSpanMm,
  deflectionBySixtyFourthRule,
  deflectionBySixteenPerMetreRule,
  beltTensionStatus,
  type BeltTensionStatus,
} from './measure/v-belt';
export { vibrationZone, vibrationClassForMotorPower, ISO_10816_1_BOUNDARIES, type VibrationClass, type VibrationZone } from './measure/vibration-zone';
export { iso4406Code, iso4406ScaleNumber, iso4406Range, formatIso4406, parseIso4406, type Iso4406Code } from './measure/iso4406';
export { iso3448Range, iso3448GradeFor, checkViscosityGrade, ISO_3448_GRADES } from './measure/iso3448';

// Units
export { toMillimetres, fromMillimetres, LENGTH_UNITS, type Length, type LengthUnit } from './units/length';
export { toMillimetresPerMetre, fromMillimetresPerMetre, SLOPE_UNITS, type Slope, type SlopeUnit } from './units/slope';
export { toKilowatts, type Power } from './units/power';
