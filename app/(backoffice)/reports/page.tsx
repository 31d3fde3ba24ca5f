import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { Pager } from '@/components/data-table/pager';
import { ConditionBadge } from '@/components/ui/condition-badge';
import { EmptyState } from '@/components/ui/empty-state';
import { CATALOGUE_PAGE_SIZE, listCatalogueReports } from '@/db/queries/reports-catalogue';
import { requirePageSession } from '@/lib/auth/session';
import { formatDate, formatMm, formatMoney } from '@/lib/format';
import { can } from '@/lib/roles';
import { machineSearchSchema } from '@/lib/validation/list-filters';
import { machineCountText, machineSearchHref, pageCountText } from '@/lib/machine-search';
import { MachineSearchForm } from '@/components/forms/machine-search-form';

export const metadata: Metadata = { title: 'Inspected machines' };

export default async function ReportsCataloguePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageSession();
  if (!can(user.role, 'report.browse')) notFound();
  const filters = machineSearchSchema.parse(await searchParams);
  const { rows: reports, total } = await listCatalogueReports(user.id, filters);
  const first = (filters.page - 1) * CATALOGUE_PAGE_SIZE + 1;
  return (
    <>
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">Reports</p>
      <h1 className="mt-1 text-3xl font-semibold">Inspected machines</h1>
      <p className="mt-2 max-w-2xl text-ink-soft">
        Every machine here has a released Waygrade report. The overall condition is open to all; the measured checks, photos, repair
        estimate and valuation come with the report.
      </p>
      <MachineSearchForm action="/reports" q={filters.q} />
      {reports.length === 0 ? (
        <div className="mt-8">
          {filters.q ? (
            <EmptyState title={`No machine matches “${filters.q}”`} text="Try part of the maker’s name or of the model." />
          ) : total > 0 ? (
            <>
              <EmptyState title="This page is past the last machine" text={`There are ${total.toLocaleString('en-GB')} machines in all.`} />
              <Link href={machineSearchHref('/reports', filters.q, 1)} className="mt-4 inline-flex min-h-touch items-center font-medium text-copper hover:underline">
                ← First page
              </Link>
            </>
          ) : (
            <EmptyState title="No released reports yet" text="Machines appear here as soon as their report is released." />
          )}
        </div>
      ) : (
        <>
          <p className="figures mt-6 text-sm text-ink-soft">
            {machineCountText(first, reports.length, total, CATALOGUE_PAGE_SIZE)}
            {total > CATALOGUE_PAGE_SIZE ? ', newest report first' : ''}
          </p>
          <ul className="mt-3 grid gap-4 md:grid-cols-2">
            {reports.map((r) => (
              <li key={r.id} className="rounded-card border border-line bg-paper-raised p-5 shadow-sm">
                <div className="flex flex-wrap items-start justify-between gap-3">
                  <div>
                    <h2 className="text-lg font-semibold">
                      <Link href={`/reports/${r.id}`} className="hover:text-copper">
                        {r.maker} {r.model}
                      </Link>
                    </h2>
                    <p className="figures text-sm text-ink-soft">
                      Swing {formatMm(r.swingMm)} · {formatMm(r.betweenCentresMm)} between centres{r.yearBuilt ? ` · built ${r.yearBuilt}` : ''}
                    </p>
                    <p className="text-sm text-ink-soft">
                      {r.town}, {r.region} · released {formatDate(r.releasedAt)}
                    </p>
                  </div>
                  <ConditionBadge grade={r.overallCondition} provisional={r.overallProvisional} />
                </div>
                <div className="mt-4 flex flex-wrap items-center justify-between gap-3">
                  <p className="figures text-sm">
                    {r.hasAccess ? (
                      <span className="font-medium text-band-true">✓ In your reports</span>
                    ) : r.feeMinor === null ? (
                      <span className="text-ink-soft">Fee not set yet</span>
                    ) : (
                      <>
                        Report <span className="font-semibold">{formatMoney(r.feeMinor, r.feeCurrency ?? 'EUR')}</span>
                      </>
                    )}
                  </p>
                  <Link
                    href={`/reports/${r.id}`}
                    className="inline-flex min-h-touch items-center rounded-lg border border-line-strong px-4 font-medium hover:bg-paper-sunken"
                  >
                    {r.hasAccess ? 'Open' : 'See summary'}
                  </Link>
                </div>
              </li>
            ))}
          </ul>
          <Pager
            page={filters.page}
            hasMore={filters.page * CATALOGUE_PAGE_SIZE < total}
            href={(page) => machineSearchHref('/reports', filters.q, page)}
            summary={pageCountText(filters.page, total, CATALOGUE_PAGE_SIZE)}
          />
        </>
      )}
    </>
  );
}
