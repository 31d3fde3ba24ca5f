import type { ScoringResult } from '@/lib/scoring';
import type { RepairSplit } from './landed-cost';

/**
 * The landed cost's repair split from a report's scoring result: the valuation's cost to cure and
 * the deal-breakers. Null for results scored before the valuation carried the split, and when
 * the split is in another currency than the listing: the single repair line is shown then.
 */
export function repairSplitFrom(result: ScoringResult, currency: string): RepairSplit | null {
  const cure = (result.valuation as Partial<ScoringResult['valuation']>).costToCure;
  if (!cure || cure.beforeUse.currency !== currency || result.repairEstimate.total.currency !== currency) return null;
  return {
    beforeUse: cure.beforeUse,
    forAccuracy: cure.forAccuracy,
    unmeasuredAllowance: cure.unmeasuredAllowance,
    dealBreakers: result.dealBreakers.map((d) => d.label),
  };
}
