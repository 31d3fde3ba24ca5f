import { SurveyValidationError, issuesFromZod, type SurveyIssue } from './errors';
import { confidenceFrom } from './grading/confidence';
import { overallCondition } from './grading/overall-condition';
import { runChecks } from './grading/run-checks';
import { safetyFindingsFrom } from './grading/safety-findings';
import { dealBreakersFrom } from './grading/deal-breakers';
import { AREA_LABELS, notInspectedFrom } from './grading/not-inspected';
import { notMeasuredText } from './grading/not-measured-text';
import { applyDamageCeilings, damageFindingsFrom, damageSafetyFindings } from './grading/damage-findings';
import { provisionalFrom } from './grading/provisional';
import { LATHE_CHECK_FACTS, latheCheckNature } from './lathe/check-facts';
import type { CheckResult } from './result';
import type { CheckEvaluation } from './check-definition';
import type { NotInspectedArea } from './survey/checklist-items';
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

/** A provisional grade says so in its own explanation, with the reasons. */
function withProvisionalNote(overall: ScoringResult['overall'], reasons: readonly string[]): ScoringResult['overall'] {
  if (!reasons.length || overall.condition === null) return overall;
  return { ...overall, explanation: `${overall.explanation} This grade is provisional: ${reasons.join(' ')}` };
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

const areaOf = (checkId: string) => LATHE_CHECK_FACTS[checkId]?.area;
/** Each lathe check's area and nature by its place in LATHE_CHECKS, looked up once at load. */
const CHECK_AREAS = LATHE_CHECKS.map((c) => areaOf(c.id));
const CHECK_NATURES = LATHE_CHECKS.map((c) => latheCheckNature(c.id, undefined));
const TWO_COLLAR_INDEX = LATHE_CHECKS.findIndex((c) => c.id === 'two-collar-test');
const natureAt = (index: number, details: CheckEvaluation['details']) =>
  index === TWO_COLLAR_INDEX ? latheCheckNature(LATHE_CHECKS[index]!.id, details) : CHECK_NATURES[index]!;

/**
 * The survey without the areas the inspector marked not inspected: their readings, if any were
 * typed, are ignored, so an area not inspected is never graded.
 */
function withoutUninspectedAreas(survey: ParsedLatheSurvey): { survey: ParsedLatheSurvey; reasons: Map<NotInspectedArea, string> } {
  const reasons = new Map<NotInspectedArea, string>();
  for (const entry of survey.notInspected ?? []) if (!reasons.has(entry.area)) reasons.set(entry.area, entry.reason);
  if (!reasons.size) return { survey, reasons };
  const masked: Record<string, unknown> = { ...survey };
  for (const area of reasons.keys()) delete masked[area];
  return { survey: masked as ParsedLatheSurvey, reasons };
}

/** A check of an area not inspected says so, rather than "not entered". */
function markNotInspected(checks: CheckResult[], reasons: ReadonlyMap<NotInspectedArea, string>): CheckResult[] {
  if (!reasons.size) return checks;
  return checks.map((c) => {
    const area = areaOf(c.id);
    const reason = area === undefined ? undefined : reasons.get(area);
    if (reason === undefined || c.status === 'measured') return c;
    return { ...c, explanation: { ...c.explanation, text: notMeasuredText(`area not inspected (${AREA_LABELS[area!] ?? area}; the reason is given with the area)`) } };
  });
}

export function scoreParsedSurvey(parsedSurvey: ParsedLatheSurvey, options: ScoreOptions = {}): ScoringResult {
  const { survey, reasons: notInspectedReasons } = withoutUninspectedAreas(parsedSurvey);
  const ctx = buildLatheContext(survey);
  const checks = markNotInspected(runChecks(LATHE_CHECKS, survey, ctx, natureAt), notInspectedReasons);
  const subsystems = gradeSubsystems(checks);
  const damageFindings = damageFindingsFrom(survey);
  const confidence = confidenceFrom(checks);
  const provisional = provisionalFrom(checks, confidence, CHECK_AREAS);
  const overall = withProvisionalNote(applyDamageCeilings(overallCondition(subsystems), damageFindings), provisional.reasons);
  const catalogue = options.costCatalogue ?? defaultRepairCostCatalogue;
  const repairEstimate = estimateRepairs(checks, catalogue);
  const asOfYear = options.asOfYear ?? (survey.inspectedOn ? Number(survey.inspectedOn.slice(0, 4)) : null);
  const year = survey.machine.year;
  const actualAgeYears = asOfYear !== null && year !== undefined ? Math.max(0, asOfYear - year) : null;
  const safetyFindings = [...safetyFindingsFrom(checks), ...damageSafetyFindings(damageFindings)];
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
    provisional: provisional.provisional,
    provisionalReasons: provisional.reasons,
    safetyFindings,
    damageFindings,
    dealBreakers,
    notInspected: notInspectedFrom(survey, confidence),
    repairEstimate,
    valuation,
    plots: plotSeries(ctx, checks, subsystems, bedWearSeries(survey)),
    notices,
  };
}
