import { ratioFromKnots, type RatioKnot } from '../measure/deviation-ratio';

/**
 * Score 0–100 of one check from its ratio q, piecewise linear (Waygrade rule, common practice):
 * q 0 → 100, 0.5 → 95, 1 → 85, 2 → 60, 4 → 25, 8 and beyond → 0. Strictly decreasing in q
 * until 8, so a larger deviation never scores better.
 */
const SCORE_KNOTS: readonly RatioKnot[] = [
  { value: 0, q: 100 },
  { value: 0.5, q: 95 },
  { value: 1, q: 85 },
  { value: 2, q: 60 },
  { value: 4, q: 25 },
  { value: 8, q: 0 },
];

export function checkScore(q: number): number {
  if (q >= 8) return 0;
  return ratioFromKnots(Math.max(0, q), SCORE_KNOTS);
}
