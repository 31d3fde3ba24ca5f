import { fmt, roundTo } from '../format-number';
import type { CheckResult, SubsystemResult } from '../result';
import { SUBSYSTEM_TABLE, SUBSYSTEMS } from '../subsystems';
import { gradeForScore } from './condition-scale';

/** Share of its weight a set-up or service item carries in the mean (Waygrade rule, common practice). */
export const SET_UP_AND_SERVICE_WEIGHT_SHARE = 0.25;

/**
 * Highest score a subsystem may have when every measured condition check in it is outside the
 * new-machine limit: just below "Very good" (75), so the grade reads consistently with its checks.
 */
const ALL_OUT_OF_LIMIT_CEILING = 74.99;

/**
 * Subsystem score = ½ × weighted mean of its measured check scores + ½ × its worst condition
 * check score. The worst-check half keeps one bad item from hiding behind many good ones (a scored
 * bed is not saved by a clean oil sample). Set-up and service items (a tailstock set over, oil of
 * the wrong grade) count at a quarter of their weight in the mean and are never the worst check:
 * an hour's work puts them right. When every measured condition check is outside its limit, the
 * score stays below "Very good". Every part only falls as a check gets worse, so a larger
 * deviation never raises a grade. Waygrade rule (common practice).
 */
export function gradeSubsystems(checks: readonly CheckResult[]): SubsystemResult[] {
  const results: SubsystemResult[] = [];
  for (const id of SUBSYSTEMS) {
    // One pass per subsystem over the checks, in check order, summing as the weighted mean needs
    // (same order of additions as a filter and reduce, so the same floating-point sums).
    let total = 0;
    let measuredCount = 0;
    let totalWeight = 0;
    let weightedSum = 0;
    let worst: CheckResult | null = null;
    let conditionMeasured = 0;
    let conditionOutOfLimit = 0;
    for (const c of checks) {
      if (c.subsystem !== id) continue;
      total++;
      if (c.status !== 'measured' || c.score === null) continue;
      measuredCount++;
      const weight = c.nature === 'condition' ? c.weight : c.weight * SET_UP_AND_SERVICE_WEIGHT_SHARE;
      totalWeight += weight;
      weightedSum += weight * c.score;
      if (c.nature !== 'condition') continue;
      conditionMeasured++;
      if (c.q !== null && c.q > 1) conditionOutOfLimit++;
      // The first of equal worst scores stays the worst, as before.
      if (worst === null || c.score < worst.score!) worst = c;
    }
    const { label } = SUBSYSTEM_TABLE[id];
    if (measuredCount === 0) {
      results.push({
        id,
        label,
        score: null,
        grade: null,
        measuredChecks: 0,
        totalChecks: total,
        worstCheckId: null,
        explanation: `Not assessed: none of its ${total} checks was measured.`,
      });
      continue;
    }
    const mean = weightedSum / totalWeight;
    // Only set-up and service items measured: the mean stands for both halves.
    const worstScore = worst === null ? mean : worst.score!;
    const worstText = worst === null ? `no condition check measured, mean ${fmt(mean, 1)}` : `worst (${worst.label}) ${fmt(worst.score!, 1)}`;
    // The explanation gives the score in full (two decimals, as graded): a rounded one could cross a grade's edge.
    const raw = roundTo((0.5 * mean + 0.5 * worstScore), 2);
    const allOut = conditionMeasured > 0 && conditionOutOfLimit === conditionMeasured;
    const score = allOut ? Math.min(raw, ALL_OUT_OF_LIMIT_CEILING) : raw;
    const ceilingText = allOut && raw > ALL_OUT_OF_LIMIT_CEILING
      ? `; every measured condition check is outside its new-machine limit, so held below Very good at ${fmt(score, 2)}`
      : '';
    results.push({
      id,
      label,
      score,
      grade: gradeForScore(score),
      measuredChecks: measuredCount,
      totalChecks: total,
      worstCheckId: worst?.id ?? null,
      explanation: `score = ½ × weighted mean ${fmt(mean, 1)} + ½ × ${worstText} = ${fmt(raw, 2)}${ceilingText}; ${measuredCount} of ${total} ${total === 1 ? 'check' : 'checks'} measured.`,
    });
  }
  return results;
}
