import { describe, expect, it } from 'vitest';
import safetyDefect from '@/lib/scoring/examples/safety-defect.json';
import dealBreaker from '@/lib/scoring/examples/deal-breaker.json';
import { scoreSurvey } from '@/lib/scoring';
import { landedCost } from './landed-cost';
import { repairSplitFrom } from './repair-split';

const eur = (amountMinor: number) => ({ amountMinor, currency: 'EUR' });

describe('repairSplitFrom', () => {
  it('agrees with the valuation: before use plus accuracy is the repair estimate, plus the allowance the deduction', () => {
    const result = scoreSurvey(safetyDefect, { asOfYear: 2025 });
    const split = repairSplitFrom(result, 'EUR')!;
    expect(split.beforeUse.amountMinor).toBeGreaterThan(0);
    expect(split.beforeUse.amountMinor + split.forAccuracy.amountMinor).toBe(result.repairEstimate.total.amountMinor);
    expect(split.beforeUse.amountMinor + split.forAccuracy.amountMinor + split.unmeasuredAllowance.amountMinor).toBe(result.valuation.costApproach!.repairDeduction.amountMinor);
    const cost = landedCost({ currency: 'EUR', askingPrice: eur(500_000), buyersPremiumPercent: null, taxPercent: null, rigging: null, converter: null, missingTooling: null, repairs: result.repairEstimate.total, repairSplit: split });
    expect(cost.lines.find((l) => l.id === 'repairs-before-use')!.amount).toEqual(split.beforeUse);
  });

  it('carries the deal-breakers, and nothing for a result scored before the split existed', () => {
    const result = scoreSurvey(dealBreaker, { asOfYear: 2025 });
    expect(repairSplitFrom(result, 'EUR')!.dealBreakers).toEqual(result.dealBreakers.map((d) => d.label));
    expect(result.dealBreakers.length).toBeGreaterThan(0);
    const before: Partial<typeof result.valuation> = { ...result.valuation };
    delete before.costToCure;
    expect(repairSplitFrom({ ...result, valuation: before as typeof result.valuation }, 'EUR')).toBeNull();
    expect(repairSplitFrom(result, 'GBP')).toBeNull();
  });
});
