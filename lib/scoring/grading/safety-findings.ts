import type { CheckResult, SafetyFinding } from '../result';

/** Collect "fix before use" findings from the checks; they stand whatever the grade. */
export function safetyFindingsFrom(checks: readonly CheckResult[]): SafetyFinding[] {
  return checks.flatMap((c) => {
    const message = c.details.safetyFinding;
    return typeof message === 'string' ? [{ checkId: c.id, message, action: 'fix before use' as const }] : [];
  });
}
