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
 * Effective age: where the machine's condition puts it on its life line. The age implied by the
 * condition grade (life × (1 − percent good for that grade)) is averaged with the actual age,
 * capped at the life; without a year, the condition alone decides (Waygrade rule, common practice).
 */
export function effectiveAge(
  actualAgeYears: number | null,
  conditionPercentGood: number | null,
  normalUsefulLifeYears: number,
): number | null {
  const byCondition = conditionPercentGood === null ? null : normalUsefulLifeYears * (1 - conditionPercentGood);
  const byAge = actualAgeYears === null ? null : Math.min(Math.max(0, actualAgeYears), normalUsefulLifeYears);
  if (byCondition === null) return byAge;
  if (byAge === null) return byCondition;
  return (byAge + byCondition) / 2;
}
