import { classFactor, LATHE_LIMITS, swingClass, type LatheLimitId } from '../limits/lathe-limits';
import type { Permissible } from '../check-definition';
import { bedTwist, levelProfile, type LevelProfile, type TwistResult } from '../measure/level-profile';
import { GENERAL_PURPOSE_SCALING_RULE, IS_6040_SCALING_RULE, scaleTolerance } from '../measure/tolerance-scaling';
import { fmt, roundTo } from '../format-number';
import type { ParsedLatheSurvey } from '../survey/lathe-survey';
import { entryResolutionMm, toMillimetres, type Length } from '../units/length';
import { toMillimetresPerMetre } from '../units/slope';
import { toKilowatts } from '../units/power';

/**
 * Figures every lathe check needs, worked out once per survey: size class and limit factor,
 * instruments, and the bed profile (shared by three checks and the plot).
 */
export interface LatheContext {
  latheType: 'general-purpose' | 'toolroom';
  swingMm: number;
  distanceBetweenCentresMm: number;
  classFactor: number;
  sizeClassLabel: string;
  /** " × 1.5 (general-purpose, swing over 800 up to 1600 mm)" after a limit the class factor applies to; "" at factor 1. */
  classFactorText: string;
  levelSensitivityMmPerM: number | null;
  indicatorResolutionMm: number;
  indicatorResolutionStated: boolean;
  motorKw: number | null;
  bed: {
    profile: LevelProfile | null;
    twist: TwistResult | null;
    stationSpacingMm: number | null;
    /** Why levelling results cannot be used, when they cannot. */
    unusableReason: string | null;
  };
}

/** Assumed when the survey does not say: a 0.002 mm test indicator (common practice). */
const DEFAULT_INDICATOR_RESOLUTION_MM = 0.002;

export function buildLatheContext(survey: ParsedLatheSurvey): LatheContext {
  const m = survey.machine;
  const swingMm = toMillimetres(m.swingOverBed);
  const sensitivity = survey.instruments?.levelSensitivity;
  const levelSensitivityMmPerM = sensitivity ? toMillimetresPerMetre(sensitivity) : null;
  const resolution = survey.instruments?.indicatorResolution;
  const klass = swingClass(swingMm);
  const factor = classFactor(swingMm, m.latheType);
  const sizeClassLabel = `${m.latheType}, ${klass.label}`;
  return {
    latheType: m.latheType,
    swingMm,
    distanceBetweenCentresMm: toMillimetres(m.distanceBetweenCentres),
    classFactor: factor,
    sizeClassLabel,
    classFactorText: factor === 1 ? '' : ` × ${fmt(factor, 2)} (${sizeClassLabel})`,
    levelSensitivityMmPerM,
    indicatorResolutionMm: resolution ? toMillimetres(resolution) : DEFAULT_INDICATOR_RESOLUTION_MM,
    indicatorResolutionStated: Boolean(resolution),
    motorKw: m.motorPower ? toKilowatts(m.motorPower) : null,
    bed: buildBed(survey, levelSensitivityMmPerM),
  };
}

function buildBed(survey: ParsedLatheSurvey, sensitivity: number | null): LatheContext['bed'] {
  const bed = survey.bedAndWays;
  const run = bed?.levelling;
  if (!run || (!run.longitudinalReadings && !run.transverseReadings)) {
    return { profile: null, twist: null, stationSpacingMm: null, unusableReason: 'no level readings entered' };
  }
  if (sensitivity === null) {
    return { profile: null, twist: null, stationSpacingMm: null, unusableReason: 'level readings entered without the level sensitivity' };
  }
  if (bed.standLoadState !== 'normal') {
    // A precision level shows the bed twisting when heavy items rest on the stand (common
    // practice), so readings taken with the stand loaded, or in an unknown state, do not describe the bed.
    const state = bed.standLoadState === 'extra-load-on-stand' ? 'with extra load on the stand' : 'with the stand load state not recorded';
    return {
      profile: null,
      twist: null,
      stationSpacingMm: null,
      unusableReason: `levelling was done ${state}; it is only valid with the stand in its normal state — re-level`,
    };
  }
  const spacingMm = toMillimetres(run.stationSpacing);
  const profile = run.longitudinalReadings
    ? levelProfile({
        readingsDivisions: run.longitudinalReadings,
        sensitivityMmPerM: sensitivity,
        stationSpacingMm: spacingMm,
        // Half a division over one base is the smallest height step the level resolves.
        resolutionUm: 0.5 * sensitivity * spacingMm,
      })
    : null;
  const twist = run.transverseReadings ? bedTwist(run.transverseReadings, sensitivity) : null;
  return { profile, twist, stationSpacingMm: spacingMm, unusableReason: null };
}

/** The stated value of each limit as the basis text begins it ("0.02", "0.0075"), written once at load. */
const LIMIT_VALUE_TEXT = Object.fromEntries(
  Object.entries(LATHE_LIMITS).map(([id, entry]) => [id, fmt(entry.value)]),
) as Readonly<Record<LatheLimitId, string>>;

/**
 * A measuring length is taken as known to at most ±0.05 mm however coarsely it was typed, so
 * "26 in" stays 660.4 mm and is not taken for 660 mm (Waygrade rule, common practice).
 */
const MAX_LENGTH_RESOLUTION_MM = 0.05;

/** Permissible value for a check on this machine, with how it was arrived at. */
export function latheLimit(id: LatheLimitId, ctx: LatheContext, measuringLength?: Length): Permissible {
  const entry = LATHE_LIMITS[id];
  const factor = entry.classFactorApplies ? ctx.classFactor : 1;
  const base = entry.value * factor;
  const factorText = entry.classFactorApplies ? ctx.classFactorText : '';
  const overMm = 'overMm' in entry ? entry.overMm : undefined;
  if (overMm !== undefined && measuringLength !== undefined) {
    // The precision-lathe minimum and rounding step apply to toolroom lathes only.
    const rule = ctx.latheType === 'toolroom' ? IS_6040_SCALING_RULE : GENERAL_PURPOSE_SCALING_RULE;
    const measuringLengthMm = toMillimetres(measuringLength);
    const scaled = scaleTolerance({ valueMm: base, overMm }, measuringLengthMm, rule, Math.min(entryResolutionMm(measuringLength), MAX_LENGTH_RESOLUTION_MM));
    const taken = scaled.lengthUsedMm === measuringLengthMm ? '' : ` (taken as ${fmt(scaled.lengthUsedMm, 1)} mm, equal within the entry's resolution)`;
    const ruleText = rule.roundingStepMm > 0
      ? `min ${rule.minimumMm}, rounded up to ${rule.roundingStepMm}`
      : `min ${rule.minimumMm}, not rounded`;
    return {
      value: scaled.valueMm,
      unit: entry.unit,
      direction: entry.direction,
      basis: `${LIMIT_VALUE_TEXT[id]}/${overMm}${factorText} scaled to ${fmt(measuringLengthMm, 1)} mm${taken} by the proportional rule (${ruleText})`,
      source: entry.source,
    };
  }
  return {
    value: roundTo(base, 6),
    unit: entry.unit,
    direction: entry.direction,
    basis: `${LIMIT_VALUE_TEXT[id]} ${entry.unit}${overMm !== undefined ? `/${overMm}` : ''}${factorText}`,
    source: entry.source,
  };
}
