import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { StatusPill } from '@/components/ui/status-pill';
import { countOpenInspections, listInspectionQueue } from '@/db/queries/inspections';
import type { InspectionStatus } from '@/db/schema/inspections';
import { requirePageSession } from '@/lib/auth/session';
import { formatDate, formatDateTime, formatMm } from '@/lib/format';
import { can } from '@/lib/roles';

export const metadata: Metadata = { title: 'Inspections' };

/** The coordinator's work, one tab per step. */
const TABS: ReadonlyArray<{ id: string; label: string; statuses: InspectionStatus[]; empty: string }> = [
  { id: 'to-book', label: 'To book', statuses: ['requested'], empty: 'No requests waiting to be booked.' },
  { id: 'booked', label: 'Booked', statuses: ['booked', 'on_site'], empty: 'No visits booked.' },
  { id: 'to-review', label: 'To review', statuses: ['in_review'], empty: 'No surveys waiting for review.' },
  { id: 'done', label: 'Released and cancelled', statuses: ['released', 'cancelled'], empty: 'Nothing finished yet.' },
];

const querySchema = z.object({ tab: z.enum(['to-book', 'booked', 'to-review', 'done']).catch('to-book') });

export default async function InspectionsPage({ searchParams }: { searchParams: Promise<Record<string, string>> }) {
  const user = await requirePageSession();
  if (!can(user.role, 'inspection.queue')) notFound();
  const { tab } = querySchema.parse(await searchParams);
  const active = TABS.find((t) => t.id === tab)!;
  const [rows, counts] = await Promise.all([listInspectionQueue(active.statuses), countOpenInspections()]);
  const countFor = (statuses: InspectionStatus[]) => counts.filter((c) => statuses.includes(c.status)).reduce((sum, c) => sum + c.total, 0);

  return (
    <>
      <h1 className="text-3xl font-semibold">Inspections</h1>
      <nav aria-label="Queue" className="mt-6 flex flex-wrap gap-2">
        {TABS.map((t) => (
          <Link
            key={t.id}
            href={`/inspections?tab=${t.id}`}
            aria-current={t.id === tab ? 'page' : undefined}
            className={`flex min-h-touch items-center gap-2 rounded-lg border px-4 font-medium ${t.id === tab ? 'border-copper bg-copper-light text-copper-dark' : 'border-line bg-paper-raised text-ink-soft hover:text-ink'}`}
          >
            {t.label}
            {t.id !== 'done' ? <span className="figures rounded-full bg-paper-raised px-2 text-sm">{countFor(t.statuses)}</span> : null}
          </Link>
        ))}
      </nav>
      <Card className="mt-4">
        {rows.length === 0 ? (
          <EmptyState title="All clear" text={active.empty} />
        ) : (
          <table className="w-full text-left">
            <thead className="text-sm text-ink-soft">
              <tr>
                <th className="py-2 font-medium">Machine</th>
                <th className="py-2 font-medium">Where</th>
                <th className="py-2 font-medium">{tab === 'to-book' ? 'Requested / dates offered' : 'Visit'}</th>
                <th className="py-2 font-medium">Status</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {rows.map((row) => (
                <tr key={row.id} className="align-top">
                  <td className="py-3 pr-3">
                    <Link href={`/inspections/${row.id}`} className="font-medium text-copper-dark underline-offset-2 hover:underline">
                      {row.maker} {row.model}
                    </Link>
                    <p className="figures text-sm text-ink-soft">
                      {formatMm(row.swingMm)} × {formatMm(row.betweenCentresMm)} · {row.sizeClass}
                    </p>
                    {row.reinspection ? (
                      <p className="mt-1 inline-flex rounded-full border border-copper px-2 py-0.5 text-sm font-medium text-copper-dark">Re-inspection · fee paid by the requester</p>
                    ) : null}
                  </td>
                  <td className="py-3 pr-3">
                    {row.town}
                    <p className="text-sm text-ink-soft">{row.region}</p>
                  </td>
                  <td className="figures py-3 pr-3 text-sm">
                    {tab === 'to-book' ? (
                      <>
                        {formatDate(row.createdAt)}
                        <p className="text-ink-soft">{(row.preferredDates ?? []).join(', ')}</p>
                      </>
                    ) : (
                      <>
                        {formatDateTime(row.scheduledAt)}
                        {row.inspectorName ? <p className="text-ink-soft">{row.inspectorName}</p> : null}
                      </>
                    )}
                  </td>
                  <td className="py-3">
                    <StatusPill status={row.status} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Card>
    </>
  );
}
