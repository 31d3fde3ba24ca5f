import { fmt, roundTo } from '../format-number';
import type { CheckResult, SubsystemResult } from '../result';
import { SUBSYSTEM_TABLE, SUBSYSTEMS, type SubsystemId } from '../subsystems';
import { gradeForScore } from './condition-scale';

/**
 * Subsystem score = ½ × weighted mean of its measured check scores + ½ × its worst check score.
 * The worst-check half keeps one bad item from hiding behind many good ones (a scored bed is not
 * saved by a clean oil sample); both halves only fall as a check gets worse, so a larger deviation
 * never raises a grade. Waygrade rule (common practice).
 */
export function gradeSubsystems(checks: readonly CheckResult[]): SubsystemResult[] {
  // One pass to sort the checks into their subsystems, in check order.
  const bySubsystem = new Map<SubsystemId, CheckResult[]>(SUBSYSTEMS.map((id) => [id, []]));
  for (const c of checks) bySubsystem.get(c.subsystem)?.push(c);
  return SUBSYSTEMS.map((id) => {
    const own = bySubsystem.get(id)!;
    const measured = own.filter((c) => c.status === 'measured' && c.score !== null);
    const { label } = SUBSYSTEM_TABLE[id];
    if (!measured.length) {
      return {
        id,
        label,
        score: null,
        grade: null,
        measuredChecks: 0,
        totalChecks: own.length,
        worstCheckId: null,
        explanation: `Not assessed: none of its ${own.length} checks was measured.`,
      };
    }
    const totalWeight = measured.reduce((s, c) => s + c.weight, 0);
    const mean = measured.reduce((s, c) => s + c.weight * c.score!, 0) / totalWeight;
    const worst = measured.reduce((a, b) => (b.score! < a.score! ? b : a));
    const score = roundTo((0.5 * mean + 0.5 * worst.score!), 2);
    return {
      id,
      label,
      score,
      grade: gradeForScore(score),
      measuredChecks: measured.length,
      totalChecks: own.length,
      worstCheckId: worst.id,
      explanation: `score = ½ × weighted mean ${fmt(mean, 1)} + ½ × worst (${worst.label}) ${fmt(worst.score!, 1)} = ${fmt(score, 1)}; ${measured.length} of ${own.length} checks measured.`,
    };
  });
}
