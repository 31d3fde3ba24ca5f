import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { StatusPill } from '@/components/ui/status-pill';
import { Pager } from '@/components/data-table/pager';
import { MachineSearchForm } from '@/components/forms/machine-search-form';
import { listSellerMachines, SELLER_MACHINES_PAGE_SIZE } from '@/db/queries/dashboard';
import { requirePageSession } from '@/lib/auth/session';
import { formatMm } from '@/lib/format';
import { machineCountText, machineSearchHref, pageCountText } from '@/lib/machine-search';
import { can } from '@/lib/roles';
import { machineSearchSchema } from '@/lib/validation/list-filters';

export const metadata: Metadata = { title: 'Your machines' };

export default async function MachinesPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageSession();
  if (!can(user.role, 'machine.list.own')) notFound();
  const filters = machineSearchSchema.parse(await searchParams);
  const { rows: machines, total } = await listSellerMachines(user.id, filters);
  const first = (filters.page - 1) * SELLER_MACHINES_PAGE_SIZE + 1;
  // The search is there once a seller has more than a page of machines, or is searching.
  const searchable = total > SELLER_MACHINES_PAGE_SIZE || Boolean(filters.q) || filters.page > 1;
  return (
    <>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-semibold">Your machines</h1>
          <p className="mt-1 text-ink-soft">List a lathe, request an inspection and follow it until the report is out.</p>
        </div>
        <ButtonLink href="/machines/new">Add a machine</ButtonLink>
      </div>
      {searchable ? <MachineSearchForm action="/machines" q={filters.q} /> : null}
      {machines.length > 0 && searchable ? <p className="figures mt-6 text-sm text-ink-soft">{machineCountText(first, machines.length, total, SELLER_MACHINES_PAGE_SIZE)}, last changed first</p> : null}
      <Card className={searchable ? 'mt-3' : 'mt-6'}>
        {machines.length === 0 ? (
          filters.q ? (
            <EmptyState title={`None of your machines matches “${filters.q}”`} text="Try part of the maker’s name or of the model." />
          ) : total > 0 ? (
            <EmptyState title="This page is past your last machine" text={`You have ${total.toLocaleString('en-GB')} machines; go back to the first page.`} />
          ) : (
            <EmptyState title="No machines yet" text="Add your first lathe: maker, model, size and where it stands." />
          )
        ) : (
          <ul className="divide-y divide-line">
            {machines.map((m) => (
              <li key={m.id}>
                <Link href={`/machines/${m.id}`} className="flex min-h-touch flex-wrap items-center justify-between gap-3 py-3 hover:bg-paper-sunken">
                  <div>
                    <p className="font-medium">
                      {m.maker} {m.model}
                    </p>
                    <p className="figures text-sm text-ink-soft">
                      Swing {formatMm(m.swingMm)} · between centres {formatMm(m.betweenCentresMm)}
                      {m.yearBuilt ? ` · ${m.yearBuilt}` : ''}
                      {m.listingStatus === 'draft' ? ' · draft' : ''}
                    </p>
                  </div>
                  <StatusPill status={m.inspectionStatus} />
                </Link>
              </li>
            ))}
          </ul>
        )}
      </Card>
      <Pager
        page={filters.page}
        hasMore={filters.page * SELLER_MACHINES_PAGE_SIZE < total}
        href={(page) => machineSearchHref('/machines', filters.q, page)}
        summary={total > SELLER_MACHINES_PAGE_SIZE ? pageCountText(filters.page, total, SELLER_MACHINES_PAGE_SIZE) : undefined}
      />
    </>
  );
}
