import type { ReportCurrency } from '@/lib/decision/report-currency';

/** Inspected-on and valid-until dates; a stale report says so in words, not only by colour. */
export function CurrencyBanner({ currency }: { currency: ReportCurrency }) {
  const dates = (
    <span className="figures">
      Inspected {currency.inspectedOn} · valid until {currency.validUntil} · {currency.ageDays} {currency.ageDays === 1 ? 'day' : 'days'} old
    </span>
  );
  if (!currency.stale) return <p className="mt-4 text-ink-soft">{dates}</p>;
  return (
    <p role="status" data-stale="true" className="mt-6 flex items-start gap-2 rounded-lg border border-band-worn/40 bg-band-worn/10 px-4 py-3 text-band-worn">
      <svg aria-hidden="true" width="18" height="18" viewBox="0 0 16 16" className="mt-1 shrink-0">
        <path d="M8 1.8l6.6 12H1.4z" fill="currentColor" />
      </svg>
      <span>
        <strong>Stale report.</strong> The machine was inspected more than the report’s validity ago; its condition may have changed since. {dates}
      </span>
    </p>
  );
}
