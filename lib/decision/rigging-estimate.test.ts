import { describe, expect, it } from 'vitest';
import { DecisionInputError } from './decision-input-error';
import { DEMO_RIGGING_RATES, estimateRigging, type RiggingRates } from './rigging-estimate';

// Rates are invented demo figures; expected values are worked by hand from the stated formula.
const rates: RiggingRates = { ...DEMO_RIGGING_RATES };

describe('estimateRigging', () => {
  it.each([
    // 1 850 kg, 120 km, ground level: (35 000 + 12 000 × 1.85) × 1 = 57 200; 250 × 120 = 30 000.
    { weightKg: 1850, distanceKm: 120, siteAccess: 'ground-level-wide' as const, handling: 57_200, transport: 30_000, heavy: false },
    // Narrow door: (35 000 + 12 000 × 1.85) × 1.25 = 71 500.
    { weightKg: 1850, distanceKm: 120, siteAccess: 'narrow-door-or-steps' as const, handling: 71_500, transport: 30_000, heavy: false },
    // 4 200 kg is above the 3 500 kg light-truck limit: (35 000 + 50 400) × 1 = 85 400; 450 × 80 = 36 000.
    { weightKg: 4200, distanceKm: 80, siteAccess: 'ground-level-wide' as const, handling: 85_400, transport: 36_000, heavy: true },
    // Exactly at the limit stays on the ordinary truck; 0 km is a move within the same site.
    { weightKg: 3500, distanceKm: 0, siteAccess: 'upper-floor-or-basement' as const, handling: 123_200, transport: 0, heavy: false },
  ])('prices $weightKg kg over $distanceKm km with $siteAccess access', ({ handling, transport, heavy, ...input }) => {
    const e = estimateRigging(input, rates);
    expect(e.handling).toEqual({ amountMinor: handling, currency: 'EUR' });
    expect(e.transport).toEqual({ amountMinor: transport, currency: 'EUR' });
    expect(e.total.amountMinor).toBe(handling + transport);
    expect(e.heavyVehicle).toBe(heavy);
  });

  it('rounds a half minor unit away from zero', () => {
    // 250.5 × 1 km = 250.5 → 251.
    const e = estimateRigging({ weightKg: 1000, distanceKm: 1, siteAccess: 'ground-level-wide' }, { ...rates, perKmMinor: 250.5 });
    expect(e.transport.amountMinor).toBe(251);
  });

  it('uses edited rates rather than the demo figures', () => {
    const e = estimateRigging({ weightKg: 2000, distanceKm: 10, siteAccess: 'ground-level-wide' }, { ...rates, callOutMinor: 0, handlingPerTonneMinor: 10_000, perKmMinor: 100 });
    expect(e.total.amountMinor).toBe(20_000 + 1_000);
  });

  it.each([
    [{ weightKg: 0, distanceKm: 10 }, 'weightKg'],
    [{ weightKg: -5, distanceKm: 10 }, 'weightKg'],
    [{ weightKg: 1000, distanceKm: -1 }, 'distanceKm'],
    [{ weightKg: Number.NaN, distanceKm: 1 }, 'weightKg'],
  ])('refuses %o naming the field', (input, field) => {
    expect(() => estimateRigging({ ...input, siteAccess: 'ground-level-wide' }, rates)).toThrow(DecisionInputError);
    try {
      estimateRigging({ ...input, siteAccess: 'ground-level-wide' }, rates);
    } catch (e) {
      expect((e as DecisionInputError).field).toBe(field);
    }
  });

  it('refuses a negative rate', () => {
    expect(() => estimateRigging({ weightKg: 1000, distanceKm: 1, siteAccess: 'ground-level-wide' }, { ...rates, perKmMinor: -1 })).toThrow(/rate/);
  });
});
