import { fmt, roundTo } from '../format-number';
import type { CheckResult, ScoringResult } from '../result';
import { notMeasuredReason } from './not-measured-text';

/**
 * Confidence 0–1: the share of check weight actually measured. Each unmeasured check is listed
 * with its reason, heaviest first, so nothing missing passes silently.
 */
export function confidenceFrom(checks: readonly CheckResult[]): ScoringResult['confidence'] {
  let total = 0;
  let measuredWeight = 0;
  let measuredCount = 0;
  const missingChecks: CheckResult[] = [];
  for (const c of checks) {
    total += c.weight;
    if (c.status === 'measured') {
      measuredWeight += c.weight;
      measuredCount++;
    } else missingChecks.push(c);
  }
  const value = total === 0 ? 0 : roundTo((measuredWeight / total), 3);
  sortHeaviestFirst(missingChecks);
  const missing = missingChecks.map((c) => ({ checkId: c.id, label: c.label, reason: notMeasuredReason(c.explanation.text) }));
  const heaviest = missing.slice(0, 5).map((m) => `${m.label} (${m.reason})`);
  const explanation = missing.length
    ? `Measured ${measuredCount} of ${checks.length} checks, ${fmt(value * 100, 1)} % of the check weight. Missing, heaviest first: ${heaviest.join('; ')}${missing.length > 5 ? `; and ${missing.length - 5} more` : ''}.`
    : `All ${checks.length} checks measured.`;
  return { value, measuredChecks: measuredCount, totalChecks: checks.length, missing, explanation };
}

/** Order of the missing list: heavier first, then by id (localeCompare). */
function comesBefore(a: CheckResult, b: CheckResult): boolean {
  return (b.weight - a.weight || a.id.localeCompare(b.id)) < 0;
}

/**
 * Stable binary insertion sort by comesBefore: the order Array.prototype.sort (stable) gives with
 * the same comparison, without a callback per comparison — the list is at most a few dozen checks.
 */
function sortHeaviestFirst(list: CheckResult[]): void {
  for (let i = 1; i < list.length; i++) {
    const item = list[i]!;
    // After every earlier item that item does not come before, so equal items keep their order.
    let lo = 0;
    let hi = i;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (comesBefore(item, list[mid]!)) hi = mid;
      else lo = mid + 1;
    }
    for (let j = i; j > lo; j--) list[j] = list[j - 1]!;
    list[lo] = item;
  }
}
