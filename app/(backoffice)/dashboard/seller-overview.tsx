import Link from 'next/link';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { listSellerMachines } from '@/db/queries/dashboard';
import { formatDate, formatMm } from '@/lib/format';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';

/** How many of a seller's machines the overview shows; the rest are a link away. */
const OVERVIEW_MACHINES = 8;

export async function SellerOverview({ userId }: { userId: string }) {
  const { rows: machines, total } = await listSellerMachines(userId, { page: 1, q: undefined }, OVERVIEW_MACHINES);
  return (
    <Card title="Your machines">
      {machines.length === 0 ? (
        <EmptyState title="No machines listed yet" text="Machines you list for sale appear here with their inspection status." />
      ) : (
        <ul className="divide-y divide-line">
          {machines.map((m) => (
            <li key={m.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
              <div>
                <p className="font-medium">
                  {m.maker} {m.model}
                </p>
                <p className="figures text-sm text-ink-soft">
                  Swing {formatMm(m.swingMm)} · between centres {formatMm(m.betweenCentresMm)}
                  {m.yearBuilt ? ` · built ${m.yearBuilt}` : ''}
                </p>
              </div>
              <p className="text-sm">
                {m.inspectionStatus ? INSPECTION_STATUS_LABELS[m.inspectionStatus] : 'No inspection requested'}
                {m.scheduledAt && m.inspectionStatus === 'booked' ? ` · ${formatDate(m.scheduledAt)}` : ''}
              </p>
            </li>
          ))}
        </ul>
      )}
      {total > machines.length ? (
        <Link href="/machines" className="mt-3 inline-flex min-h-touch items-center font-medium text-copper hover:underline">
          All {total.toLocaleString('en-GB')} machines →
        </Link>
      ) : null}
    </Card>
  );
}
