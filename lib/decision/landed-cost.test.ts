import { describe, expect, it } from 'vitest';
import { DecisionInputError } from './decision-input-error';
import { landedCost, type LandedCostInput } from './landed-cost';

const eur = (amountMinor: number) => ({ amountMinor, currency: 'EUR' });

const base: LandedCostInput = {
  currency: 'EUR',
  askingPrice: eur(850_000),
  buyersPremiumPercent: null,
  taxPercent: null,
  rigging: eur(87_200),
  converter: eur(0),
  missingTooling: eur(45_000),
  repairs: eur(120_000),
};

// Expected totals are hand arithmetic from the formula in landed-cost.ts; premium and tax rates are invented demo figures.
describe('landedCost', () => {
  it('adds price, rigging, converter, missing tooling and repairs', () => {
    const r = landedCost(base);
    expect(r.total).toEqual(eur(850_000 + 87_200 + 0 + 45_000 + 120_000));
    expect(r.notKnown).toEqual([]);
    expect(r.lines.map((l) => l.id)).toEqual(['asking-price', 'rigging', 'converter', 'missing-tooling', 'repairs']);
  });

  it('charges the premium on the price and the tax on price plus premium', () => {
    // 850 000 × 15 % = 127 500; (850 000 + 127 500) × 20 % = 195 500.
    const r = landedCost({ ...base, buyersPremiumPercent: 15, taxPercent: 20 });
    expect(r.lines.find((l) => l.id === 'buyers-premium')?.amount).toEqual(eur(127_500));
    expect(r.lines.find((l) => l.id === 'tax')?.amount).toEqual(eur(195_500));
    expect(r.total.amountMinor).toBe(850_000 + 127_500 + 195_500 + 87_200 + 45_000 + 120_000);
  });

  it('rounds a percentage to a whole minor unit, half away from zero', () => {
    // 333 × 12.5 % = 41.625 → 42; 1 001 × 7.5 % = 75.075 → 75.
    expect(landedCost({ ...base, askingPrice: eur(333), buyersPremiumPercent: 12.5 }).lines[1]!.amount).toEqual(eur(42));
    expect(landedCost({ ...base, askingPrice: eur(1_001), taxPercent: 7.5 }).lines[1]!.amount).toEqual(eur(75));
  });

  it('leaves unknown amounts out of the total and names them', () => {
    const r = landedCost({ ...base, askingPrice: null, buyersPremiumPercent: 10, rigging: null });
    expect(r.total).toEqual(eur(0 + 45_000 + 120_000));
    expect(r.notKnown).toEqual(['Asking price', 'Buyer’s premium (10 %)', 'Rigging and transport']);
  });

  it('refuses an amount in another currency', () => {
    expect(() => landedCost({ ...base, repairs: { amountMinor: 100, currency: 'GBP' } })).toThrow(DecisionInputError);
  });

  it.each([
    { buyersPremiumPercent: -1 },
    { taxPercent: 101 },
    { rigging: eur(12.5) },
    { missingTooling: eur(-100) },
  ])('refuses %o', (bad) => {
    expect(() => landedCost({ ...base, ...bad })).toThrow(DecisionInputError);
  });
});

describe('landedCost with the valuation’s repair split', () => {
  const split = { beforeUse: eur(45_000), forAccuracy: eur(75_000), unmeasuredAllowance: eur(30_000), dealBreakers: [] };

  it('keeps repairs before use apart from repairs to restore accuracy and names the unmeasured allowance', () => {
    // 45 000 + 75 000 = the 120 000 repair estimate; the total is the same as with one repair line.
    const r = landedCost({ ...base, repairSplit: split });
    expect(r.lines.map((l) => l.id)).toEqual(['asking-price', 'rigging', 'converter', 'missing-tooling', 'repairs-before-use', 'repairs']);
    expect(r.lines.find((l) => l.id === 'repairs-before-use')!.label).toBe('Repairs needed before use');
    expect(r.lines.find((l) => l.id === 'repairs')!.label).toBe('Repairs to restore accuracy');
    expect(r.lines.find((l) => l.id === 'repairs')!.note).toContain('EUR 300.00 for checks not measured');
    expect(r.total.amountMinor).toBe(850_000 + 87_200 + 45_000 + 45_000 + 75_000);
  });

  it('names unpriced deal-breakers beside the repairs needed before use', () => {
    const r = landedCost({ ...base, repairSplit: { ...split, unmeasuredAllowance: eur(0), dealBreakers: ['Cracked casting'] } });
    expect(r.lines.find((l) => l.id === 'repairs-before-use')!.note).toMatch(/Cracked casting.*parts or rebuild/);
    expect(r.lines.find((l) => l.id === 'repairs')!.note).toBeNull();
  });

  it('refuses a split that does not add up to the repair estimate', () => {
    expect(() => landedCost({ ...base, repairSplit: { ...split, forAccuracy: eur(70_000) } })).toThrow(DecisionInputError);
  });
});
