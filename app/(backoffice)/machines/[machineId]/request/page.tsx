import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { getFee } from '@/db/queries/inspections';
import { formatMoney } from '@/lib/format';
import { loadOwnMachine } from '../../load-machine';
import { RequestInspectionForm } from './request-form';

export const metadata: Metadata = { title: 'Request an inspection' };

export default async function RequestInspectionPage({ params }: { params: Promise<{ machineId: string }> }) {
  const { machineId } = await params;
  const { user, machine } = await loadOwnMachine(machineId);
  if (user.role !== 'seller') notFound();
  const fee = await getFee(machine.sizeClass);
  return (
    <div className="max-w-2xl">
      <h1 className="text-3xl font-semibold">Request an inspection</h1>
      <p className="mb-6 mt-1 text-ink-soft">
        {machine.maker} {machine.model} in {machine.town}.{' '}
        {fee ? (
          <>
            The inspection fee for this size is <span className="figures font-medium text-ink">{formatMoney(fee.amountMinor, fee.currency)}</span>; buyers pay it to read the
            report, and you get your own copy free.
          </>
        ) : null}
      </p>
      <RequestInspectionForm machineId={machine.id} contactName={user.name ?? ''} minDate={new Date().toISOString().slice(0, 10)} />
    </div>
  );
}
