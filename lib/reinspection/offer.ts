import type { ReportCurrency } from '@/lib/decision/report-currency';

/**
 * A re-inspection may be requested once the report is stale, or within this many days of its
 * valid-until date, so a buyer planning a purchase need not wait for the report to lapse first.
 * Two weeks is common practice for booking a visit; no published source.
 */
export const NEARLY_STALE_DAYS = 14;

const DAY_MS = 86_400_000;

export type ReinspectionOffer = { open: boolean; stale: boolean; daysLeft: number };

/** Whether the report is old enough for a re-inspection request, and how many whole UTC days of validity are left. */
export function reinspectionOffer(currency: ReportCurrency, now: Date): ReinspectionOffer {
  const lastValidDay = Math.floor(Date.parse(`${currency.validUntil}T00:00:00Z`) / DAY_MS);
  const today = Math.floor(now.getTime() / DAY_MS);
  const daysLeft = Math.max(0, lastValidDay - today);
  return { open: currency.stale || daysLeft <= NEARLY_STALE_DAYS, stale: currency.stale, daysLeft };
}
