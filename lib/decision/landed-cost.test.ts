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
