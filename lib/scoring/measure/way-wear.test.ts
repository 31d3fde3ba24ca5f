import { describe, expect, it } from 'vitest';
import { wayWearProfile } from './way-wear';

describe('wayWearProfile', () => {
  it('measures wear from the thickest station (common practice: thickest point stands in for the original)', () => {
    const wear = wayWearProfile([
      { xMm: 0, thicknessMm: 24.95 },
      { xMm: 200, thicknessMm: 24.93 },
      { xMm: 400, thicknessMm: 24.98 },
      { xMm: 600, thicknessMm: 25.0 },
    ]);
    expect(wear?.points.map((p) => Number(p.wearMm.toFixed(3)))).toEqual([0.05, 0.07, 0.02, 0]);
    expect(wear?.maxWearAtMm).toBe(200);
    expect(wear?.maxWearMm).toBeCloseTo(0.07, 6);
  });

  it('sorts stations from the headstock before building the profile', () => {
    const wear = wayWearProfile([
      { xMm: 500, thicknessMm: 30 },
      { xMm: 0, thicknessMm: 29.9 },
    ]);
    expect(wear?.points.map((p) => p.xMm)).toEqual([0, 500]);
  });

  it('returns nothing for fewer than two stations', () => {
    expect(wayWearProfile([{ xMm: 0, thicknessMm: 25 }])).toBeNull();
  });
});
