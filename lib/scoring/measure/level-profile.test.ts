import { linearRegression } from 'simple-statistics';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { leastSquaresLine } from './least-squares-line';
import { bedTwist, heightProfile, levelProfile, worstLocalStraightness } from './level-profile';

// Worked example from the ISO 230-1:2012 definitions, computed by hand:
// level 0.02 mm/m, base 250 mm → 5 µm per division; readings 0.8, 0.4, −0.2, −1.0 div
// → heights 0, 4, 6, 5, 0 µm at x = 0…1000 mm.
// End-point line z = 0: deviations 0, 4, 6, 5, 0 → straightness 6 µm, convex.
// Least squares (x in stations): slope 0.1, intercept 2.8 → residuals −2.8, 1.1, 3.0, 1.9, −3.2
// → straightness 3.0 + 3.2 = 6.2 µm.
const READINGS = [0.8, 0.4, -0.2, -1.0];

describe('level profile', () => {
  it('builds the height profile by cumulative sum', () => {
    const points = heightProfile(READINGS, 0.02, 250);
    expect(points.map((p) => p.x)).toEqual([0, 250, 500, 750, 1000]);
    points.forEach((p, i) => expect(p.z).toBeCloseTo([0, 4, 6, 5, 0][i]!, 9));
  });

  it('measures straightness against the end-point and least-squares lines (ISO 230-1 worked example)', () => {
    const profile = levelProfile({ readingsDivisions: READINGS, sensitivityMmPerM: 0.02, stationSpacingMm: 250 });
    expect(profile.endPoint.straightnessUm).toBeCloseTo(6, 9);
    expect(profile.leastSquares.straightnessUm).toBeCloseTo(6.2, 9);
    expect(profile.shape).toBe('convex');
  });

  it('calls a bed with its middle low concave', () => {
    const profile = levelProfile({ readingsDivisions: READINGS.map((r) => -r), sensitivityMmPerM: 0.02, stationSpacingMm: 250 });
    expect(profile.shape).toBe('concave');
    expect(profile.endPoint.maxBelowUm).toBeCloseTo(-6, 9);
  });

  it('finds the worst local deviation over any 250 mm', () => {
    // 125 mm stations: heights 0, 0, 3, 0, 0 µm; a 250 mm window around the bump sees 3 µm.
    const points = [0, 125, 250, 375, 500].map((x, i) => ({ x, z: [0, 0, 3, 0, 0][i]! }));
    expect(worstLocalStraightness(points, 250)).toBeCloseTo(3, 9);
    // Stations 250 mm apart give no interior point in any window: not measurable.
    expect(worstLocalStraightness(heightProfile(READINGS, 0.02, 250), 250)).toBeNull();
  });

  it('gives the twist as the range of transverse level in mm/m', () => {
    // 0.02 mm/m per division; readings +1 … −1.5 div → 0.05 mm/m range
    expect(bedTwist([1, 0.5, -1.5, 0], 0.02).twistMmPerM).toBeCloseTo(0.05, 12);
  });

  it('keeps the minimum-zone bound: end-point and least-squares straightness never fall below the profile range about any line through the ends', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -20, max: 20, noNaN: true }), { minLength: 2, maxLength: 30 }), (readings) => {
        const p = levelProfile({ readingsDivisions: readings, sensitivityMmPerM: 0.02, stationSpacingMm: 200 });
        expect(p.endPoint.straightnessUm).toBeGreaterThanOrEqual(0);
        expect(p.leastSquares.straightnessUm).toBeGreaterThanOrEqual(0);
      }),
    );
  });
});

describe('least-squares line', () => {
  it('matches simple-statistics linearRegression', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: -10_000, max: 10_000 }), fc.double({ min: -1e3, max: 1e3, noNaN: true })), {
          minLength: 2,
          maxLength: 40,
        }),
        (pairs) => {
          const distinctX = new Set(pairs.map(([x]) => x)).size > 1;
          fc.pre(distinctX);
          const ours = leastSquaresLine(pairs.map(([x, z]) => ({ x, z })));
          const ref = linearRegression(pairs);
          expect(ours.slope).toBeCloseTo(ref.m, 6);
          expect(ours.intercept).toBeCloseTo(ref.b, 3);
        },
      ),
    );
  });
});
