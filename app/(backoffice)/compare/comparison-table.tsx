'use client';

import { flexRender, getCoreRowModel, useReactTable, type RowSelectionState, type VisibilityState } from '@tanstack/react-table';
import type { ComparisonRow } from '@/lib/comparison/comparison-row';
import { COMPARISON_COLUMNS, type ColumnMeta } from './comparison-columns';

const SKELETON_ROWS = 8;

/**
 * The comparison grid. The server sorts, filters and pages (manual modes); TanStack lays out the
 * columns, their visibility and the row selection. Headers are buttons that change the URL's sort.
 */
export function ComparisonTable({
  rows,
  loading,
  refreshing,
  sort,
  dir,
  onSort,
  columnVisibility,
  selected,
  onToggle,
  landedCostBasis,
}: {
  landedCostBasis: string;
  rows: ComparisonRow[];
  loading: boolean;
  refreshing: boolean;
  sort: string;
  dir: 'asc' | 'desc';
  onSort: (column: string) => void;
  columnVisibility: VisibilityState;
  selected: ReadonlyMap<number, ComparisonRow>;
  onToggle: (row: ComparisonRow) => void;
}) {
  const rowSelection: RowSelectionState = Object.fromEntries(rows.filter((r) => selected.has(r.reportId)).map((r) => [String(r.reportId), true]));
  const table = useReactTable({
    data: rows,
    columns: COMPARISON_COLUMNS,
    getRowId: (row) => String(row.reportId),
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualFiltering: true,
    manualPagination: true,
    state: { columnVisibility, rowSelection },
  });
  const visible = table.getVisibleLeafColumns();

  return (
    <div className={`relative overflow-x-auto rounded-card border border-line bg-paper-raised ${refreshing ? 'opacity-70' : ''}`} aria-busy={loading || refreshing}>
      {refreshing ? <div className="absolute inset-x-0 top-0 h-0.5 animate-pulse bg-copper" aria-hidden="true" /> : null}
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Inspected machines compared on size, grades, price and value</caption>
        <thead className="border-b border-line bg-paper-sunken text-sm text-ink-soft">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              <th scope="col" className="w-10 px-3 py-2">
                <span className="sr-only">Select</span>
              </th>
              {group.headers.map((header) => {
                const id = header.column.id;
                const meta = header.column.columnDef.meta as ColumnMeta;
                const active = sort === id;
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={active ? (dir === 'asc' ? 'ascending' : 'descending') : undefined}
                    className={`px-3 py-1 font-semibold ${meta.className?.includes('sticky') ? 'sticky left-0 z-10 bg-paper-sunken' : ''}`}
                  >
                    <button
                      type="button"
                      onClick={() => onSort(id)}
                      title={id === 'landed' && landedCostBasis ? `Sort by landed cost. ${landedCostBasis}` : `Sort by ${meta.label.toLowerCase()}`}
                      className={`inline-flex min-h-touch items-center gap-1 whitespace-nowrap hover:text-ink ${active ? 'text-ink' : ''}`}
                    >
                      {flexRender(header.column.columnDef.header, header.getContext())}
                      {id === 'landed' ? (
                        <sup aria-hidden="true" className="text-copper">
                          *
                        </sup>
                      ) : null}
                      <span aria-hidden="true" className={active ? 'text-copper' : 'text-ink-faint'}>
                        {active ? (dir === 'asc' ? '▲' : '▼') : '↕'}
                      </span>
                    </button>
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {loading
            ? Array.from({ length: SKELETON_ROWS }, (_, i) => (
                <tr key={i} className="border-b border-line last:border-b-0">
                  <td className="px-3 py-3">
                    <div className="h-5 w-5 animate-pulse rounded bg-paper-sunken" />
                  </td>
                  {visible.map((column) => (
                    <td key={column.id} className="px-3 py-3">
                      <div className="h-4 animate-pulse rounded bg-paper-sunken" style={{ width: `${column.id === 'machine' ? 9 : 4 + ((i + column.id.length) % 3)}rem` }} />
                    </td>
                  ))}
                </tr>
              ))
            : table.getRowModel().rows.map((row) => {
                const r = row.original;
                const checked = row.getIsSelected();
                return (
                  <tr key={row.id} className={`border-b border-line last:border-b-0 ${checked ? 'bg-copper-light' : 'bg-paper-raised hover:bg-paper'}`} data-report-id={r.reportId}>
                    <td className="px-3 py-2 align-middle">
                      <input
                        type="checkbox"
                        checked={checked}
                        onChange={() => onToggle(r)}
                        aria-label={`Select ${r.maker} ${r.model}, ${r.town}`}
                        className="h-5 w-5 accent-copper"
                      />
                    </td>
                    {row.getVisibleCells().map((cell) => {
                      const meta = cell.column.columnDef.meta as ColumnMeta;
                      return (
                        <td key={cell.id} className={`px-3 py-2 align-middle ${meta.className ?? ''}`}>
                          {flexRender(cell.column.columnDef.cell, cell.getContext())}
                        </td>
                      );
                    })}
                  </tr>
                );
              })}
        </tbody>
      </table>
    </div>
  );
}
