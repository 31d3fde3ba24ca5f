import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { IS_6040_SCALING_RULE, scaleTolerance } from './tolerance-scaling';

describe('tolerance scaling by the proportional rule', () => {
  it.each([
    // [src: IS 6040:1993 cl. 3.5, citing ISO 230-1] 0.02/300 → 0.014 over 200 mm, 0.005 over 50 mm
    [200, 0.014, false],
    [50, 0.005, true],
    // At the stated length the stated value stands.
    [300, 0.02, false],
    // 0.02/300 over 600 mm → 0.04 (proportional, already on the 0.002 step)
    [600, 0.04, false],
  ])('scales 0.02/300 to %s mm as %s', (length, expected, limited) => {
    const r = scaleTolerance({ valueMm: 0.02, overMm: 300 }, length, IS_6040_SCALING_RULE);
    expect(r.valueMm).toBeCloseTo(expected, 9);
    expect(r.limitedByMinimum).toBe(limited);
  });

  it('never goes below the minimum', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 10_000, noNaN: true }), (length) => {
        expect(scaleTolerance({ valueMm: 0.02, overMm: 300 }, length).valueMm).toBeGreaterThanOrEqual(0.005);
      }),
    );
  });

  it('is monotone in length', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.001, max: 0.1, noNaN: true }),
        fc.double({ min: 10, max: 2000, noNaN: true }),
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: 0, max: 5000, noNaN: true }),
        (value, over, a, extra) => {
          const shorter = scaleTolerance({ valueMm: value, overMm: over }, a).valueMm;
          const longer = scaleTolerance({ valueMm: value, overMm: over }, a + extra).valueMm;
          expect(longer).toBeGreaterThanOrEqual(shorter);
        },
      ),
    );
  });
});
