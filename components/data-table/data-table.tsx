'use client';

import Link from 'next/link';
import { flexRender, getCoreRowModel, useReactTable, type ColumnDef } from '@tanstack/react-table';

export type SortState = { column: string; dir: 'asc' | 'desc' };

type ColumnMeta = { className?: string };

/**
 * A table whose sorting and paging live in the URL (the server sorts and pages); TanStack lays out
 * the columns. Sortable headers are links, so sorting works before scripts load and can be shared.
 */
export function DataTable<Row>({
  columns,
  rows,
  caption,
  sort,
  sortHref,
  sortable = [],
}: {
  columns: ColumnDef<Row, unknown>[];
  rows: Row[];
  caption: string;
  sort?: SortState;
  sortHref?: (column: string, dir: 'asc' | 'desc') => string;
  sortable?: readonly string[];
}) {
  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel(), manualSorting: true });
  return (
    <div className="overflow-x-auto rounded-card border border-line bg-paper-raised">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-line bg-paper-sunken text-sm text-ink-soft">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const id = header.column.id;
                const active = sort?.column === id;
                const label = flexRender(header.column.columnDef.header, header.getContext());
                const meta = header.column.columnDef.meta as ColumnMeta | undefined;
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={active ? (sort!.dir === 'asc' ? 'ascending' : 'descending') : undefined}
                    className={`px-3 py-2 font-semibold ${meta?.className ?? ''}`}
                  >
                    {sortable.includes(id) && sortHref ? (
                      <Link href={sortHref(id, active && sort!.dir === 'asc' ? 'desc' : 'asc')} className="inline-flex min-h-touch items-center gap-1 hover:text-ink">
                        {label}
                        <span aria-hidden="true" className={active ? 'text-copper' : 'text-ink-faint'}>
                          {active ? (sort!.dir === 'asc' ? '▲' : '▼') : '↕'}
                        </span>
                      </Link>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-line last:border-b-0 hover:bg-paper">
              {row.getVisibleCells().map((cell) => {
                const meta = cell.column.columnDef.meta as ColumnMeta | undefined;
                return (
                  <td key={cell.id} className={`px-3 py-2 align-top ${meta?.className ?? ''}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
