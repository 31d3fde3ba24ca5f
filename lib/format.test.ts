import { describe, expect, it } from 'vitest';
import { formatDate, formatDateTime, formatMm, formatMoney } from './format';

// The reference is the runtime's own Intl (CLDR en-GB patterns), built afresh for each call.
describe('display formats', () => {
  it('keeps each currency its own, whatever order they are asked for in', () => {
    for (const [minor, currency] of [[1_065_000, 'EUR'], [99_950, 'GBP'], [1_065_000, 'USD'], [12_345, 'EUR'], [500, 'CHF']] as const) {
      const fresh = new Intl.NumberFormat('en-GB', { style: 'currency', currency, maximumFractionDigits: 0 }).format(minor / 100);
      expect(formatMoney(minor, currency)).toBe(fresh);
    }
    expect(formatMoney(1_065_000)).toBe('€10,650');
    expect(formatMoney(99_950, 'GBP')).toBe('£1,000');
    expect(formatMoney(null)).toBe('—');
  });

  it('writes dates in UTC, day month year', () => {
    const at = new Date('2026-12-02T23:30:00Z');
    expect(formatDate(at)).toBe('2 Dec 2026');
    expect(formatDateTime(at)).toBe(new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', timeZone: 'UTC' }).format(at));
    expect(formatDateTime(at)).toContain('23:30');
    expect(formatDate(undefined)).toBe('—');
  });

  it('groups millimetres by thousands', () => {
    expect(formatMm(1500)).toBe('1,500 mm');
    expect(formatMm(330)).toBe('330 mm');
    expect(formatMm(null)).toBe('—');
  });
});
