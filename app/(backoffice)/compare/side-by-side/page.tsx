import type { Metadata } from 'next';
import Link from 'next/link';
import { SubsystemGradesChart } from '@/components/charts/subsystem-grades-chart';
import { BandBadge } from '@/components/ui/band-badge';
import { Card } from '@/components/ui/card';
import { GradeChip } from '@/components/ui/grade-chip';
import { db } from '@/db/client';
import { loadComparisonViewer } from '@/db/queries/comparison';
import { loadComparableSalesByIds, loadComparisonEntries, loadReportResults, type ComparisonEntry } from '@/db/queries/side-by-side';
import { requirePagePermission } from '@/lib/auth/session';
import { comparablesUsed } from '@/lib/comparison/comparables-used';
import { dayCount, LATHE_KIND_LABELS } from '@/lib/comparison/comparison-row';
import { dealBreakersInWords } from '@/lib/comparison/deal-breaker-labels';
import { converterMinorFor, landedCostAssumptions } from '@/lib/comparison/landed-cost-basis';
import { daysOnMarket, reportCurrency } from '@/lib/decision/report-currency';
import type { SupplySpec } from '@/lib/decision/phase-converter';
import { differingChecks } from '@/lib/comparison/differing-checks';
import { formatDate, formatMm, formatMoney } from '@/lib/format';
import { SUBSYSTEM_TABLE, SUBSYSTEMS } from '@/lib/scoring/subsystems';
import { SUBSYSTEM_KEYS } from '@/lib/validation/comparison-query';
import { sideBySideSchema } from '@/lib/validation/side-by-side';

export const metadata: Metadata = { title: 'Side by side' };

const LETTERS = ['A', 'B', 'C', 'D'];

type Reading = { details: boolean; shop: SupplySpec | null; validityDays: number; now: Date };

/** Landed cost at the table's assumptions: the stored figure plus this reader's converter, where known. */
function landedCost(e: ComparisonEntry, shop: SupplySpec | null) {
  const converter = converterMinorFor(e, shop);
  const partial = e.askingPriceMinor === null || e.riggingMinor === null || e.missingToolingMinor === null || converter === null || e.repairEstimateMinor === null || e.valueCurrency !== e.priceCurrency;
  return `${partial ? 'at least ' : ''}${formatMoney(e.landedBaseMinor + (converter ?? 0), e.priceCurrency)}`;
}

function DealBreakers({ e, details }: { e: ComparisonEntry; details: boolean }) {
  if (e.dealBreakerCount === 0) return <span>✓ None recorded</span>;
  return (
    <span className="flex flex-col">
      <span className="font-semibold text-band-rebuild">
        <span aria-hidden="true">✕ </span>
        {e.dealBreakerCount} deal-breaker{e.dealBreakerCount === 1 ? '' : 's'}
      </span>
      {details ? (
        <span className="text-sm">{dealBreakersInWords(e.dealBreakers.split(',')).map((d) => d.label).join('; ')}</span>
      ) : (
        <span className="text-sm text-ink-faint">named in the report</span>
      )}
    </span>
  );
}

function ReportAge({ e, r }: { e: ComparisonEntry; r: Reading }) {
  const currency = reportCurrency(new Date(`${e.inspectedOn}T00:00:00Z`), r.now, r.validityDays);
  const until = formatDate(new Date(`${currency.validUntil}T00:00:00Z`));
  return (
    <span className="flex flex-col">
      {dayCount(currency.ageDays)}
      <span className={`text-sm ${currency.stale ? 'font-medium text-band-worn' : 'text-ink-soft'}`}>{currency.stale ? `▲ Stale since ${until}` : `current to ${until}`}</span>
    </span>
  );
}

/** Rows of the key-figures table: label and how to show it for one machine. */
const FIGURES: ReadonlyArray<[string, (e: ComparisonEntry, details: boolean, reading: Reading) => React.ReactNode]> = [
  ['Type', (e) => LATHE_KIND_LABELS[e.latheKind]],
  ['Swing over bed', (e) => formatMm(e.swingMm)],
  ['Between centres', (e) => formatMm(e.betweenCentresMm)],
  ['Year built', (e) => e.yearBuilt ?? '—'],
  ['Location', (e) => `${e.town}, ${e.region}`],
  ['Overall condition', (e) => <GradeChip grade={e.overallCondition} score={e.overallScore} provisional={e.overallProvisional} />],
  ['Overall score', (e) => `${e.overallScore} / 100`],
  ['Confidence', (e) => `${Math.round(Number(e.confidence) * 100)} %`],
  ['Asking price', (e) => formatMoney(e.askingPriceMinor, e.priceCurrency)],
  ['Fair market value', (e, d) => (d ? formatMoney(e.fairMarketValueMinor, e.valueCurrency) : <Locked />)],
  [
    'Asking price ÷ value',
    (e, d) => (d ? (e.askingPriceMinor !== null && e.fairMarketValueMinor && e.priceCurrency === e.valueCurrency ? `${(e.askingPriceMinor / e.fairMarketValueMinor).toFixed(2)}×` : '—') : <Locked />),
  ],
  ['Repair estimate', (e, d) => (d ? formatMoney(e.repairEstimateMinor, e.valueCurrency) : <Locked />)],
  ['Landed cost in your shop *', (e, d, r) => (d ? landedCost(e, r.shop) : <Locked />)],
  ['Inclusions value', (e, d) => (d ? (e.inclusionsValueMinor === null ? 'not listed' : formatMoney(e.inclusionsValueMinor, e.priceCurrency)) : <Locked />)],
  ['Deal-breakers', (e, d) => <DealBreakers e={e} details={d} />],
  ['Days listed', (e, _d, r) => dayCount(daysOnMarket(e.listedAt, r.now))],
  ['Report age', (e, _d, r) => <ReportAge e={e} r={r} />],
  ['Report released', (e) => formatDate(e.releasedAt)],
];

function Locked() {
  return <span className="text-sm text-ink-faint">comes with the report</span>;
}

function Problem({ title, text }: { title: string; text: string }) {
  return (
    <Card>
      <h1 className="text-2xl font-semibold">{title}</h1>
      <p className="mt-2 text-ink-soft">{text}</p>
      <Link href="/compare" className="mt-4 inline-flex min-h-touch items-center font-medium text-copper hover:underline">
        ← Back to the comparison table
      </Link>
    </Card>
  );
}

export default async function SideBySidePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePagePermission('compare.use');
  const parsed = sideBySideSchema.safeParse(await searchParams);
  if (!parsed.success) return <Problem title="Nothing to compare yet" text={parsed.error.issues[0]?.message ?? 'Choose two to four machines in the table.'} />;
  const entries = await loadComparisonEntries(db, parsed.data.reports);
  if (entries.length < 2) return <Problem title="These reports are no longer on offer" text="At least two of the chosen reports have been withdrawn or replaced by a correction. Choose again in the table." />;

  const viewer = await loadComparisonViewer(db, user);
  const { visibility } = viewer;
  const hasDetails = (e: ComparisonEntry) => visibility.all || visibility.inspectionIds.includes(e.inspectionId);
  const results = await loadReportResults(db, entries.filter(hasDetails).map((e) => e.reportId));
  const machines = entries.map((e, i) => ({ entry: e, letter: LETTERS[i]!, details: hasDetails(e), result: results.get(e.reportId) ?? null }));
  const differing = differingChecks(machines.map((m) => m.result));
  const uses = machines.map((m) => comparablesUsed(m.result?.valuation));
  const sales = await loadComparableSalesByIds(db, uses.flat().flatMap((u) => (u.comparableId === null ? [] : [u.comparableId])));
  const withDetails = machines.filter((m) => m.details).length;
  const missing = parsed.data.reports.length - entries.length;

  return (
    <>
      <Link href="/compare" className="inline-flex min-h-touch items-center text-sm font-medium text-copper hover:underline">
        ← Comparison table
      </Link>
      <h1 className="mt-1 text-3xl font-semibold">Side by side</h1>
      <p className="mt-2 max-w-3xl text-ink-soft">
        {machines.map((m) => `${m.letter}: ${m.entry.maker} ${m.entry.model} (${m.entry.town})`).join(' · ')}
      </p>
      {missing > 0 ? <p className="mt-2 text-sm text-band-worn">▲ {missing} of the chosen reports is no longer on offer and is left out.</p> : null}

      <div className="mt-6 grid gap-6">
        <Card title="Key figures">
          <div className="overflow-x-auto">
            <table className="w-full border-collapse text-left">
              <thead className="text-sm text-ink-soft">
                <tr className="border-b border-line">
                  <th scope="col" className="py-2 pr-3 font-semibold">
                    <span className="sr-only">Figure</span>
                  </th>
                  {machines.map((m) => (
                    <th key={m.letter} scope="col" className="min-w-40 px-3 py-2 align-bottom">
                      <span className="mr-1.5 inline-flex h-6 w-6 items-center justify-center rounded-full bg-ink text-sm font-semibold text-white">{m.letter}</span>
                      <Link href={`/reports/${m.entry.reportId}`} className="font-semibold text-ink hover:text-copper">
                        {m.entry.maker} {m.entry.model}
                      </Link>
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody className="figures">
                {FIGURES.map(([label, show]) => (
                  <tr key={label} className="border-b border-line last:border-b-0">
                    <th scope="row" className="py-2 pr-3 text-sm font-medium text-ink-soft">
                      {label}
                    </th>
                    {machines.map((m) => (
                      <td key={m.letter} className="px-3 py-2">
                        {show(m.entry, m.details, { details: m.details, shop: viewer.shop, validityDays: viewer.validityDays, now: viewer.now })}
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <p className="mt-3 text-sm text-ink-soft">* {landedCostAssumptions(viewer.shop)}</p>
        </Card>

        <Card title="Subsystem grades">
          <SubsystemGradesChart
            subsystems={SUBSYSTEMS.map((s) => SUBSYSTEM_TABLE[s].label)}
            series={machines.map((m) => ({
              letter: m.letter,
              name: `${m.entry.maker} ${m.entry.model}`,
              scores: SUBSYSTEMS.map((s) => m.entry[`${SUBSYSTEM_KEYS[s]}Score` as const] ?? null),
            }))}
          />
          <div className="mt-4 overflow-x-auto">
            <table className="w-full border-collapse text-left text-sm">
              <caption className="sr-only">Subsystem grades in words</caption>
              <tbody>
                {SUBSYSTEMS.map((s) => (
                  <tr key={s} className="border-b border-line last:border-b-0">
                    <th scope="row" className="py-1.5 pr-3 font-medium text-ink-soft">
                      {SUBSYSTEM_TABLE[s].label}
                    </th>
                    {machines.map((m) => (
                      <td key={m.letter} className="px-3 py-1.5">
                        <span className="mr-1 font-semibold">{m.letter}</span>
                        <GradeChip grade={m.entry[`${SUBSYSTEM_KEYS[s]}Grade` as const] ?? null} score={m.entry[`${SUBSYSTEM_KEYS[s]}Score` as const]} />
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </Card>

        <Card title="Checks that differ most">
          {withDetails < 2 ? (
            <p className="text-ink-soft">
              The measured checks come with the report. You hold {withDetails === 0 ? 'none' : 'one'} of these reports; with two or more, the
              checks on which they differ most show here.{' '}
              <Link href="/reports" className="font-medium text-copper hover:underline">
                See reports
              </Link>
            </p>
          ) : differing.length === 0 ? (
            <p className="text-ink-soft">The measured checks of these machines score the same.</p>
          ) : (
            <div className="overflow-x-auto">
              <table className="w-full border-collapse text-left">
                <thead className="text-sm text-ink-soft">
                  <tr className="border-b border-line">
                    <th scope="col" className="py-2 pr-3">
                      Check
                    </th>
                    {machines.map((m) => (
                      <th key={m.letter} scope="col" className="px-3 py-2">
                        {m.letter}
                      </th>
                    ))}
                    <th scope="col" className="px-3 py-2 text-right">
                      Spread
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {differing.map((c) => (
                    <tr key={c.id} className="border-b border-line last:border-b-0" data-check={c.id}>
                      <th scope="row" className="py-2 pr-3 font-medium">
                        {c.label}
                      </th>
                      {machines.map((m, i) => {
                        const reading = c.readings[i]!;
                        return (
                          <td key={m.letter} className="px-3 py-2">
                            {m.details ? (
                              <span className="flex flex-col items-start gap-1">
                                <BandBadge band={reading.band} size="sm" />
                                {reading.measuredText ? <span className="figures text-sm text-ink-soft">{reading.measuredText}</span> : null}
                              </span>
                            ) : (
                              <Locked />
                            )}
                          </td>
                        );
                      })}
                      <td className="figures px-3 py-2 text-right text-sm">{Math.round(c.spread)} points</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
        </Card>

        <Card title="Valuations and the comparable sales they used">
          <div className="grid gap-5 md:grid-cols-2">
            {machines.map((m, i) => (
              <section key={m.letter} aria-label={`Valuation of ${m.letter}`}>
                <h3 className="font-semibold">
                  {m.letter}: {m.entry.maker} {m.entry.model}
                </h3>
                {!m.details ? (
                  <p className="text-sm text-ink-soft">The valuation comes with the report.</p>
                ) : uses[i]!.length === 0 ? (
                  <p className="text-sm text-ink-soft">
                    Valued by the cost approach alone: too few comparable sales of this size were on record. Fair market value{' '}
                    {formatMoney(m.entry.fairMarketValueMinor, m.entry.valueCurrency)}.
                  </p>
                ) : (
                  <table className="figures mt-1 w-full text-sm">
                    <thead className="text-ink-soft">
                      <tr>
                        <th scope="col" className="py-1 text-left font-medium">
                          Sale
                        </th>
                        <th scope="col" className="py-1 text-right font-medium">
                          Price
                        </th>
                        <th scope="col" className="py-1 text-right font-medium">
                          Adjusted
                        </th>
                      </tr>
                    </thead>
                    <tbody>
                      {uses[i]!.map((u, k) => {
                        const sale = u.comparableId === null ? undefined : sales.get(u.comparableId);
                        return (
                          <tr key={k} className="border-t border-line">
                            <td className="py-1 pr-2">
                              {u.description}
                              {sale ? <span className="block text-xs text-ink-soft">sold {sale.soldOn}{sale.region ? `, ${sale.region}` : ''}</span> : null}
                            </td>
                            <td className="py-1 text-right">{formatMoney(u.priceMinor, u.currency)}</td>
                            <td className="py-1 text-right">
                              {formatMoney(u.adjustedMinor, u.currency)} <span className="text-xs text-ink-soft">×{u.adjustment.toFixed(2)}</span>
                            </td>
                          </tr>
                        );
                      })}
                    </tbody>
                  </table>
                )}
              </section>
            ))}
          </div>
        </Card>
      </div>
    </>
  );
}
