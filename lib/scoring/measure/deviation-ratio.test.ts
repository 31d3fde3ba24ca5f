import { describe, expect, it } from 'vitest';
import { deviationRatio, ratioFromKnots } from './deviation-ratio';

describe('deviation ratio with sign rules', () => {
  it.each([
    // Two-sided: plain |d|/T.
    [0.01, 0.02, 'both', 0, 0.5, false],
    [-0.01, 0.02, 'both', 0, 0.5, false],
    // Free end of a test bar may only rise [memory: ISO 1708]: 0.004 down fails although small.
    [-0.004, 0.02, 'positive-only', 0.001, 1.2, true],
    [0.004, 0.02, 'positive-only', 0.001, 0.2, false],
    // Tailstock centre may only be higher: 0.02 lower against 0.04 fails.
    [-0.02, 0.04, 'positive-only', 0.002, 1.5, true],
    // Within one instrument step the sign is not trusted.
    [-0.001, 0.02, 'positive-only', 0.002, 0.05, false],
    [0.003, 0.01, 'negative-only', 0.001, 1.3, true],
  ] as const)('gives d=%s T=%s (%s, step %s) q=%s, wrong way %s', (d, t, dir, res, q, wrong) => {
    const r = deviationRatio(d, t, dir, res);
    expect(r.q).toBeCloseTo(q, 9);
    expect(r.wrongDirection).toBe(wrong);
  });

  it('fails a wrong-way deviation even when it is smaller than an allowed one that passes', () => {
    expect(deviationRatio(-0.005, 0.02, 'positive-only', 0.001).q).toBeGreaterThan(1);
    expect(deviationRatio(0.015, 0.02, 'positive-only', 0.001).q).toBeLessThan(1);
  });
});

describe('ratio from knots', () => {
  const knots = [
    { value: 1, q: 0.5 },
    { value: 2, q: 1 },
    { value: 4, q: 2 },
  ];
  it.each([
    [0, 0],
    [0.5, 0.25],
    [1, 0.5],
    [3, 1.5],
    [4, 2],
    [6, 3],
  ])('maps %s to q %s', (v, q) => {
    expect(ratioFromKnots(v, knots)).toBeCloseTo(q, 9);
  });
});
