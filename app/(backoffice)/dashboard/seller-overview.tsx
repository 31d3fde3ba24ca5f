import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { listSellerMachines } from '@/db/queries/dashboard';
import { formatDate, formatMm } from '@/lib/format';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';

export async function SellerOverview({ userId }: { userId: string }) {
  const machines = await listSellerMachines(userId);
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
    </Card>
  );
}
