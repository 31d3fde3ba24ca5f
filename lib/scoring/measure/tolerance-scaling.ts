import { roundTo } from '../format-number';

/**
 * Proportional rule for a tolerance stated over one measuring length and applied over another:
 * scale in proportion to the length, round to a step, never go below a minimum
 * [src: ISO 230-1 general rule as applied by IS 6040:1993 cl. 3.5 — for precision lathes minimum
 * 0.005 mm, rounded to 0.002 mm; e.g. 0.02/300 → 0.014 over 200 mm, 0.005 over 50 mm].
 *
 * Two Waygrade rules (common practice) sit on top, so that units never change a verdict:
 * - a measuring length within the entry's own resolution of the stated length, or of a whole
 *   millimetre, is that length (11.811 in = 299.9994 mm is 300 mm; 10.0394 in is 255 mm);
 * - a scaled value is rounded up to its step, never down, so rounding never turns a reading
 *   inside the proportional limit into one outside it (0.02/300 over 255 mm = 0.017 → 0.018).
 * The minimum and the 0.002 mm step belong to the precision-lathe tables: they apply to toolroom
 * lathes. A general-purpose lathe takes the proportional value itself, never below 0.01 mm, the
 * smallest graduation of the dial indicators such lathes are checked with (common practice).
 */
export interface StatedTolerance {
  /** Tolerance value, mm. */
  valueMm: number;
  /** Length the tolerance is stated over, mm. */
  overMm: number;
}

export interface ScalingRule {
  minimumMm: number;
  /** 0 = no rounding step: the proportional value itself. */
  roundingStepMm: number;
}

export const IS_6040_SCALING_RULE: ScalingRule = { minimumMm: 0.005, roundingStepMm: 0.002 };

/** General-purpose lathes: proportional, never below 0.01 mm (Waygrade rule, common practice). */
export const GENERAL_PURPOSE_SCALING_RULE: ScalingRule = { minimumMm: 0.01, roundingStepMm: 0 };

export interface ScaledTolerance {
  valueMm: number;
  proportionalMm: number;
  /** The measuring length as entered, mm. */
  lengthMm: number;
  /** The length the tolerance was scaled to (the entered one, or the stated or whole-mm length it equals). */
  lengthUsedMm: number;
  rule: ScalingRule;
  limitedByMinimum: boolean;
}

/** Round up to the step; the tiny allowance removes binary noise such as 7.0000000001 steps. */
function roundUpToStep(value: number, step: number): number {
  // No step: the proportional value itself, kept to 0.000 001 mm (rounded up, so never below it).
  if (step <= 0) return Math.ceil(value * 1e6 - 1e-6) / 1e6;
  const steps = Math.ceil(value / step - 1e-9);
  return roundTo(steps * step, 6);
}

/** The length a measuring length stands for, given how finely it was entered. */
export function lengthForScaling(lengthMm: number, statedOverMm: number, resolutionMm: number): number {
  if (Math.abs(lengthMm - statedOverMm) <= resolutionMm + 1e-12) return statedOverMm;
  const whole = Math.round(lengthMm);
  if (Math.abs(lengthMm - whole) <= resolutionMm + 1e-12) return whole;
  return lengthMm;
}

export function scaleTolerance(
  stated: StatedTolerance,
  lengthMm: number,
  rule: ScalingRule = IS_6040_SCALING_RULE,
  lengthResolutionMm = 0,
): ScaledTolerance {
  const lengthUsedMm = lengthForScaling(lengthMm, stated.overMm, lengthResolutionMm);
  const proportionalMm = (stated.valueMm * lengthUsedMm) / stated.overMm;
  // At the stated length the stated value stands as published (0.015/300 stays 0.015 over 300 mm).
  const rounded = lengthUsedMm === stated.overMm ? stated.valueMm : roundUpToStep(proportionalMm, rule.roundingStepMm);
  const valueMm = roundTo(Math.max(rule.minimumMm, rounded), 9);
  return { valueMm, proportionalMm, lengthMm, lengthUsedMm, rule, limitedByMinimum: rounded < rule.minimumMm };
}
