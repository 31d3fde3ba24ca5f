'use client';

import Link from 'next/link';
import type { ColumnDef } from '@tanstack/react-table';
import { GradeChip } from '@/components/ui/grade-chip';
import { dayCount, LATHE_KIND_LABELS, type ComparisonRow } from '@/lib/comparison/comparison-row';
import { formatDate, formatMm, formatMoney } from '@/lib/format';
import { SUBSYSTEM_TABLE, SUBSYSTEMS } from '@/lib/scoring/subsystems';
import { SUBSYSTEM_KEYS, type SortColumn } from '@/lib/validation/comparison-query';
import { DealBreakersCell, LandedCostCell, ReportAgeCell } from './decision-cells';
import { PriceValueGauge } from './price-value-gauge';

export type ColumnMeta = { className?: string; group: 'machine' | 'grades' | 'money'; label: string };

const NUMBER = 'figures whitespace-nowrap text-right';

/** What a reader without the report sees in a detail cell. */
function WithReport() {
  return (
    <span className="inline-flex items-center gap-1 whitespace-nowrap text-sm text-ink-faint" title="Comes with the report: buy it to see this figure">
      <svg aria-hidden="true" viewBox="0 0 16 16" className="h-3.5 w-3.5">
        <path d="M4.5 7V5a3.5 3.5 0 017 0v2M3.5 7h9v7h-9z" fill="none" stroke="currentColor" strokeWidth="1.6" />
      </svg>
      with report
    </span>
  );
}

const SHORT_SUBSYSTEM_LABELS: Record<string, string> = {
  bed: 'Bed',
  spindle: 'Spindle',
  gearbox: 'Gearbox',
  slides: 'Slides',
  tailstock: 'Tailstock',
  drive: 'Drive',
  electrical: 'Electrics',
  accessories: 'Accessories',
};

/** The table's columns; each id is also its sort key in the URL and the API's allow-list. */
export const COMPARISON_COLUMNS: ColumnDef<ComparisonRow, unknown>[] = [
  {
    id: 'machine',
    header: 'Machine',
    meta: { group: 'machine', label: 'Machine', className: 'sticky left-0 z-10 bg-inherit whitespace-nowrap' },
    cell: ({ row: { original: r } }) => (
      <Link href={`/reports/${r.reportId}`} className="font-semibold hover:text-copper">
        {r.maker} {r.model}
      </Link>
    ),
  },
  { id: 'kind', header: 'Type', meta: { group: 'machine', label: 'Type', className: 'whitespace-nowrap' }, cell: ({ row }) => LATHE_KIND_LABELS[row.original.kind] },
  { id: 'swing', header: 'Swing', meta: { group: 'machine', label: 'Swing over bed', className: NUMBER }, cell: ({ row }) => formatMm(row.original.swingMm) },
  { id: 'centres', header: 'Centres', meta: { group: 'machine', label: 'Between centres', className: NUMBER }, cell: ({ row }) => formatMm(row.original.betweenCentresMm) },
  { id: 'year', header: 'Year', meta: { group: 'machine', label: 'Year built', className: NUMBER }, cell: ({ row }) => row.original.yearBuilt ?? '—' },
  {
    id: 'location',
    header: 'Location',
    meta: { group: 'machine', label: 'Location', className: 'whitespace-nowrap' },
    cell: ({ row: { original: r } }) => (
      <>
        {r.town}
        <span className="block text-sm text-ink-soft">{r.region}</span>
      </>
    ),
  },
  {
    id: 'condition',
    header: 'Condition',
    meta: { group: 'grades', label: 'Overall condition' },
    cell: ({ row: { original: r } }) => (
      <span className="flex flex-col">
        <GradeChip grade={r.overallCondition} score={r.overallScore} provisional={r.overallProvisional} />
        <span className="figures text-xs text-ink-soft">{r.overallScore} / 100</span>
      </span>
    ),
  },
  ...SUBSYSTEMS.map((id): ColumnDef<ComparisonRow, unknown> => {
    const key = SUBSYSTEM_KEYS[id];
    return {
      id: key,
      header: SHORT_SUBSYSTEM_LABELS[key],
      meta: { group: 'grades', label: SUBSYSTEM_TABLE[id].label },
      cell: ({ row }) => <GradeChip grade={row.original.subsystems[key].grade} score={row.original.subsystems[key].score} />,
    };
  }),
  {
    id: 'dealBreakers',
    header: 'Deal-breakers',
    meta: { group: 'grades', label: 'Deal-breakers' },
    cell: ({ row }) => <DealBreakersCell row={row.original} />,
  },
  { id: 'confidence', header: 'Confidence', meta: { group: 'grades', label: 'Confidence', className: NUMBER }, cell: ({ row }) => `${Math.round(row.original.confidence * 100)} %` },
  { id: 'price', header: 'Asking', meta: { group: 'money', label: 'Asking price', className: NUMBER }, cell: ({ row }) => formatMoney(row.original.askingPriceMinor, row.original.priceCurrency) },
  {
    id: 'value',
    header: 'Value',
    meta: { group: 'money', label: 'Fair market value', className: NUMBER },
    cell: ({ row: { original: r } }) => (r.hasDetails ? formatMoney(r.fairMarketValueMinor, r.valueCurrency) : <WithReport />),
  },
  {
    id: 'ratio',
    header: 'Price ÷ value',
    meta: { group: 'money', label: 'Asking price ÷ value', className: 'whitespace-nowrap' },
    cell: ({ row: { original: r } }) => (r.hasDetails ? <PriceValueGauge ratio={r.priceToValue} /> : <WithReport />),
  },
  {
    id: 'repair',
    header: 'Repairs',
    meta: { group: 'money', label: 'Repair estimate', className: NUMBER },
    cell: ({ row: { original: r } }) => (r.hasDetails ? formatMoney(r.repairEstimateMinor, r.valueCurrency) : <WithReport />),
  },
  {
    id: 'landed',
    header: 'Landed',
    meta: { group: 'money', label: 'Landed cost in your shop', className: NUMBER },
    cell: ({ row: { original: r } }) => (r.hasDetails ? <LandedCostCell row={r} /> : <WithReport />),
  },
  {
    id: 'inclusions',
    header: 'Inclusions',
    meta: { group: 'money', label: 'Inclusions value', className: NUMBER },
    cell: ({ row: { original: r } }) =>
      r.hasDetails ? r.inclusionsValueMinor === null ? <span className="text-sm text-ink-soft">not listed</span> : formatMoney(r.inclusionsValueMinor, r.priceCurrency) : <WithReport />,
  },
  { id: 'daysListed', header: 'Listed', meta: { group: 'machine', label: 'Days listed', className: NUMBER }, cell: ({ row }) => dayCount(row.original.daysListed) },
  { id: 'reportAge', header: 'Report age', meta: { group: 'machine', label: 'Report age (since inspection)', className: 'figures text-right' }, cell: ({ row }) => <ReportAgeCell row={row.original} /> },
  { id: 'released', header: 'Report', meta: { group: 'machine', label: 'Report date', className: 'figures whitespace-nowrap' }, cell: ({ row }) => formatDate(new Date(row.original.releasedAt)) },
];

export const COLUMN_IDS = COMPARISON_COLUMNS.map((c) => c.id as SortColumn);
