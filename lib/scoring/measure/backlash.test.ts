import { describe, expect, it } from 'vitest';
import { backlashMm } from './backlash';

describe('slide backlash', () => {
  it.each([
    [{ method: 'length', backlashMm: 0.12 } as const, 0.12],
    // 15 divisions of a 0.04 mm diameter-reading dial: the slide moves 0.02 mm per division → 0.3 mm
    [{ method: 'dial', divisions: 15, graduationMm: 0.04, readsDiameter: true } as const, 0.3],
    [{ method: 'dial', divisions: 4, graduationMm: 0.025, readsDiameter: false } as const, 0.1],
  ])('turns %o into %s mm', (input, mm) => {
    expect(backlashMm(input)).toBeCloseTo(mm, 12);
  });
});
