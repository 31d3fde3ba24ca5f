import { roundTo } from '../format-number';

/**
 * Proportional rule for a tolerance stated over one measuring length and applied over another:
 * scale in proportion to the length, round to a step, never go below a minimum
 * [src: ISO 230-1 general rule as applied by IS 6040:1993 cl. 3.5 — for precision lathes minimum
 * 0.005 mm, rounded to 0.002 mm; e.g. 0.02/300 → 0.014 over 200 mm, 0.005 over 50 mm].
 */
export interface StatedTolerance {
  /** Tolerance value, mm. */
  valueMm: number;
  /** Length the tolerance is stated over, mm. */
  overMm: number;
}

export interface ScalingRule {
  minimumMm: number;
  roundingStepMm: number;
}

export const IS_6040_SCALING_RULE: ScalingRule = { minimumMm: 0.005, roundingStepMm: 0.002 };

export interface ScaledTolerance {
  valueMm: number;
  proportionalMm: number;
  lengthMm: number;
  rule: ScalingRule;
  limitedByMinimum: boolean;
}

/** Round to the nearest step; the tiny bias removes binary noise such as 6.9999999 steps. */
function roundToStep(value: number, step: number): number {
  const steps = Math.round(value / step + 1e-9);
  return roundTo((steps * step), 6);
}

export function scaleTolerance(
  stated: StatedTolerance,
  lengthMm: number,
  rule: ScalingRule = IS_6040_SCALING_RULE,
): ScaledTolerance {
  const proportionalMm = (stated.valueMm * lengthMm) / stated.overMm;
  // Rounding applies to a value worked out for another length; at the stated length the stated
  // value stands as published (0.015/300 stays 0.015 over 300 mm).
  const rounded = lengthMm === stated.overMm ? stated.valueMm : roundToStep(proportionalMm, rule.roundingStepMm);
  const valueMm = Math.max(rule.minimumMm, rounded);
  return { valueMm, proportionalMm, lengthMm, rule, limitedByMinimum: rounded < rule.minimumMm };
}
