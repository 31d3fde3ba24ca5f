import { describe, expect, it } from 'vitest';
import type { CheckResult } from '@/lib/scoring';
import { formatQuantity, measuredText, permissibleText } from './check-figures';

function check(measured: CheckResult['measured'], permissible: Partial<NonNullable<CheckResult['permissible']>> | null): CheckResult {
  return {
    measured,
    permissible: permissible ? { value: 0, unit: 'mm', direction: 'both', basis: '', source: { kind: 'practice', reference: '' }, ...permissible } : null,
  } as CheckResult;
}

describe('formatQuantity', () => {
  it.each([
    [0.0625, 'mm', '0.063 mm'],
    [-0.01, 'mm', '−0.010 mm'],
    [57.5, 'mm²/s', '57.5 mm²/s'],
    [18, 'MΩ', '18.0 Mohm'],
    [1500, 'mm', '1,500.000 mm'],
  ])('prints %s %s as %s', (value, unit, expected) => {
    expect(formatQuantity(value, unit)).toBe(expected);
  });
});

describe('measuredText and permissibleText', () => {
  it('prints a reading with its unit and the basis of its limit beside the figure', () => {
    const c = check({ value: 0.05, unit: 'mm' }, { value: 0.02, unit: 'mm', basis: '0.02/300 scaled to 300 mm' });
    expect(measuredText(c)).toEqual({ main: '0.050 mm', note: null });
    expect(permissibleText(c)).toEqual({ main: '0.020 mm', basis: '0.02/300 scaled to 300 mm', isFigure: true });
  });

  it('leaves out a basis that only repeats the value', () => {
    expect(permissibleText(check({ value: 0.02, unit: 'mm' }, { value: 0.01, unit: 'mm', basis: '0.01 mm' })).basis).toBeNull();
  });

  it('prints a rating as the inspector’s word with its number, against a short rule', () => {
    const c = check({ value: 2, unit: 'rating 0–3', text: 'marked' }, { value: 1, unit: 'rating 0–3', basis: 'rating 1 or better is within limit' });
    expect(measuredText(c)).toEqual({ main: 'marked', note: 'rating 2 of 3' });
    expect(permissibleText(c)).toEqual({ main: 'rating 1 or better', basis: null, isFigure: false });
  });

  it('prints accessories as words, not survey ids', () => {
    expect(measuredText(check({ value: 2, unit: 'items', text: 'three-jaw-chuck, fixed-steady' }, null))).toEqual({ main: 'three jaw chuck, fixed steady', note: '2 items' });
  });
});
