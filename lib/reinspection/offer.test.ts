import { describe, expect, it } from 'vitest';
import { reportCurrency } from '@/lib/decision/report-currency';
import { NEARLY_STALE_DAYS, reinspectionOffer } from './offer';

// Dates by calendar arithmetic: 90 days after 1 March 2026 is 30 May 2026 (valid until), stale from 31 May.
const INSPECTED = new Date('2026-03-01T09:00:00Z');

describe('reinspectionOffer', () => {
  it.each([
    ['the day after the inspection', '2026-03-02T12:00:00Z', false, false, 89],
    ['15 days before valid-until', '2026-05-15T12:00:00Z', false, false, 15],
    [`${NEARLY_STALE_DAYS} days before valid-until (nearly stale)`, '2026-05-16T00:00:00Z', true, false, 14],
    ['on the valid-until day', '2026-05-30T23:59:00Z', true, false, 0],
    ['the first stale day', '2026-05-31T00:00:00Z', true, true, 0],
    ['a year later', '2027-03-01T00:00:00Z', true, true, 0],
  ])('opens requests %s: %s → open %s, stale %s, %i days left', (_label, now, open, stale, daysLeft) => {
    const at = new Date(now);
    expect(reinspectionOffer(reportCurrency(INSPECTED, at, 90), at)).toEqual({ open, stale, daysLeft });
  });

  it('follows the validity the coordinator set', () => {
    const at = new Date('2026-03-20T00:00:00Z');
    expect(reinspectionOffer(reportCurrency(INSPECTED, at, 30), at)).toEqual({ open: true, stale: false, daysLeft: 11 });
    expect(reinspectionOffer(reportCurrency(INSPECTED, at, 365), at).open).toBe(false);
  });
});
