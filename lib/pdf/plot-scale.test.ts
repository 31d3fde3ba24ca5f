import { describe, expect, it } from 'vitest';
import { linearScale, niceTicks } from './plot-scale';

describe('niceTicks', () => {
  it.each([
    [0, 1500, 5, [0, 500, 1000, 1500]],
    [-3.2, 62.5, 5, [-20, 0, 20, 40, 60, 80]],
    [0, 0.05, 4, [0, 0.02, 0.04, 0.06]],
  ])('covers %s to %s with round steps', (min, max, count, expected) => {
    expect(niceTicks(min, max, count)).toEqual(expected);
  });

  it('widens an empty range so a flat line still gets an axis', () => {
    expect(niceTicks(0, 0).length).toBeGreaterThan(1);
  });
});

describe('linearScale', () => {
  it('maps the ends of the domain onto the ends of the range, inverted for the y axis', () => {
    const y = linearScale([0, 100], [200, 0]);
    expect([y(0), y(50), y(100)]).toEqual([200, 100, 0]);
  });
});
