import type { Metadata } from 'next';
import Link from 'next/link';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { GradeChip } from '@/components/ui/grade-chip';
import { db } from '@/db/client';
import { COMPARABLE_SALES_PAGE, listComparableSales } from '@/db/queries/comparable-sales';
import { requirePagePermission } from '@/lib/auth/session';
import { formatMm, formatMoney } from '@/lib/format';
import { TEMPLATE_HEADERS } from '@/lib/market/parse-comparable-sales-csv';
import { SALE_KIND_LABELS } from '@/lib/validation/comparable-sale';
import { ComparableSaleForm } from './comparable-sale-form';
import { CsvImportForm } from './csv-import-form';

export const metadata: Metadata = { title: 'Market data' };

export default async function MarketDataPage({ searchParams }: { searchParams: Promise<{ page?: string }> }) {
  await requirePagePermission('market.manage');
  const requested = Number((await searchParams).page ?? 1);
  const page = Number.isInteger(requested) && requested >= 1 && requested <= 10_000 ? requested : 1;
  const { rows, total } = await listComparableSales(db, page);
  const pages = Math.max(1, Math.ceil(total / COMPARABLE_SALES_PAGE));

  return (
    <>
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">Coordinators</p>
      <h1 className="mt-1 text-3xl font-semibold">Market data</h1>
      <p className="mt-2 max-w-3xl text-ink-soft">
        Known sales of comparable lathes. When a report is scored, sales within 15 % of its swing over bed feed the sales-comparison
        valuation, and the report shows which ones it used. Reports already released keep the sales they were valued with.
      </p>

      <div className="mt-6 grid gap-6 lg:grid-cols-2">
        <Card title="Record a sale">
          <ComparableSaleForm />
        </Card>
        <Card title="Import from a spreadsheet">
          <CsvImportForm templateHeaders={TEMPLATE_HEADERS} />
        </Card>
      </div>

      <section className="mt-8" aria-labelledby="sales-heading">
        <h2 id="sales-heading" className="text-xl font-semibold">
          Sales on record <span className="figures text-base font-normal text-ink-soft">({total.toLocaleString('en-GB')})</span>
        </h2>
        {rows.length === 0 ? (
          <div className="mt-3">
            <EmptyState title="No comparable sales yet" text="Record one above or import a spreadsheet; valuations use the cost approach until there are some." />
          </div>
        ) : (
          <div className="mt-3 overflow-x-auto rounded-card border border-line bg-paper-raised">
            <table className="w-full border-collapse text-left">
              <thead className="border-b border-line bg-paper-sunken text-sm text-ink-soft">
                <tr>
                  {['#', 'Machine sold', 'Swing', 'Centres', 'Year', 'Condition', 'Kind', 'Price', 'Sold on', 'Region'].map((h) => (
                    <th key={h} scope="col" className="px-3 py-2 font-semibold">
                      {h}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {rows.map((s) => (
                  <tr key={s.id} className="border-b border-line last:border-b-0">
                    <td className="figures px-3 py-2 text-sm text-ink-soft">{s.id}</td>
                    <td className="px-3 py-2">
                      {s.description}
                      {s.source ? <span className="block text-xs text-ink-soft">{s.source}</span> : null}
                    </td>
                    <td className="figures whitespace-nowrap px-3 py-2 text-right">{formatMm(s.swingMm)}</td>
                    <td className="figures whitespace-nowrap px-3 py-2 text-right">{formatMm(s.betweenCentresMm)}</td>
                    <td className="figures px-3 py-2">{s.yearBuilt ?? '—'}</td>
                    <td className="px-3 py-2">{s.condition ? <GradeChip grade={s.condition} /> : <span className="text-sm text-ink-faint">not known</span>}</td>
                    <td className="whitespace-nowrap px-3 py-2 text-sm">{SALE_KIND_LABELS[s.saleKind]}</td>
                    <td className="figures whitespace-nowrap px-3 py-2 text-right">{formatMoney(s.priceMinor, s.currency)}</td>
                    <td className="figures whitespace-nowrap px-3 py-2">{s.soldOn}</td>
                    <td className="px-3 py-2 text-sm">{s.region ?? '—'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
        {pages > 1 ? (
          <nav aria-label="Pages" className="mt-3 flex items-center gap-3">
            {page > 1 ? (
              <Link href={`/admin/market?page=${page - 1}`} className="inline-flex min-h-touch items-center rounded-lg border border-line-strong bg-paper-raised px-4 font-medium">
                ← Newer
              </Link>
            ) : null}
            <span className="figures text-sm text-ink-soft">
              Page {page} of {pages}
            </span>
            {page < pages ? (
              <Link href={`/admin/market?page=${page + 1}`} className="inline-flex min-h-touch items-center rounded-lg border border-line-strong bg-paper-raised px-4 font-medium">
                Older →
              </Link>
            ) : null}
          </nav>
        ) : null}
      </section>
    </>
  );
}
