import { Card } from '@/components/ui/card';
import { countInspectionsByStatus, countUsersByRole } from '@/db/queries/dashboard';
import { INSPECTION_STATUSES } from '@/db/schema/inspections';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';
import { ROLE_LABELS } from '@/lib/roles';
import { ROLES } from '@/db/schema/users';

export async function CoordinatorOverview() {
  const [byStatus, byRole] = await Promise.all([countInspectionsByStatus(), countUsersByRole()]);
  const statusTotal = (s: string) => byStatus.find((row) => row.status === s)?.total ?? 0;
  const roleTotal = (r: string) => byRole.find((row) => row.role === r)?.total ?? 0;
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <Card title="Inspections by status">
        <dl className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {INSPECTION_STATUSES.map((s) => (
            <div key={s} className="rounded-lg bg-paper-sunken p-3">
              <dt className="text-sm text-ink-soft">{INSPECTION_STATUS_LABELS[s]}</dt>
              <dd className="figures text-2xl font-semibold">{statusTotal(s)}</dd>
            </div>
          ))}
        </dl>
      </Card>
      <Card title="Active accounts">
        <dl className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {ROLES.map((r) => (
            <div key={r} className="rounded-lg bg-paper-sunken p-3">
              <dt className="text-sm text-ink-soft">{ROLE_LABELS[r]}s</dt>
              <dd className="figures text-2xl font-semibold">{roleTotal(r)}</dd>
            </div>
          ))}
        </dl>
      </Card>
    </div>
  );
}
