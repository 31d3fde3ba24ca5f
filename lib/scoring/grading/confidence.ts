import { fmt, roundTo } from '../format-number';
import type { CheckResult, ScoringResult } from '../result';

/**
 * Confidence 0–1: the share of check weight actually measured. Each unmeasured check is listed
 * with its reason, heaviest first, so nothing missing passes silently.
 */
export function confidenceFrom(checks: readonly CheckResult[]): ScoringResult['confidence'] {
  const total = checks.reduce((s, c) => s + c.weight, 0);
  const measured = checks.filter((c) => c.status === 'measured');
  const measuredWeight = measured.reduce((s, c) => s + c.weight, 0);
  const value = total === 0 ? 0 : roundTo((measuredWeight / total), 3);
  const missingChecks = checks
    .filter((c) => c.status === 'not-measured')
    .sort((a, b) => b.weight - a.weight || a.id.localeCompare(b.id));
  const missing = missingChecks.map((c) => ({
    checkId: c.id,
    label: c.label,
    reason: c.explanation.text.replace(/^Not measured: /, '').replace(/\. Counts against.*$/, ''),
  }));
  const heaviest = missing.slice(0, 5).map((m) => `${m.label} (${m.reason})`);
  const explanation = missing.length
    ? `Measured ${measured.length} of ${checks.length} checks, ${fmt(value * 100, 1)} % of the check weight. Missing, heaviest first: ${heaviest.join('; ')}${missing.length > 5 ? `; and ${missing.length - 5} more` : ''}.`
    : `All ${checks.length} checks measured.`;
  return { value, measuredChecks: measured.length, totalChecks: checks.length, missing, explanation };
}
