import { describe, expect, it } from 'vitest';
import type { Valuation } from '@/lib/scoring/valuation/valuation-types';
import { comparablesUsed } from './comparables-used';

const money = (amountMinor: number) => ({ amountMinor, currency: 'EUR' });

describe('comparablesUsed', () => {
  it('traces each adjusted price back to its comparable sale by the leading #id', () => {
    const valuation = {
      currency: 'EUR',
      costApproach: null,
      reconciliation: null,
      notes: [],
      salesComparison: {
        comparablesGiven: 3,
        comparablesUsed: 2,
        indicatedValue: money(500_000),
        working: [],
        adjustedPrices: [
          { description: '#17 Corvane CL-330, 1998, auction', price: money(400_000), adjustment: 1.1, adjusted: money(440_000) },
          { description: 'a sale without an id', price: money(600_000), adjustment: 0.9, adjusted: money(540_000) },
        ],
      },
    } satisfies Valuation;
    expect(comparablesUsed(valuation)).toEqual([
      { comparableId: 17, description: 'Corvane CL-330, 1998, auction', priceMinor: 400_000, adjustment: 1.1, adjustedMinor: 440_000, currency: 'EUR' },
      { comparableId: null, description: 'a sale without an id', priceMinor: 600_000, adjustment: 0.9, adjustedMinor: 540_000, currency: 'EUR' },
    ]);
  });

  it('returns nothing when the valuation had no sales comparison', () => {
    expect(comparablesUsed({ currency: 'EUR', costApproach: null, salesComparison: null, reconciliation: null, notes: [] })).toEqual([]);
    expect(comparablesUsed(null)).toEqual([]);
  });
});
