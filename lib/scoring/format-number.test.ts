import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fmt, roundTo } from './format-number';

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
});
