'use client';

import Link from 'next/link';
import { GradeChip } from '@/components/ui/grade-chip';
import { dayCount, type ComparisonRow } from '@/lib/comparison/comparison-row';
import { formatMm, formatMoney } from '@/lib/format';
import { SUBSYSTEM_TABLE, SUBSYSTEMS } from '@/lib/scoring/subsystems';
import { SUBSYSTEM_KEYS } from '@/lib/validation/comparison-query';
import { DealBreakersCell, LandedCostCell, ReportAgeCell } from './decision-cells';
import { PriceValueGauge } from './price-value-gauge';

/** The same rows as cards on a phone, where twenty columns cannot be read side by side. */
export function ComparisonCards({
  rows,
  loading,
  selected,
  onToggle,
}: {
  rows: ComparisonRow[];
  loading: boolean;
  selected: ReadonlyMap<number, ComparisonRow>;
  onToggle: (row: ComparisonRow) => void;
}) {
  if (loading) {
    return (
      <ul className="space-y-3" aria-busy="true">
        {[0, 1, 2, 3].map((i) => (
          <li key={i} className="h-36 animate-pulse rounded-card bg-paper-sunken" />
        ))}
      </ul>
    );
  }
  return (
    <ul className="space-y-3">
      {rows.map((r) => {
        const checked = selected.has(r.reportId);
        return (
          <li key={r.reportId} data-report-card={r.reportId} className={`rounded-card border p-4 ${checked ? 'border-copper bg-copper-light' : 'border-line bg-paper-raised'}`}>
            <div className="flex items-start gap-3">
              <input type="checkbox" checked={checked} onChange={() => onToggle(r)} aria-label={`Select ${r.maker} ${r.model}, ${r.town}`} className="mt-1 h-6 w-6 shrink-0 accent-copper" />
              <div className="min-w-0 flex-1">
                <Link href={`/reports/${r.reportId}`} className="font-semibold hover:text-copper">
                  {r.maker} {r.model}
                </Link>
                <p className="figures text-sm text-ink-soft">
                  {formatMm(r.swingMm)} swing · {formatMm(r.betweenCentresMm)} centres{r.yearBuilt ? ` · ${r.yearBuilt}` : ''}
                </p>
                <p className="text-sm text-ink-soft">
                  {r.town}, {r.region}
                </p>
              </div>
            </div>
            <div className="mt-3 flex flex-wrap items-center justify-between gap-2">
              <GradeChip grade={r.overallCondition} score={r.overallScore} provisional={r.overallProvisional} />
              <span className="figures text-sm text-ink-soft">{Math.round(r.confidence * 100)} % measured</span>
            </div>
            <div className="mt-2">
              <DealBreakersCell row={r} />
            </div>
            <dl className="figures mt-2 grid grid-cols-2 gap-x-3 gap-y-1 text-sm">
              <dt className="text-ink-soft">Asking</dt>
              <dd className="text-right font-medium">{formatMoney(r.askingPriceMinor, r.priceCurrency)}</dd>
              <dt className="text-ink-soft">Value</dt>
              <dd className="text-right">{r.hasDetails ? formatMoney(r.fairMarketValueMinor, r.valueCurrency) : <span className="text-ink-faint">with report</span>}</dd>
              {r.hasDetails ? (
                <>
                  <dt className="text-ink-soft">Price ÷ value</dt>
                  <dd className="text-right">
                    <PriceValueGauge ratio={r.priceToValue} />
                  </dd>
                  <dt className="text-ink-soft">Landed cost</dt>
                  <dd className="text-right">
                    <LandedCostCell row={r} />
                  </dd>
                </>
              ) : null}
              <dt className="text-ink-soft">Listed</dt>
              <dd className="text-right">{dayCount(r.daysListed)}</dd>
              <dt className="text-ink-soft">Report age</dt>
              <dd className="flex justify-end text-right">
                <ReportAgeCell row={r} />
              </dd>
            </dl>
            <details className="mt-2">
              <summary className="min-h-touch cursor-pointer content-center text-sm font-medium text-ink-soft">Subsystem grades</summary>
              <ul className="mt-1 space-y-1">
                {SUBSYSTEMS.map((s) => (
                  <li key={s} className="flex items-center justify-between gap-2 text-sm">
                    <span className="text-ink-soft">{SUBSYSTEM_TABLE[s].label}</span>
                    <GradeChip grade={r.subsystems[SUBSYSTEM_KEYS[s]].grade} score={r.subsystems[SUBSYSTEM_KEYS[s]].score} />
                  </li>
                ))}
              </ul>
            </details>
          </li>
        );
      })}
    </ul>
  );
}
