import { describe, expect, it } from 'vitest';
import { formatMoney, multiplyMoney } from './money';

describe('money', () => {
  it.each([
    [0, 'EUR 0.00'],
    [5, 'EUR 0.05'],
    [123456, 'EUR 1,234.56'],
    [100_000_000, 'EUR 1,000,000.00'],
    [-2500, '−EUR 25.00'],
  ])('formats %s minor units as %s', (minor, text) => {
    expect(formatMoney({ amountMinor: minor, currency: 'EUR' })).toBe(text);
  });

  it('agrees with Intl grouping for en-GB', () => {
    for (const minor of [1, 999, 100_000, 12_345_678, 987_654_321_00]) {
      const intl = (minor / 100).toLocaleString('en-GB', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
      expect(formatMoney({ amountMinor: minor, currency: 'EUR' })).toBe(`EUR ${intl}`);
    }
  });

  it('groups thousands exactly as the digit pattern does, for every length of amount', () => {
    const byPattern = (minor: number, minorDigits: number) => {
      const digits = String(Math.abs(Math.round(minor))).padStart(minorDigits + 1, '0');
      const whole = digits.slice(0, digits.length - minorDigits).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
      const fraction = digits.slice(digits.length - minorDigits);
      return `${minor < 0 ? '−' : ''}EUR ${whole}${minorDigits ? `.${fraction}` : ''}`;
    };
    for (let magnitude = 1; magnitude < 1e25; magnitude *= 10) {
      for (const minor of [magnitude, magnitude * 1.234567, -magnitude * 9.87654321 - 1, magnitude - 1, magnitude * 1000.5 + 7]) {
        for (const minorDigits of [0, 1, 2, 3, 6, 7]) {
          expect(formatMoney({ amountMinor: minor, currency: 'EUR' }, minorDigits)).toBe(byPattern(minor, minorDigits));
        }
      }
    }
  });

  it('rounds a product half away from zero to whole minor units', () => {
    expect(multiplyMoney({ amountMinor: 5, currency: 'EUR' }, 0.5).amountMinor).toBe(3);
    expect(multiplyMoney({ amountMinor: -5, currency: 'EUR' }, 0.5).amountMinor).toBe(-3);
  });
});
