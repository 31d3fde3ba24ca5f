import { describe, expect, it } from 'vitest';
import type { Valuation } from '@/lib/scoring/valuation/valuation-types';
import { comparablesUsed } from './comparables-used';

const money = (amountMinor: number) => ({ amountMinor, currency: 'EUR' });
const sale = (description: string, price: number, adjustment: number, outlier = false) => ({
  description,
  price: money(price),
  saleKind: null,
  soldOn: null,
  grid: [],
  adjustment,
  adjusted: money(Math.round(price * adjustment)),
  grossAdjustment: Math.abs(adjustment - 1),
  weight: outlier ? 0 : 0.5,
  outlier,
});
const noValuation = {
  currency: 'EUR',
  premise: { id: 'as-is-in-use', label: '', explanation: '' },
  effectiveDate: null,
  conditionValued: null,
  costApproach: null,
  salesComparison: null,
  orderlyLiquidation: null,
  forcedLiquidation: null,
  reconciliation: null,
  range: null,
  costToCure: { beforeUse: money(0), forAccuracy: money(0), unmeasuredAllowance: money(0), deductedInValue: true },
  notes: [],
} satisfies Valuation;

describe('comparablesUsed', () => {
  it('traces each adjusted price back to its comparable sale by the leading #id, outliers left out', () => {
    const valuation = {
      ...noValuation,
      salesComparison: {
        comparablesGiven: 3,
        comparablesUsed: 2,
        indicatedValue: money(500_000),
        working: [],
        adjustedPrices: [
          sale('#17 Corvane CL-330, 1998, auction', 400_000, 1.1),
          sale('a sale without an id', 600_000, 0.9),
          sale('#18 Corvane CL-330, 1971, liquidation', 90_000, 1.2, true),
        ],
      },
    } satisfies Valuation;
    expect(comparablesUsed(valuation)).toEqual([
      { comparableId: 17, description: 'Corvane CL-330, 1998, auction', priceMinor: 400_000, adjustment: 1.1, adjustedMinor: 440_000, currency: 'EUR' },
      { comparableId: null, description: 'a sale without an id', priceMinor: 600_000, adjustment: 0.9, adjustedMinor: 540_000, currency: 'EUR' },
    ]);
  });

  it('returns nothing when the valuation had no sales comparison', () => {
    expect(comparablesUsed(noValuation)).toEqual([]);
    expect(comparablesUsed(null)).toEqual([]);
  });
});
