import { DecisionInputError } from './decision-input-error';

/** A report speaks for the machine as inspected; after this many days it is shown as stale by default. */
export const DEFAULT_VALIDITY_DAYS = 90;

const DAY_MS = 86_400_000;

function utcDay(d: Date): number {
  return Math.floor(d.getTime() / DAY_MS);
}

function isoDay(day: number): string {
  return new Date(day * DAY_MS).toISOString().slice(0, 10);
}

export interface ReportCurrency {
  inspectedOn: string;
  validUntil: string;
  /** Whole days since the inspection, counted in UTC calendar days. */
  ageDays: number;
  stale: boolean;
}

/** Valid until the inspection day plus the validity (90 days after 1 March 2026 is 30 May 2026), stale from the day after. */
export function reportCurrency(inspectedOn: Date, now: Date, validityDays: number = DEFAULT_VALIDITY_DAYS): ReportCurrency {
  if (!Number.isInteger(validityDays) || validityDays < 1 || validityDays > 3650) {
    throw new DecisionInputError('validityDays', 'Validity must be a whole number of days from 1 to 3650');
  }
  if (Number.isNaN(inspectedOn.getTime())) throw new DecisionInputError('inspectedOn', 'The inspection date is not a date');
  const start = utcDay(inspectedOn);
  const lastValid = start + validityDays;
  const today = utcDay(now);
  return { inspectedOn: isoDay(start), validUntil: isoDay(lastValid), ageDays: Math.max(0, today - start), stale: today > lastValid };
}

/** Whole UTC days between listing and now (or the sale), never negative. */
export function daysOnMarket(listedAt: Date, endedAt: Date): number {
  return Math.max(0, utcDay(endedAt) - utcDay(listedAt));
}
