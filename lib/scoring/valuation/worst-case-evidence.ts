import type { ConditionGrade } from '../grading/condition-scale';
import { overallCondition } from '../grading/overall-condition';
import { gradeSubsystems } from '../grading/subsystem-grades';
import type { RepairCostCatalogue } from '../repair/cost-catalogue';
import { estimateRepairs, type RepairEstimate } from '../repair/repair-estimate';
import type { CheckResult } from '../result';

/**
 * What the valuation may assume about checks nobody measured: the worst. Each unmeasured check is
 * taken at the last band with a score of 0, then graded and priced as the measured ones are, so a
 * measurement can only raise the figure and leaving one out can never do so (missing evidence never
 * helps; Waygrade rule). Null when every check was measured.
 */
export function worstCaseEvidence(
  checks: readonly CheckResult[],
  catalogue: RepairCostCatalogue,
): { condition: ConditionGrade | null; repairs: RepairEstimate; unmeasured: number } | null {
  let unmeasured = 0;
  const filled = checks.map((c) => {
    if (c.status === 'measured' && c.score !== null) return c;
    unmeasured++;
    return { ...c, status: 'measured' as const, band: 'unfit' as const, score: 0 };
  });
  if (unmeasured === 0) return null;
  return { condition: overallCondition(gradeSubsystems(filled)).condition, repairs: estimateRepairs(filled, catalogue), unmeasured };
}
