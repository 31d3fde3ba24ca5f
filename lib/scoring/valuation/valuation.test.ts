import { median as referenceMedian } from 'simple-statistics';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { money } from '../money';
import { effectiveAge, percentGoodByAgeLife } from './age-life';
import { costApproach } from './cost-approach';
import { median } from './median';
import { salesComparison } from './sales-comparison';
import { defaultValuationTables } from './valuation-tables';

describe('age-life percent good', () => {
  it('gives 40 % good and 16 000 for RCN 40 000, life 20, effective age 12', () => {
    // [src: machinery & equipment appraisal, age-life method, domain.md example]
    const pg = percentGoodByAgeLife(12, 20);
    expect(pg).toBeCloseTo(0.4, 12);
    expect(40_000 * pg).toBeCloseTo(16_000, 6);
  });

  it('stays between the residual floor and 1', () => {
    expect(percentGoodByAgeLife(40, 25, 0.05)).toBe(0.05);
    expect(percentGoodByAgeLife(-3, 25)).toBe(1);
  });

  it('averages actual age with the age the condition implies', () => {
    // Waygrade rule (common practice): life 25, 46 years old (capped at 25), Fair (40 % good → 15 years) → 20
    expect(effectiveAge(46, 0.4, 25)).toBeCloseTo(20, 12);
    expect(effectiveAge(null, 0.4, 25)).toBeCloseTo(15, 12);
    expect(effectiveAge(null, null, 25)).toBeNull();
  });
});

describe('cost approach', () => {
  it('deducts repairs from the depreciated value and derives the liquidation values', () => {
    const r = costApproach({
      latheType: 'general-purpose',
      swingMm: 330,
      distanceBetweenCentresMm: 1000,
      actualAgeYears: 4,
      condition: 'Excellent',
      repairTotal: money(10_000, 'EUR'),
      tables: defaultValuationTables,
    })!;
    // RCN 28 000.00 EUR; effective age (4 + 25 × 0.15)/2 = 3.875 → 84.5 % good
    expect(r.replacementCostNew.amountMinor).toBe(2_800_000);
    expect(r.percentGood).toBeCloseTo(0.845, 4);
    expect(r.fairMarketValue.amountMinor).toBe(2_800_000 * 0.845 - 10_000);
    expect(r.orderlyLiquidationValue.amountMinor).toBe(Math.round(r.fairMarketValue.amountMinor * 0.65));
    expect(r.forcedLiquidationValue.amountMinor).toBe(Math.round(r.fairMarketValue.amountMinor * 0.4));
  });

  it('never values a machine below its residual value', () => {
    const r = costApproach({
      latheType: 'general-purpose',
      swingMm: 330,
      distanceBetweenCentresMm: 1000,
      actualAgeYears: 50,
      condition: 'Poor',
      repairTotal: money(5_000_000, 'EUR'),
      tables: defaultValuationTables,
    })!;
    expect(r.fairMarketValue.amountMinor).toBe(2_800_000 * 0.05);
  });
});

describe('sales comparison', () => {
  const sale = (amount: number, condition?: 'Good' | 'Fair') => ({ price: money(amount, 'EUR'), ...(condition ? { condition } : {}) });

  it('needs at least five comparable sales', () => {
    const r = salesComparison([sale(1), sale(2), sale(3), sale(4)], 'Good', defaultValuationTables);
    expect(r.result).toBeNull();
    expect(r.note).toMatch(/at least 5/);
  });

  it('adjusts for condition and takes the median', () => {
    // Fair (0.40) comparables for a Good (0.55) subject are scaled by 0.55/0.40 = 1.375
    const r = salesComparison([sale(400_000, 'Fair'), sale(500_000), sale(600_000), sale(700_000), sale(900_000)], 'Good', defaultValuationTables);
    expect(r.result!.adjustedPrices[0]!.adjusted.amountMinor).toBe(550_000);
    expect(r.result!.indicatedValue.amountMinor).toBe(600_000);
  });
});

describe('median', () => {
  it('matches simple-statistics median', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -1e9, max: 1e9 }), { minLength: 1, maxLength: 50 }), (values) => {
        expect(median(values)).toBeCloseTo(referenceMedian(values), 6);
      }),
    );
  });
});
