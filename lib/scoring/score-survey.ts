import { SurveyValidationError, issuesFromZod, type SurveyIssue } from './errors';
import { confidenceFrom } from './grading/confidence';
import { overallCondition } from './grading/overall-condition';
import { runChecks } from './grading/run-checks';
import { safetyFindingsFrom } from './grading/safety-findings';
import { dealBreakersFrom } from './grading/deal-breakers';
import { notInspectedFrom } from './grading/not-inspected';
import { bedWearSeries, powerRunNotice } from './bed-wear-series';
import { gradeSubsystems } from './grading/subsystem-grades';
import { buildLatheContext, type LatheContext } from './lathe/lathe-context';
import { LATHE_CHECKS } from './lathe/lathe-checks';
import { plotSeries } from './plot-series';
import type { RepairCostCatalogue } from './repair/cost-catalogue';
import { defaultRepairCostCatalogue } from './repair/default-repair-cost-catalogue';
import { estimateRepairs } from './repair/repair-estimate';
import type { MachineSummary, ScoringResult } from './result';
import { compiledLatheSurveySchema } from './survey/compiled-survey-schema';
import type { LatheSurvey, ParsedLatheSurvey } from './survey/lathe-survey';
import { toMillimetres } from './units/length';
import { defaultValuationTables, type ValuationTables } from './valuation/valuation-tables';
import type { ComparableSale } from './valuation/valuation-types';
import { valueMachine } from './valuation/value-machine';
import { worstCaseEvidence } from './valuation/worst-case-evidence';
import { SCORING_VERSION, SURVEY_FORMAT_VERSION } from './version';
import { roundTo } from './format-number';

export interface ScoreOptions {
  comparableSales?: readonly ComparableSale[];
  costCatalogue?: RepairCostCatalogue;
  valuationTables?: ValuationTables;
  /** Year the machine's age is counted to; defaults to the year of the inspection date, if any. */
  asOfYear?: number;
}

export type SafeScoreResult = { ok: true; result: ScoringResult } | { ok: false; issues: SurveyIssue[] };

/**
 * The report always carries these: the inspection involves rotating work, open cabinets and oil,
 * and the report stands beside — not above — local codes, the maker's instructions and licensed practice.
 */
export const REPORT_NOTICES: readonly string[] = [
  'This report does not replace local codes, the maker\'s instructions or licensed practice.',
  'Safety findings say "fix before use": the machine should not be used until each is put right by a competent person; electrical work by a qualified person only.',
];

export function safeScoreSurvey(survey: unknown, options: ScoreOptions = {}): SafeScoreResult {
  const parsed = compiledLatheSurveySchema.safeParse(survey);
  if (!parsed.success) return { ok: false, issues: issuesFromZod(parsed.error) };
  return { ok: true, result: scoreParsedSurvey(parsed.data, options) };
}

/** Score a survey; throws SurveyValidationError listing every bad field when the input is invalid. */
export function scoreSurvey(survey: unknown | LatheSurvey, options: ScoreOptions = {}): ScoringResult {
  const outcome = safeScoreSurvey(survey, options);
  if (!outcome.ok) throw new SurveyValidationError(outcome.issues);
  return outcome.result;
}

function machineSummary(survey: ParsedLatheSurvey, ctx: LatheContext): MachineSummary {
  const m = survey.machine;
  return {
    machineType: 'centre-lathe',
    latheType: m.latheType,
    maker: m.maker ?? null,
    model: m.model ?? null,
    serialNumber: m.serialNumber ?? null,
    year: m.year ?? null,
    swingOverBedMm: roundTo(ctx.swingMm, 2),
    distanceBetweenCentresMm: roundTo(ctx.distanceBetweenCentresMm, 1),
    spindleBoreMm: m.spindleBore ? roundTo(toMillimetres(m.spindleBore), 2) : null,
    motorPowerKw: ctx.motorKw === null ? null : roundTo(ctx.motorKw, 3),
    sizeClass: ctx.sizeClassLabel,
    inspectedOn: survey.inspectedOn ?? null,
  };
}

export function scoreParsedSurvey(survey: ParsedLatheSurvey, options: ScoreOptions = {}): ScoringResult {
  const ctx = buildLatheContext(survey);
  const checks = runChecks(LATHE_CHECKS, survey, ctx);
  const subsystems = gradeSubsystems(checks);
  const overall = overallCondition(subsystems);
  const catalogue = options.costCatalogue ?? defaultRepairCostCatalogue;
  const repairEstimate = estimateRepairs(checks, catalogue);
  const asOfYear = options.asOfYear ?? (survey.inspectedOn ? Number(survey.inspectedOn.slice(0, 4)) : null);
  const year = survey.machine.year;
  const actualAgeYears = asOfYear !== null && year !== undefined ? Math.max(0, asOfYear - year) : null;
  const confidence = confidenceFrom(checks);
  const safetyFindings = safetyFindingsFrom(checks);
  const dealBreakers = dealBreakersFrom(survey);
  const valuation = valueMachine({
    latheType: ctx.latheType,
    swingMm: ctx.swingMm,
    distanceBetweenCentresMm: ctx.distanceBetweenCentresMm,
    yearBuilt: year ?? null,
    actualAgeYears,
    effectiveDate: survey.inspectedOn ?? null,
    condition: overall.condition,
    repairs: repairEstimate,
    safetyCheckIds: safetyFindings.map((f) => f.checkId),
    dealBreakers,
    confidence: confidence.value,
    worstCase: worstCaseEvidence(checks, catalogue),
    comparableSales: options.comparableSales ?? [],
    tables: options.valuationTables ?? defaultValuationTables,
  });
  const notices = [...REPORT_NOTICES];
  const powerRun = powerRunNotice(survey);
  if (powerRun) notices.push(powerRun);
  if (!ctx.indicatorResolutionStated) notices.push('Indicator resolution not stated: 0.002 mm assumed when judging the sign of small deviations.');
  return {
    scoringVersion: SCORING_VERSION,
    surveyFormatVersion: SURVEY_FORMAT_VERSION,
    machine: machineSummary(survey, ctx),
    checks,
    subsystems,
    overall,
    confidence,
    safetyFindings,
    dealBreakers,
    notInspected: notInspectedFrom(survey, confidence),
    repairEstimate,
    valuation,
    plots: plotSeries(ctx, checks, subsystems, bedWearSeries(survey)),
    notices,
  };
}
