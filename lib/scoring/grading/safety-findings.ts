import type { CheckResult, SafetyFinding } from '../result';

/** Collect "fix before use" findings from the checks; they stand whatever the grade. */
export function safetyFindingsFrom(checks: readonly CheckResult[]): SafetyFinding[] {
  const findings: SafetyFinding[] = [];
  for (const c of checks) {
    const message = c.details.safetyFinding;
    if (typeof message === 'string') findings.push({ checkId: c.id, message, action: 'fix before use' });
  }
  return findings;
}
