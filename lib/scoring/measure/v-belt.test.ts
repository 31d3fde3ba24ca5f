import { describe, expect, it } from 'vitest';
import { beltSpanMm, beltTensionStatus, deflectionBySixteenPerMetreRule, deflectionBySixtyFourthRule } from './v-belt';

describe('V-belt span and deflection', () => {
  it.each([
    // Equal pulleys: span equals the centre distance.
    [500, 100, 100, 500],
    // 3-4-5 triangle: C = 500, (D − d)/2 = 300 → t = 400.
    [500, 700, 100, 400],
  ])('gives span √(C² − ((D − d)/2)²) for C=%s D=%s d=%s as %s mm', (c, big, small, span) => {
    // Span formula [src: belt makers' design guides]; the cases are worked examples (arithmetic beside each).
    expect(beltSpanMm({ centreDistanceMm: c, largePulleyDiameterMm: big, smallPulleyDiameterMm: small })).toBeCloseTo(span, 9);
  });

  it('gives 1/64 in per inch of span', () => {
    // Rule [src: belt makers' design guides]; worked example: 32 in span / 64 = 0.5 in deflection.
    expect(deflectionBySixtyFourthRule(32 * 25.4)).toBeCloseTo(0.5 * 25.4, 9);
  });

  it('gives 16 mm per metre of span', () => {
    // Rule [src: the "Fenner method"]; worked example: 0.75 m span × 16 mm/m = 12 mm.
    expect(deflectionBySixteenPerMetreRule(750)).toBeCloseTo(12, 9);
  });

  it('puts a small lathe drive target at about 10 mm', () => {
    // common practice: about 10 mm mid-span deflection on a small lathe drive
    const span = beltSpanMm({ centreDistanceMm: 620, largePulleyDiameterMm: 150, smallPulleyDiameterMm: 75 });
    expect(Math.abs(deflectionBySixtyFourthRule(span) - 10)).toBeLessThan(1);
    expect(Math.abs(deflectionBySixteenPerMetreRule(span) - 10)).toBeLessThan(1);
  });

  it.each([
    [5, 10, 'too-tight'],
    [10, 10, 'correct'],
    [15, 10, 'slack'],
    [25, 10, 'slipping'],
  ] as const)('calls %s mm against a %s mm target %s', (measured, target, status) => {
    // Status bands: common practice
    expect(beltTensionStatus(measured, target)).toBe(status);
  });
});
