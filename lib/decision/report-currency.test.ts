import { describe, expect, it } from 'vitest';
import { DecisionInputError } from './decision-input-error';
import { daysOnMarket, reportCurrency } from './report-currency';

// Calendar arithmetic checked by hand (1 March + 90 days = 30 May); 90 days is the product's default (common practice).
describe('reportCurrency', () => {
  const inspected = new Date('2026-03-01T14:30:00Z');

  it('is valid until the inspection day plus 90 days', () => {
    expect(reportCurrency(inspected, new Date('2026-03-02T00:00:00Z'))).toEqual({ inspectedOn: '2026-03-01', validUntil: '2026-05-30', ageDays: 1, stale: false });
  });

  it('stays current on the last valid day and turns stale the day after', () => {
    expect(reportCurrency(inspected, new Date('2026-05-30T23:59:59Z')).stale).toBe(false);
    expect(reportCurrency(inspected, new Date('2026-05-31T00:00:00Z')).stale).toBe(true);
    expect(reportCurrency(inspected, new Date('2026-05-31T00:00:00Z')).ageDays).toBe(91);
  });

  it('uses the validity the coordinator set', () => {
    expect(reportCurrency(inspected, inspected, 30).validUntil).toBe('2026-03-31');
  });

  it.each([0, -5, 2.5, 4000])('refuses a validity of %s days', (days) => {
    expect(() => reportCurrency(inspected, inspected, days)).toThrow(DecisionInputError);
  });
});

describe('daysOnMarket', () => {
  it('counts whole UTC days and never goes below zero', () => {
    expect(daysOnMarket(new Date('2026-01-31T23:00:00Z'), new Date('2026-03-01T01:00:00Z'))).toBe(29);
    expect(daysOnMarket(new Date('2026-03-02T00:00:00Z'), new Date('2026-03-01T00:00:00Z'))).toBe(0);
  });
});
