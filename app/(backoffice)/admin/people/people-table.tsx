'use client';

import Link from 'next/link';
import type { ColumnDef } from '@tanstack/react-table';
import { DataTable } from '@/components/data-table/data-table';
import type { PersonRow } from '@/db/queries/users';
import { accountState } from '@/lib/accounts/account-state';
import { formatDate } from '@/lib/format';
import { ROLE_LABELS } from '@/lib/roles';
import { PEOPLE_SORTS, type PeopleFilters } from '@/lib/validation/list-filters';
import { AccountStateBadge } from './account-state-badge';
import { peopleHref } from './people-url';

const COLUMNS: ColumnDef<PersonRow, unknown>[] = [
  {
    id: 'name',
    header: 'Name',
    cell: ({ row }) => (
      <Link href={`/admin/people/${row.original.id}`} className="inline-flex min-h-touch flex-col justify-center font-medium text-copper-dark underline-offset-4 hover:underline">
        {row.original.name ?? '(no name)'}
        {/* Phones have room for one column: the rest of the row goes under the name. */}
        <span className="break-all text-sm font-normal text-ink-soft sm:hidden">{row.original.email}</span>
        <span className="mt-1 flex flex-wrap items-center gap-2 text-sm font-normal text-ink sm:hidden">
          {ROLE_LABELS[row.original.role]}
          <AccountStateBadge state={accountState(row.original)} />
        </span>
      </Link>
    ),
  },
  { id: 'email', header: 'E-mail', cell: ({ row }) => <span className="break-all">{row.original.email}</span>, meta: { className: 'hidden sm:table-cell' } },
  { id: 'role', header: 'Role', cell: ({ row }) => ROLE_LABELS[row.original.role], meta: { className: 'hidden sm:table-cell' } },
  { id: 'business', header: 'Business', cell: ({ row }) => row.original.business ?? '—', meta: { className: 'hidden md:table-cell' } },
  { id: 'state', header: 'State', cell: ({ row }) => <AccountStateBadge state={accountState(row.original)} />, meta: { className: 'hidden sm:table-cell' } },
  { id: 'created', header: 'Joined', cell: ({ row }) => <span className="figures whitespace-nowrap">{formatDate(row.original.createdAt)}</span>, meta: { className: 'hidden md:table-cell' } },
];

export function PeopleTable({ rows, filters }: { rows: PersonRow[]; filters: PeopleFilters }) {
  return (
    <DataTable
      columns={COLUMNS}
      rows={rows}
      caption="People with a Waygrade account"
      sort={{ column: filters.sort, dir: filters.dir }}
      sortable={PEOPLE_SORTS}
      sortHref={(sort, dir) => peopleHref(filters, { sort: sort as PeopleFilters['sort'], dir })}
    />
  );
}
