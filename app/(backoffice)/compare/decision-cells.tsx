'use client';

import { dayCount, type ComparisonRow } from '@/lib/comparison/comparison-row';
import { formatDate, formatMoney } from '@/lib/format';

const day = (iso: string) => formatDate(new Date(`${iso}T00:00:00Z`));

/** Deal-breakers in words with a shape (a crossed square, or a tick for none), never colour alone. */
export function DealBreakersCell({ row }: { row: ComparisonRow }) {
  if (row.dealBreakerCount === 0) {
    return (
      <span className="inline-flex items-center gap-1.5 whitespace-nowrap text-sm text-ink-soft" data-deal-breakers="0">
        <svg aria-hidden="true" viewBox="0 0 16 16" className="h-3.5 w-3.5">
          <path d="M3 8.5l3 3 7-7" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
        None recorded
      </span>
    );
  }
  const count = `${row.dealBreakerCount} deal-breaker${row.dealBreakerCount === 1 ? '' : 's'}`;
  return (
    <span className="flex min-w-44 flex-col gap-0.5 text-sm" data-deal-breakers={row.dealBreakerCount}>
      <span className="inline-flex items-center gap-1.5 font-semibold text-band-rebuild">
        <svg aria-hidden="true" viewBox="0 0 20 20" className="h-4 w-4 shrink-0">
          <rect x="1" y="1" width="18" height="18" rx="2" fill="currentColor" />
          <path d="M6 6l8 8M14 6l-8 8" stroke="white" strokeWidth="2.5" strokeLinecap="round" />
        </svg>
        {count}
      </span>
      {row.dealBreakers.length ? (
        <ul className="text-ink">
          {row.dealBreakers.map((d) => (
            <li key={d.id}>{d.label}</li>
          ))}
        </ul>
      ) : (
        <span className="text-ink-soft">named in the report</span>
      )}
    </span>
  );
}

/** Days since the inspection, with the report's last current day, or a stale mark after it. */
export function ReportAgeCell({ row }: { row: ComparisonRow }) {
  return (
    <span className="flex flex-col whitespace-nowrap" data-report-age={row.reportAgeDays} data-stale={row.stale ? 'true' : 'false'}>
      <span>{dayCount(row.reportAgeDays)}</span>
      {row.stale ? (
        <span className="inline-flex items-center gap-1 text-xs font-medium text-band-worn" title={`Current until ${day(row.validUntil)}; the machine may have changed since`}>
          <svg aria-hidden="true" viewBox="0 0 16 16" className="h-3 w-3">
            <path d="M8 1.5l7 13H1z" fill="currentColor" />
            <path d="M8 6v4M8 12v.5" stroke="white" strokeWidth="1.6" strokeLinecap="round" />
          </svg>
          Stale since {day(row.validUntil)}
        </span>
      ) : (
        <span className="text-xs text-ink-soft">current to {day(row.validUntil)}</span>
      )}
    </span>
  );
}

/** Landed cost; "at least" with the parts left out when some are not known. */
export function LandedCostCell({ row }: { row: ComparisonRow }) {
  const partial = row.landedCostNotKnown.length > 0;
  return (
    <span className="flex flex-col items-end" title={partial ? `Not known, so left out: ${row.landedCostNotKnown.join(', ')}` : undefined}>
      {partial ? <span className="text-xs text-ink-soft">at least</span> : null}
      <span>{formatMoney(row.landedCostMinor, row.priceCurrency)}</span>
    </span>
  );
}
