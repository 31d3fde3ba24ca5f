'use client';

import Link from 'next/link';
import type { ColumnDef } from '@tanstack/react-table';
import { DataTable } from '@/components/data-table/data-table';
import type { AuditRow } from '@/db/queries/audit';
import { formatDateTime } from '@/lib/format';
import { ROLE_LABELS, type Role } from '@/lib/roles';

/** Outcomes carry a word and a mark; refusals stand out without relying on colour. */
const OUTCOMES: Record<string, { mark: string; className: string }> = {
  ok: { mark: '✓', className: 'text-band-true' },
  denied: { mark: '⊘', className: 'text-band-rebuild' },
  invalid: { mark: '!', className: 'text-band-worn' },
  failed: { mark: '✕', className: 'text-band-rebuild' },
};

function detailText(detail: unknown) {
  if (!detail || typeof detail !== 'object') return '';
  return Object.entries(detail as Record<string, unknown>)
    .map(([key, value]) => `${key}: ${Array.isArray(value) ? value.join(', ') : String(value)}`)
    .join(' · ');
}

const COLUMNS: ColumnDef<AuditRow, unknown>[] = [
  { id: 'when', header: 'When (UTC)', cell: ({ row }) => <span className="figures text-sm sm:whitespace-nowrap">{formatDateTime(row.original.createdAt)}</span> },
  {
    id: 'actor',
    header: 'Who',
    cell: ({ row }) =>
      row.original.actorId ? (
        <Link href={`/admin/people/${row.original.actorId}`} className="font-medium text-copper-dark underline-offset-4 hover:underline">
          {row.original.actorName ?? row.original.actorEmail ?? row.original.actorId}
          {row.original.actorRole ? <span className="block text-sm font-normal text-ink-soft">{ROLE_LABELS[row.original.actorRole as Role] ?? row.original.actorRole}</span> : null}
        </Link>
      ) : (
        <span className="text-ink-soft">Signed out</span>
      ),
    meta: { className: 'hidden sm:table-cell' },
  },
  {
    id: 'action',
    header: 'Action',
    cell: ({ row }) => (
      <>
        <code className="break-all text-sm">{row.original.action}</code>
        {/* On phones the "Who" column is hidden: the name goes under the action. */}
        <span className="block text-sm text-ink-soft sm:hidden">{row.original.actorName ?? row.original.actorEmail ?? 'Signed out'}</span>
      </>
    ),
  },
  {
    id: 'entity',
    header: 'Record',
    cell: ({ row }) => (
      <span className="text-sm">
        {row.original.entityType}
        {row.original.entityId ? <span className="block break-all text-ink-soft">{row.original.entityId}</span> : null}
      </span>
    ),
    meta: { className: 'hidden md:table-cell' },
  },
  {
    id: 'outcome',
    header: 'Outcome',
    cell: ({ row }) => {
      const look = OUTCOMES[row.original.outcome] ?? { mark: '•', className: 'text-ink' };
      return (
        <span className={`whitespace-nowrap font-medium ${look.className}`}>
          <span aria-hidden="true">{look.mark}</span> {row.original.outcome}
        </span>
      );
    },
  },
  {
    id: 'detail',
    header: 'Detail',
    cell: ({ row }) => (
      <span className="text-sm text-ink-soft">
        {detailText(row.original.detail)}
        {row.original.ipAddress ? <span className="block">from {row.original.ipAddress}</span> : null}
      </span>
    ),
    meta: { className: 'hidden lg:table-cell' },
  },
];

export function AuditTable({ rows }: { rows: AuditRow[] }) {
  return <DataTable columns={COLUMNS} rows={rows} caption="Audit events, newest first" />;
}
