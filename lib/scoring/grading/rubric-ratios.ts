import type { DeviceState, OilLevel } from '../survey/rubrics';

/**
 * Ratio q assigned to each level of a rated item so rated and measured checks grade on one scale.
 * A Waygrade rule (common practice): rating 0 sits in "Sharp", 1 in "In limit", 2 in "Serviceable",
 * 3 in "Worn"; a safety device that is faulty or missing is "Unfit".
 */
export const RATING_RATIOS: readonly number[] = [0.25, 0.75, 1.5, 3];

export function ratioForRating(rating: number): number {
  return RATING_RATIOS[Math.max(0, Math.min(3, Math.round(rating)))]!;
}

export const DEVICE_STATE_RATIOS: Readonly<Record<DeviceState, number>> = {
  works: 0.25,
  faulty: 5,
  missing: 5,
};

export const OIL_LEVEL_RATIOS: Readonly<Record<OilLevel, number>> = {
  correct: 0.25,
  low: 1.5,
  overfull: 1.5,
  empty: 5,
};
