import { describe, expect, it } from 'vitest';
import { converterMinorFor, landedCostAssumptions, tableLandedCost, TABLE_RIGGING_DISTANCE_KM } from './landed-cost-basis';

const entry = (over: Partial<Parameters<typeof converterMinorFor>[0]> = {}) => ({ supplyVoltage: 400, supplyPhases: 3, motorKw: '2.20', priceCurrency: 'EUR', ...over });

describe('converterMinorFor', () => {
  // Sizes and costs: the invented demo table in lib/decision/phase-converter.ts; sizing at 1.5 × motor (common practice).
  const cases: Array<[string, ReturnType<typeof entry>, { voltage: number; phases: 1 | 3 } | null, number | null]> = [
    ['a 2.2 kW three-phase motor on a single-phase shop takes the 4 kW size', entry(), { voltage: 230, phases: 1 }, 140_000],
    ['a 1.4 kW motor (2.1 kW needed) takes the 2.2 kW size', entry({ motorKw: '1.40' }), { voltage: 230, phases: 1 }, 95_000],
    ['a 15 kW motor needs more than the largest size: not known', entry({ motorKw: '15.00' }), { voltage: 230, phases: 1 }, null],
    ['no motor power: not known', entry({ motorKw: null }), { voltage: 230, phases: 1 }, null],
    ['a single-phase 230 V machine runs on a 400 V three-phase shop', entry({ supplyVoltage: 230, supplyPhases: 1 }), { voltage: 400, phases: 3 }, 0],
    ['a three-phase machine on a matching three-phase shop runs', entry(), { voltage: 415, phases: 3 }, 0],
    ['a voltage outside 10 %: not known', entry(), { voltage: 230, phases: 3 }, null],
    ['no shop supply: not known', entry(), null, null],
    ['no nameplate: not known', entry({ supplyPhases: null }), { voltage: 230, phases: 1 }, null],
    ['a listing in another currency than the converter costs: not known', entry({ priceCurrency: 'GBP' }), { voltage: 230, phases: 1 }, null],
  ];
  for (const [what, e, shop, expected] of cases) {
    it(`gives ${expected === null ? 'null' : expected} for ${what}`, () => {
      expect(converterMinorFor(e, shop)).toBe(expected);
    });
  }
});

describe('tableLandedCost', () => {
  it('adds price, rigging at the stated distance, converter, missing tooling and repairs', () => {
    // Rigging, arithmetic on the demo rates: (350 + 120 × 1.8 t) × 1.25 = 707.50; 100 km × 2.50 = 250.00.
    const cost = tableLandedCost(
      { currency: 'EUR', askingPriceMinor: 640_000, repairsMinor: 123_450, missingToolingMinor: 110_000, weightKg: 1_800, siteAccess: 'narrow-door-or-steps', nameplate: { voltage: 400, phases: 3, motorKw: 2.2 } },
      { voltage: 230, phases: 1 },
    );
    expect(TABLE_RIGGING_DISTANCE_KM).toBe(100);
    expect(cost.total.amountMinor).toBe(640_000 + 70_750 + 25_000 + 140_000 + 110_000 + 123_450);
    expect(cost.notKnown).toEqual([]);
  });

  it('leaves out what is not known and names it', () => {
    const cost = tableLandedCost({ currency: 'EUR', askingPriceMinor: null, repairsMinor: 5_000, missingToolingMinor: null, weightKg: null, siteAccess: 'ground-level-wide', nameplate: null }, null);
    expect(cost.total.amountMinor).toBe(5_000);
    expect(cost.notKnown).toEqual(['Asking price', 'Rigging and transport', 'Phase converter', 'Missing tooling']);
  });
});

describe('landedCostAssumptions', () => {
  it('states the distance, the rates and whether a shop supply is known', () => {
    expect(landedCostAssumptions(null)).toMatch(/at 100 km .*€350.*no phase converter, because your shop supply is not in your profile/);
    expect(landedCostAssumptions({ voltage: 230, phases: 1 })).toContain('your 230 V single-phase supply');
  });
});
