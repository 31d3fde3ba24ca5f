import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { StatusPill } from '@/components/ui/status-pill';
import { listSellerMachines } from '@/db/queries/dashboard';
import { requirePageSession } from '@/lib/auth/session';
import { formatMm } from '@/lib/format';
import { can } from '@/lib/roles';

export const metadata: Metadata = { title: 'Your machines' };

export default async function MachinesPage() {
  const user = await requirePageSession();
  if (!can(user.role, 'machine.list.own')) notFound();
  const machines = await listSellerMachines(user.id);
  return (
    <>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-semibold">Your machines</h1>
          <p className="mt-1 text-ink-soft">List a lathe, request an inspection and follow it until the report is out.</p>
        </div>
        <ButtonLink href="/machines/new">Add a machine</ButtonLink>
      </div>
      <Card className="mt-6">
        {machines.length === 0 ? (
          <EmptyState title="No machines yet" text="Add your first lathe: maker, model, size and where it stands." />
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
    </>
  );
}
