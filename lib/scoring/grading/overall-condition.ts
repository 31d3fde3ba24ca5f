import { fmt, roundTo } from '../format-number';
import type { ScoringResult, SubsystemResult } from '../result';
import { SUBSYSTEM_TABLE } from '../subsystems';
import { gradeForScore } from './condition-scale';

/**
 * Overall score = 0.7 × subsystem scores weighted by SUBSYSTEM_TABLE (over assessed subsystems) +
 * 0.3 × the worst subsystem score, then placed on the appraisers' scale. No assessed subsystem → no
 * grade at all rather than a guess. Waygrade rule (common practice).
 */
export function overallCondition(subsystems: readonly SubsystemResult[]): ScoringResult['overall'] {
  const assessed = subsystems.filter((s) => s.score !== null);
  if (!assessed.length) {
    return { score: null, condition: null, explanation: 'No check was measured, so no condition can be given.' };
  }
  const totalWeight = assessed.reduce((s, x) => s + SUBSYSTEM_TABLE[x.id].weight, 0);
  const mean = assessed.reduce((s, x) => s + SUBSYSTEM_TABLE[x.id].weight * x.score!, 0) / totalWeight;
  const worst = assessed.reduce((a, b) => (b.score! < a.score! ? b : a));
  const score = roundTo((0.7 * mean + 0.3 * worst.score!), 2);
  const condition = gradeForScore(score);
  // The score in full (two decimals, as graded and stored): a rounded figure could read across a grade's edge.
  return {
    score,
    condition,
    explanation: `score = 0.7 × weighted subsystem mean ${fmt(mean, 1)} + 0.3 × worst subsystem (${worst.label}) ${fmt(worst.score!, 2)} = ${fmt(score, 2)} → ${condition}; ${assessed.length} of ${subsystems.length} subsystems assessed.`,
  };
}
