import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { Card } from '@/components/ui/card';
import { db } from '@/db/client';
import { listInspectionFees } from '@/db/queries/fees';
import { SIZE_CLASSES } from '@/db/schema';
import { requirePageSession } from '@/lib/auth/session';
import { SIZE_CLASS_LABELS } from '@/lib/machine-size';
import { can } from '@/lib/roles';
import { findReportValidityDays } from '@/db/queries/report-settings';
import { FeeForm } from './fee-form';
import { ValidityForm } from './validity-form';

export const metadata: Metadata = { title: 'Report fees' };

export default async function FeesPage() {
  const user = await requirePageSession();
  if (!can(user.role, 'fees.manage')) notFound();
  const fees = await listInspectionFees(db);
  const validityDays = await findReportValidityDays();
  return (
    <>
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">Coordinator</p>
      <h1 className="mt-1 text-3xl font-semibold">Report fees</h1>
      <p className="mt-2 max-w-2xl text-ink-soft">
        What a buyer pays to download a centre-lathe report, by the machine&apos;s size class (swing over bed). Sellers always get the report on their own
        machine free.
      </p>
      <Card className="mt-8 max-w-2xl">
        <div className="divide-y divide-line">
          {SIZE_CLASSES.map((sizeClass) => {
            const fee = fees.find((f) => f.machineType === 'centre_lathe' && f.sizeClass === sizeClass);
            return (
              <FeeForm
                key={sizeClass}
                sizeClass={sizeClass}
                label={SIZE_CLASS_LABELS[sizeClass]}
                amount={fee ? (fee.amountMinor / 100).toFixed(2) : ''}
              />
            );
          })}
        </div>
      </Card>
      <Card title="How long a report stays current" className="mt-6 max-w-2xl">
        <p className="mb-4 text-ink-soft">Counted from the inspection day. After it, the report page shows the machine may have changed since.</p>
        <ValidityForm validityDays={validityDays} />
      </Card>
    </>
  );
}
