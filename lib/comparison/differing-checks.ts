import type { CheckBand } from '@/lib/scoring/grading/bands';
import type { CheckResult } from '@/lib/scoring/result';

export type CheckReading = { measuredText: string | null; band: CheckBand | null; score: number | null; q: number | null };
export type DifferingCheck = { id: string; label: string; spread: number; readings: CheckReading[] };

function measuredText(check: CheckResult) {
  if (check.status !== 'measured' || !check.measured) return null;
  return check.measured.text ?? `${check.measured.value} ${check.measured.unit}`;
}

/**
 * The checks on which machines differ most: for each check measured on at least two of them, the
 * spread of its 0–100 score (best minus worst), largest first. Readings keep the machines' order;
 * a machine where the check was not measured shows as such.
 */
export function differingChecks(machines: ReadonlyArray<{ checks: readonly CheckResult[] } | null>, limit = 8): DifferingCheck[] {
  const byId = new Map<string, { label: string; readings: CheckReading[] }>();
  machines.forEach((machine, index) => {
    for (const check of machine?.checks ?? []) {
      let entry = byId.get(check.id);
      if (!entry) {
        entry = { label: check.label, readings: machines.map(() => ({ measuredText: null, band: null, score: null, q: null })) };
        byId.set(check.id, entry);
      }
      entry.readings[index] = { measuredText: measuredText(check), band: check.band, score: check.score, q: check.q };
    }
  });
  const result: DifferingCheck[] = [];
  for (const [id, entry] of byId) {
    const scores = entry.readings.map((r) => r.score).filter((s): s is number => s !== null);
    if (scores.length < 2) continue;
    const spread = Math.max(...scores) - Math.min(...scores);
    if (spread > 0) result.push({ id, label: entry.label, spread, readings: entry.readings });
  }
  return result.sort((a, b) => b.spread - a.spread || a.label.localeCompare(b.label)).slice(0, limit);
}
