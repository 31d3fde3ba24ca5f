import { fmt, roundTo } from '../format-number';
import type { CheckResult, SubsystemResult } from '../result';
import { SUBSYSTEM_TABLE, SUBSYSTEMS } from '../subsystems';
import { gradeForScore } from './condition-scale';

/**
 * Subsystem score = ½ × weighted mean of its measured check scores + ½ × its worst check score.
 * The worst-check half keeps one bad item from hiding behind many good ones (a scored bed is not
 * saved by a clean oil sample); both halves only fall as a check gets worse, so a larger deviation
 * never raises a grade. Waygrade rule (common practice).
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
    for (const c of checks) {
      if (c.subsystem !== id) continue;
      total++;
      if (c.status !== 'measured' || c.score === null) continue;
      measuredCount++;
      totalWeight += c.weight;
      weightedSum += c.weight * c.score;
      // The first of equal worst scores stays the worst, as before.
      if (worst === null || c.score < worst.score!) worst = c;
    }
    const { label } = SUBSYSTEM_TABLE[id];
    if (worst === null) {
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
    // The explanation gives the score in full (two decimals, as graded): a rounded one could cross a grade's edge.
    const score = roundTo((0.5 * mean + 0.5 * worst.score!), 2);
    results.push({
      id,
      label,
      score,
      grade: gradeForScore(score),
      measuredChecks: measuredCount,
      totalChecks: total,
      worstCheckId: worst.id,
      explanation: `score = ½ × weighted mean ${fmt(mean, 1)} + ½ × worst (${worst.label}) ${fmt(worst.score!, 1)} = ${fmt(score, 2)}; ${measuredCount} of ${total} ${total === 1 ? 'check' : 'checks'} measured.`,
    });
  }
  return results;
}
