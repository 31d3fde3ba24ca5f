import { DEAL_BREAKER_ITEMS } from '@/lib/scoring';

// Server side only in practice: the scoring library's index is not for the compare page's browser bundle.

/** Deal-breakers in words, by the scoring result's id; an id the library no longer lists reads as itself. */
const LABELS: ReadonlyMap<string, string> = new Map(DEAL_BREAKER_ITEMS.map((item) => [item.id, item.label]));

export function dealBreakersInWords(ids: readonly string[]): Array<{ id: string; label: string }> {
  return ids.map((id) => ({ id, label: LABELS.get(id) ?? id }));
}
