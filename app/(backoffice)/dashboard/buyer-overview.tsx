import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { listGrantedReports, listRecentReleasedReports } from '@/db/queries/dashboard';
import { formatDate, formatMm, formatMoney } from '@/lib/format';

export async function BuyerOverview({ userId }: { userId: string }) {
  const [recent, granted] = await Promise.all([listRecentReleasedReports(8), listGrantedReports(userId)]);
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <Card title="Newly inspected machines">
        {recent.length === 0 ? (
          <EmptyState title="No released reports yet" text="Machines appear here as soon as their report is released." />
        ) : (
          <ul className="divide-y divide-line">
            {recent.map((r) => (
              <li key={r.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
                <div>
                  <p className="font-medium">
                    {r.maker} {r.model}
                  </p>
                  <p className="figures text-sm text-ink-soft">
                    Swing {formatMm(r.swingMm)} · {r.town} · released {formatDate(r.releasedAt)}
                  </p>
                </div>
                <span className="rounded-full border border-line-strong px-3 py-0.5 text-sm font-medium">{r.overallCondition}{r.overallProvisional ? ', provisional' : ''}</span>
              </li>
            ))}
          </ul>
        )}
      </Card>
      <Card title="Your reports">
        {granted.length === 0 ? (
          <EmptyState title="No reports bought yet" text="Reports you pay for are listed here for download." />
        ) : (
          <ul className="divide-y divide-line">
            {granted.map((g) => (
              <li key={g.reportId} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
                <p className="font-medium">
                  {g.maker} {g.model} · {g.overallCondition}{g.overallProvisional ? ', provisional' : ''}
                </p>
                <p className="figures text-sm text-ink-soft">
                  {formatDate(g.grantedAt)} · {g.reason === 'purchase' ? formatMoney(g.amountMinor, g.currency ?? 'EUR') : 'free'}
                </p>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
