import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GENERAL_PURPOSE_SCALING_RULE, IS_6040_SCALING_RULE, scaleTolerance } from './tolerance-scaling';

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

  it.each([
    // Waygrade rule (common practice): a scaled value is rounded up to its step, never down.
    // Worked example: 0.02 × 220/300 = 0.014 67 → 0.016 (the nearest step, 0.014, would be tighter).
    [220, 0.016],
    // Worked example: 0.02 × 255/300 = 0.017, half-way between steps → 0.018.
    [255, 0.018],
    // Worked example: 0.02 × 240/300 = 0.016, already on a step.
    [240, 0.016],
  ])('rounds 0.02/300 over %s mm up to %s', (length, expected) => {
    expect(scaleTolerance({ valueMm: 0.02, overMm: 300 }, length, IS_6040_SCALING_RULE).valueMm).toBeCloseTo(expected, 9);
  });

  it('takes a length within the entry resolution of the stated length as the stated length', () => {
    // Worked example: 11.811 in × 25.4 = 299.9994 mm, entered to ±0.0005 in = ±0.0127 mm.
    const r = scaleTolerance({ valueMm: 0.015, overMm: 300 }, 299.9994, IS_6040_SCALING_RULE, 0.0127);
    expect(r.lengthUsedMm).toBe(300);
    expect(r.valueMm).toBe(0.015);
  });

  it('keeps the precision-lathe minimum and step off general-purpose lathes', () => {
    // Waygrade rule (common practice): proportional, not rounded, never below 0.01 mm.
    // Worked example: 0.02 × 200/300 = 0.013 333… mm, kept to 0.000 001 mm rounded up: 0.013 334;
    // over 100 mm 0.006 67 → the 0.01 minimum.
    expect(scaleTolerance({ valueMm: 0.02, overMm: 300 }, 200, GENERAL_PURPOSE_SCALING_RULE).valueMm).toBe(0.013334);
    expect(scaleTolerance({ valueMm: 0.02, overMm: 300 }, 100, GENERAL_PURPOSE_SCALING_RULE).valueMm).toBe(0.01);
  });

  it('never gives a limit below the proportional value', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.1, noNaN: true }), fc.double({ min: 1, max: 5000, noNaN: true }), (value, length) => {
        for (const rule of [IS_6040_SCALING_RULE, GENERAL_PURPOSE_SCALING_RULE]) {
          const r = scaleTolerance({ valueMm: value, overMm: 300 }, length, rule);
          expect(r.valueMm).toBeGreaterThanOrEqual(r.proportionalMm - 1e-9);
        }
      }),
    );
  });
});
