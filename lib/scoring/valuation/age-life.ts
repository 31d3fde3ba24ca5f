/**
 * Age-life method: percent good = 1 − effective age / normal useful life, straight line
 * [src: machinery & equipment appraisal, age-life method; e.g. RCN 40 000, life 20 years,
 * effective age 12 → 40 % good → 16 000 before obsolescence]. Kept between a residual floor and 1.
 */
export function percentGoodByAgeLife(effectiveAgeYears: number, normalUsefulLifeYears: number, residual = 0): number {
  const raw = 1 - effectiveAgeYears / normalUsefulLifeYears;
  return Math.min(1, Math.max(residual, raw));
}

/**
 * Percent good that levels off: straight-line age-life on the share above the residual,
 * residual + (1 − residual) × (1 − age / life), never below the residual [memory: published
 * percent-good tables for machinery level off rather than reach zero]. With residual 0 it is the
 * plain straight line above.
 */
export function percentGoodLevelled(effectiveAgeYears: number, normalUsefulLifeYears: number, residual: number): number {
  return residual + (1 - residual) * percentGoodByAgeLife(effectiveAgeYears, normalUsefulLifeYears, 0);
}

/**
 * Effective age for the breakdown method: the actual age. Condition is not allowed to move it,
 * because the wear the findings call for is already deducted as the cost to cure; moving the age
 * as well would count the same wear twice. Without a year, the age the condition grade implies on
 * the straight line, life × (1 − percent good for that grade), is the only evidence there is.
 */
export function effectiveAge(
  actualAgeYears: number | null,
  conditionPercentGood: number | null,
  normalUsefulLifeYears: number,
): number | null {
  if (actualAgeYears !== null) return Math.max(0, actualAgeYears);
  if (conditionPercentGood !== null) return normalUsefulLifeYears * (1 - conditionPercentGood);
  return null;
}
