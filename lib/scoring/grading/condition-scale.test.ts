import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CONDITION_SCALE, gradeForScore, shownScore } from './condition-scale';

describe('a score as shown', () => {
  it('is cut, not rounded, so it stays below the edge of the next grade', () => {
    // The grade edges are Waygrade's own scale (common practice, no published source).
    expect(shownScore(87.96, 1)).toBe(87.9);
    expect(shownScore(87.6)).toBe(87);
    expect(gradeForScore(87.6)).toBe('Very good');
    expect(gradeForScore(shownScore(87.6))).toBe('Very good');
    expect(shownScore(88)).toBe(88);
    expect(shownScore(74.99, 1)).toBe(74.9);
    expect(shownScore(0)).toBe(0);
    expect(shownScore(100, 1)).toBe(100);
  });

  it('is not thrown off by binary fractions: 64.1 × 100 is 6409.999… in floating point', () => {
    // IEEE 754 double arithmetic (ECMA-262 Number type): 64.1 and 0.29 have no exact binary form.
    expect(64.1 * 100 < 6410).toBe(true);
    expect(shownScore(64.1, 2)).toBe(64.1);
    expect(shownScore(8.2, 2)).toBe(8.2);
    expect(shownScore(0.29 * 100)).toBe(29);
  });

  it('reads the same grade as the score itself, at whole points and at one or two decimals', () => {
    // Results carry scores at two decimals; any score with up to six decimals keeps its grade.
    const scores = fc.tuple(fc.integer({ min: 0, max: 100 * 1_000_000 }), fc.integer({ min: 0, max: 6 })).map(([micro, keep]) => {
      const scale = 10 ** keep;
      return Math.round((micro / 1_000_000) * scale) / scale;
    });
    fc.assert(
      fc.property(scores, fc.integer({ min: 0, max: 2 }), (score, digits) => {
        const shown = shownScore(score, digits);
        expect(gradeForScore(shown)).toBe(gradeForScore(score));
        expect(shown).toBeLessThanOrEqual(score);
        expect(score - shown).toBeLessThan(10 ** -digits);
      }),
      { numRuns: 2000 },
    );
  });

  it('sits exactly on each edge of the scale when the score does', () => {
    for (const { grade, fromScore } of CONDITION_SCALE) {
      expect(gradeForScore(shownScore(fromScore, 1))).toBe(grade);
      if (fromScore > 0) expect(gradeForScore(shownScore(fromScore - 0.01, 1))).not.toBe(grade);
    }
  });
});
