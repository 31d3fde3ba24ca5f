import type { Metadata } from 'next';
import Link from 'next/link';
import { Pager } from '@/components/data-table/pager';
import { EmptyState } from '@/components/ui/empty-state';
import { listAuditEntityTypes, listAuditEvents } from '@/db/queries/audit';
import { requirePagePermission } from '@/lib/auth/session';
import { auditFiltersSchema } from '@/lib/validation/list-filters';
import { AuditTable } from './audit-table';
import { auditHref } from './audit-url';

export const metadata: Metadata = { title: 'Audit log' };

const CONTROL = 'mt-1 block w-full min-h-touch rounded-lg border border-line-strong bg-paper-raised px-3 text-base';

export default async function AuditPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePagePermission('audit.view');
  const filters = auditFiltersSchema.parse(await searchParams);
  const [{ rows, hasMore }, entityTypes] = await Promise.all([listAuditEvents(filters), listAuditEntityTypes()]);
  const filtered = Boolean(filters.actor || filters.entity || filters.entityId || filters.from || filters.to);

  return (
    <>
      <h1 className="text-3xl font-semibold">Audit log</h1>
      <p className="mt-1 text-ink-soft">Every change, sign-in and refusal, newest first. Entries are never edited or removed.</p>

      <form method="get" action="/admin/audit" className="mt-6 grid gap-3 rounded-card border border-line bg-paper-raised p-4 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_1fr_1fr_1fr_auto] lg:items-end">
        <label className="block">
          <span className="font-medium">Who</span>
          <input name="actor" type="search" defaultValue={filters.actor ?? ''} placeholder="Name or e-mail" className={CONTROL} />
        </label>
        <label className="block">
          <span className="font-medium">Record type</span>
          <select name="entity" defaultValue={filters.entity ?? ''} className={CONTROL}>
            <option value="">Any</option>
            {entityTypes.map((type) => (
              <option key={type} value={type}>
                {type}
              </option>
            ))}
          </select>
        </label>
        <label className="block">
          <span className="font-medium">Record id</span>
          <input name="entityId" defaultValue={filters.entityId ?? ''} className={CONTROL} />
        </label>
        <label className="block">
          <span className="font-medium">From</span>
          <input name="from" type="date" defaultValue={filters.from ?? ''} className={CONTROL} />
        </label>
        <label className="block">
          <span className="font-medium">To</span>
          <input name="to" type="date" defaultValue={filters.to ?? ''} className={CONTROL} />
        </label>
        <div className="flex gap-2">
          <button type="submit" className="min-h-touch rounded-lg border border-line-strong bg-paper-sunken px-5 font-medium hover:bg-line">
            Show
          </button>
          {filtered ? (
            <Link href="/admin/audit" className="inline-flex min-h-touch items-center px-2 text-ink-soft hover:text-ink">
              Clear
            </Link>
          ) : null}
        </div>
      </form>

      <div className="mt-6">
        {rows.length === 0 ? (
          <EmptyState
            title={filtered ? 'No events match these filters' : 'Nothing recorded yet'}
            text={filtered ? 'Widen the dates or clear a filter.' : 'Sign-ins and changes appear here as they happen.'}
          />
        ) : (
          <>
            <AuditTable rows={rows} />
            <Pager page={filters.page} hasMore={hasMore} href={(page) => auditHref(filters, { page })} />
          </>
        )}
      </div>
    </>
  );
}
