import { describe, expect, it } from 'vitest';
import { DecisionInputError } from './decision-input-error';
import { missingToolingMinor, valueInclusions, type Inclusion } from './inclusions-value';

const eur = (amountMinor: number) => ({ amountMinor, currency: 'EUR' });

// Condition shares are a Waygrade rule (common practice); expected values are hand arithmetic.
describe('valueInclusions', () => {
  it('values each item at its condition share and totals the missing ones at full replacement cost', () => {
    const items: Inclusion[] = [
      { description: '3-jaw chuck', condition: 'good', replacementCost: eur(60_000) }, // × 0.6 = 36 000
      { description: 'Fixed steady', condition: 'usable', replacementCost: eur(45_000) }, // × 0.4 = 18 000
      { description: 'Quick-change tool post', condition: 'worn', replacementCost: eur(30_000) }, // × 0.2 = 6 000
      { description: '4-jaw chuck', condition: 'missing', replacementCost: eur(55_000) },
      { description: 'Manuals', condition: 'good', replacementCost: null },
    ];
    expect(valueInclusions(items, 'EUR')).toEqual({ value: eur(60_000), missingCost: eur(55_000), unpriced: ['Manuals'] });
  });

  it('rounds each item to a whole minor unit', () => {
    // 12 345 × 0.4 = 4 938; 1 × 0.6 = 0.6 → 1.
    expect(valueInclusions([{ description: 'Collets', condition: 'usable', replacementCost: eur(12_345) }, { description: 'Key', condition: 'good', replacementCost: eur(1) }], 'EUR').value).toEqual(eur(4_939));
  });

  it('gives zero for an empty list', () => {
    expect(valueInclusions([], 'EUR')).toEqual({ value: eur(0), missingCost: eur(0), unpriced: [] });
  });

  it.each([
    { description: 'DRO', condition: 'good' as const, replacementCost: { amountMinor: 100, currency: 'GBP' } },
    { description: 'DRO', condition: 'good' as const, replacementCost: eur(-1) },
    { description: 'DRO', condition: 'good' as const, replacementCost: eur(1.5) },
  ])('refuses %o', (item) => {
    expect(() => valueInclusions([item], 'EUR')).toThrow(DecisionInputError);
  });
});

describe('missingToolingMinor', () => {
  const item = (condition: 'good' | 'missing', replacementCostMinor: number | null, currency = 'EUR') => ({ condition, replacementCostMinor, currency });

  it('totals the replacement cost of the items listed as missing', () => {
    // Hand arithmetic: 55 000 + 12 000 = 67 000.
    expect(missingToolingMinor([item('good', 60_000), item('missing', 55_000), item('missing', 12_000)], 'EUR')).toBe(67_000);
  });

  it('gives "not known", not nothing to pay, when a missing item has no price in the report currency', () => {
    expect(missingToolingMinor([item('missing', null)], 'EUR')).toBeNull();
    expect(missingToolingMinor([item('missing', 9_000, 'GBP')], 'EUR')).toBeNull();
    expect(missingToolingMinor([], 'EUR')).toBeNull();
    expect(missingToolingMinor([item('good', null)], 'EUR')).toBe(0);
  });
});
