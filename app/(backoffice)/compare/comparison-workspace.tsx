'use client';

import Link from 'next/link';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import type { ComparisonRow } from '@/lib/comparison/comparison-row';
import { DEFAULT_SORT, PAGE_SIZES } from '@/lib/validation/comparison-query';
import { ColumnMenu } from './column-menu';
import { ComparisonCards } from './comparison-cards';
import { ComparisonTable } from './comparison-table';
import { ComparisonFetchError, fetchComparisonPage } from './fetch-comparison';
import { FilterPanel } from './filter-panel';
import { SelectionBar } from './selection-bar';
import { ShortlistPicker, type ShortlistSummary } from './shortlist-picker';
import { useColumnVisibility } from './use-column-visibility';
import { useComparisonUrl } from './use-comparison-url';

// On a phone the cards have no headers to click: the usual orders as one choice.
const PHONE_SORTS: ReadonlyArray<[string, string]> = [
  ['condition:desc', 'Best condition first'],
  ['ratio:asc', 'Lowest price ÷ value first'],
  ['landed:asc', 'Lowest landed cost first'],
  ['dealBreakers:asc', 'Fewest deal-breakers first'],
  ['reportAge:asc', 'Most recent inspection first'],
  ['daysListed:asc', 'Newest listing first'],
  ['price:asc', 'Lowest asking price first'],
  ['price:desc', 'Highest asking price first'],
  ['swing:asc', 'Smallest swing first'],
  ['swing:desc', 'Largest swing first'],
  ['year:desc', 'Newest machine first'],
  ['released:desc', 'Newest report first'],
];
// Numbers first: ids whose first click sorts high to low (best grade, newest report, highest value).
const DESCENDING_FIRST = new Set(['condition', 'confidence', 'released', 'year', 'value', 'inclusions']);

export function ComparisonWorkspace({ regions, shortlists }: { regions: string[]; shortlists: ShortlistSummary[] }) {
  const { params, queryString, update, clear } = useComparisonUrl();
  const [visibility, setVisibility] = useColumnVisibility();
  const [selected, setSelected] = useState<Map<number, ComparisonRow>>(new Map());
  const query = useQuery({
    queryKey: ['compare', queryString],
    queryFn: ({ signal }) => fetchComparisonPage(queryString, signal),
    placeholderData: keepPreviousData,
  });

  const sort = params.sort ?? DEFAULT_SORT.sort;
  const dir = (params.dir ?? DEFAULT_SORT.dir) === 'asc' ? 'asc' : 'desc';
  const page = query.data?.page ?? Number(params.page ?? 1);
  const pageSize = query.data?.pageSize ?? Number(params.pageSize ?? 50);
  const total = query.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const error = query.error instanceof ComparisonFetchError ? query.error : query.error ? new ComparisonFetchError('Something went wrong loading the table.', 500) : null;
  const fieldErrors = error?.fieldErrors ?? {};

  const onSort = (column: string) => {
    const nextDir = sort === column ? (dir === 'asc' ? 'desc' : 'asc') : DESCENDING_FIRST.has(column) ? 'desc' : 'asc';
    update({ sort: column, dir: nextDir });
  };
  const toggle = (row: ComparisonRow) =>
    setSelected((current) => {
      const next = new Map(current);
      if (next.has(row.reportId)) next.delete(row.reportId);
      else next.set(row.reportId, row);
      return next;
    });

  return (
    <div className="grid gap-6 lg:grid-cols-[17rem_minmax(0,1fr)]">
      <aside aria-label="Filters">
        <details className="group lg:hidden" open={false}>
          <summary className="flex min-h-touch cursor-pointer items-center justify-between rounded-lg border border-line-strong bg-paper-raised px-4 font-semibold">
            Filters <span className="text-sm font-normal text-ink-soft">tap to {`show`}</span>
          </summary>
          <div className="mt-4">
            <FilterPanel params={params} regions={regions} fieldErrors={fieldErrors} onChange={update} onClear={clear} />
          </div>
        </details>
        <div className="hidden lg:block">
          <FilterPanel params={params} regions={regions} fieldErrors={fieldErrors} onChange={update} onClear={clear} />
        </div>
      </aside>

      <section aria-label="Machines" className="min-w-0 space-y-3">
        <div className="flex flex-wrap items-center gap-2">
          <p className="figures mr-auto text-ink-soft" role="status" aria-live="polite">
            {query.isPending ? 'Loading machines…' : error ? 'Not loaded' : <><span className="font-semibold text-ink">{total.toLocaleString('en-GB')}</span> machines match</>}
          </p>
          <ShortlistPicker shortlists={shortlists} value={params.shortlist} onChange={(id) => update({ shortlist: id })} />
          <ColumnMenu visibility={visibility} onChange={setVisibility} />
          <a
            href={`/api/compare/export?${queryString}`}
            download
            className={`inline-flex min-h-touch items-center gap-2 rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken ${error || total === 0 ? 'pointer-events-none opacity-50' : ''}`}
            aria-disabled={Boolean(error) || total === 0}
          >
            <svg aria-hidden="true" viewBox="0 0 16 16" className="h-4 w-4">
              <path d="M8 2v8m0 0l-3-3m3 3l3-3M3 12.5h10" fill="none" stroke="currentColor" strokeWidth="1.7" strokeLinecap="round" strokeLinejoin="round" />
            </svg>
            Export CSV
          </a>
        </div>

        <SelectionBar selected={[...selected.values()]} shortlists={shortlists} onRemove={toggle} onClear={() => setSelected(new Map())} />

        {error ? (
          <div role="alert" className="rounded-card border border-band-rebuild/40 bg-paper-raised p-5">
            <p className="font-semibold text-band-rebuild">
              {error.status >= 400 && error.status < 500 ? 'This view’s filters could not be used' : 'The table could not be loaded'}
            </p>
            <p className="mt-1">{error.message}</p>
            {Object.entries(fieldErrors).length ? (
              <ul className="mt-2 list-disc pl-5 text-sm">
                {Object.entries(fieldErrors).map(([field, messages]) => (
                  <li key={field}>
                    <span className="font-medium">{field}</span>: {messages.join('; ')}
                  </li>
                ))}
              </ul>
            ) : null}
            <div className="mt-3 flex gap-2">
              {error.status >= 400 && error.status < 500 ? (
                <button type="button" onClick={clear} className="min-h-touch rounded-lg border border-line-strong px-4 font-medium hover:bg-paper-sunken">
                  Start again with no filters
                </button>
              ) : (
                <button type="button" onClick={() => void query.refetch()} className="min-h-touch rounded-lg border border-line-strong px-4 font-medium hover:bg-paper-sunken">
                  Try again
                </button>
              )}
            </div>
          </div>
        ) : !query.isPending && total === 0 ? (
          <EmptyState title="No machines match these filters" text="Widen a range or untick a grade; “Clear all filters” shows every inspected machine." />
        ) : (
          <>
            <div className="hidden md:block">
              <ComparisonTable
                rows={query.data?.rows ?? []}
                loading={query.isPending}
                refreshing={query.isPlaceholderData && query.isFetching}
                sort={sort}
                dir={dir}
                onSort={onSort}
                columnVisibility={visibility}
                selected={selected}
                onToggle={toggle}
                landedCostBasis={query.data?.landedCostBasis ?? ''}
              />
            </div>
            <div className="md:hidden">
              <label className="mb-3 flex items-center gap-2 text-sm">
                <span className="text-ink-soft">Sort by</span>
                <select
                  value={`${sort}:${dir}`}
                  onChange={(event) => {
                    const [column, direction] = event.target.value.split(':');
                    update({ sort: column!, dir: direction! });
                  }}
                  className="min-h-touch flex-1 rounded-lg border border-line-strong bg-paper-raised px-2"
                >
                  {PHONE_SORTS.map(([value, label]) => (
                    <option key={value} value={value}>
                      {label}
                    </option>
                  ))}
                </select>
              </label>
              <ComparisonCards rows={query.data?.rows ?? []} loading={query.isPending} selected={selected} onToggle={toggle} />
            </div>
          </>
        )}

        {!error && total > 0 ? (
          <nav aria-label="Pages" className="flex flex-wrap items-center gap-3">
            <button
              type="button"
              disabled={page <= 1}
              onClick={() => update({ page: String(page - 1) })}
              className="min-h-touch rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken disabled:opacity-40"
            >
              ← Previous
            </button>
            <span className="figures text-sm text-ink-soft">
              Page {page.toLocaleString('en-GB')} of {pages.toLocaleString('en-GB')}
            </span>
            <button
              type="button"
              disabled={page >= pages}
              onClick={() => update({ page: String(page + 1) })}
              className="min-h-touch rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken disabled:opacity-40"
            >
              Next →
            </button>
            <label className="ml-auto flex items-center gap-2 text-sm text-ink-soft">
              Rows per page
              <select
                value={String(pageSize)}
                onChange={(event) => update({ pageSize: event.target.value === '50' ? null : event.target.value })}
                className="min-h-touch rounded-lg border border-line-strong bg-paper-raised px-2 text-ink"
              >
                {PAGE_SIZES.map((size) => (
                  <option key={size} value={size}>
                    {size}
                  </option>
                ))}
              </select>
            </label>
          </nav>
        ) : null}
        {query.data?.landedCostBasis ? (
          <p className="text-sm text-ink-soft" data-landed-cost-basis>
            <span aria-hidden="true" className="text-copper">
              *{' '}
            </span>
            <span className="font-medium text-ink">Landed cost:</span> {query.data.landedCostBasis}
          </p>
        ) : null}
        <p className="text-sm text-ink-soft">
          Report age counts days since the inspection; a report past its current period is marked stale. Summary grades and the number of
          deal-breakers show for every released report. Value, price ÷ value, repairs, landed cost, inclusions, the deal-breakers by name and
          the checks come with the reports you buy —{' '}
          <Link href="/reports" className="font-medium text-copper hover:underline">
            see reports
          </Link>
          .
        </p>
      </section>
    </div>
  );
}
