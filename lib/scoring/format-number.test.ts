import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fmt, joinNumbers, plainNumber, roundTo } from './format-number';

describe('number rounding for reports', () => {
  it.each([
    [0.0125, 3, 0.013],
    [-0.0000001, 4, 0],
    [28.800000000000004, 2, 28.8],
    [1234.5678, 0, 1235],
  ])('rounds %s to %s decimals as %s', (n, d, expected) => {
    expect(roundTo(n, d)).toBe(expected);
  });

  it('never returns negative zero', () => {
    expect(Object.is(roundTo(-1e-9, 3), -0)).toBe(false);
    expect(fmt(-0.00001, 3)).toBe('0');
  });

  it('stays within half a step of toFixed', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: 0, max: 6 }), (n, d) => {
        expect(Math.abs(roundTo(n, d) - Number(n.toFixed(d)))).toBeLessThanOrEqual(10 ** -d + 1e-9);
      }),
    );
  });

  // Reference: ECMAScript Number::toString (String(x)), the text fmt replaced — same characters
  // for every number and every number of decimals, including exponent form and the halves.
  it('writes exactly what String(roundTo(n, digits)) writes', () => {
    const same = (n: number, d: number) => {
      expect(fmt(n, d)).toBe(String(roundTo(n, d)));
    };
    fc.assert(
      fc.property(fc.double(), fc.integer({ min: 0, max: 12 }), (n, d) => {
        same(n, d);
      }),
      { numRuns: 5000 },
    );
    fc.assert(
      fc.property(fc.integer({ min: -2_000_000, max: 2_000_000 }), fc.integer({ min: 0, max: 9 }), (k, d) => {
        // Decimals ending in 5 one place beyond the rounding: where rounding half up shows.
        same((k * 10 + 5) / 10 ** (d + 1), d);
        same(k / 10 ** d, d);
      }),
      { numRuns: 5000 },
    );
    for (const [n, d] of [
      [0.0000005, 6], [0.000001, 6], [1e-7, 9], [123456789.123456, 6], [-2.5, 0], [-0.00025, 4], [1e21, 2], [Number.NaN, 2], [-Infinity, 1],
    ] as const) same(n, d);
    expect(fmt(0.0125, 3)).toBe('0.013');
    expect(fmt(-12.5, 0)).toBe('-12');
    expect(fmt(1.0000001, 4)).toBe('1');
  });

  // Reference: ECMAScript Number::toString and Array.prototype.join, which these stand in for.
  it('writes readings exactly as String() and join do', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.double(), fc.integer({ min: -4000, max: 4000 }).map((k) => k / 8))), (values) => {
        for (const v of values) expect(plainNumber(v)).toBe(String(v));
        expect(joinNumbers(values)).toBe(values.join(', '));
      }),
      { numRuns: 3000 },
    );
    expect(joinNumbers([0.6, -0.25, 1e-7, 0])).toBe('0.6, -0.25, 1e-7, 0');
  });
});
