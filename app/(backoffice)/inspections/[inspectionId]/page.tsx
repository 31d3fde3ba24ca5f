import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { StatusPill } from '@/components/ui/status-pill';
import { getFee, getInspection, listInspectorsWithJobs } from '@/db/queries/inspections';
import { requirePageSession } from '@/lib/auth/session';
import { formatDateTime, formatMm, formatMoney } from '@/lib/format';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';
import { SIZE_CLASS_LABELS } from '@/lib/machine-size';
import { can, mayTransition } from '@/lib/roles';
import { BookingForm } from './booking-form';
import { CancelForm } from './cancel-form';

export const metadata: Metadata = { title: 'Inspection' };

export default async function InspectionPage({ params }: { params: Promise<{ inspectionId: string }> }) {
  const user = await requirePageSession();
  if (!can(user.role, 'inspection.queue')) notFound();
  const id = Number((await params).inspectionId);
  const bundle = Number.isInteger(id) ? await getInspection(id) : null;
  if (!bundle) notFound();
  const { inspection, machine } = bundle;
  const [inspectors, fee] = await Promise.all([listInspectorsWithJobs(), getFee(machine.sizeClass)]);
  const canBook = mayTransition(user.role, inspection.status, 'booked');
  const scheduled = inspection.scheduledAt;

  return (
    <>
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">Inspection #{inspection.id}</p>
      <div className="mt-1 flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-3xl font-semibold">
          {machine.maker} {machine.model}
        </h1>
        <StatusPill status={inspection.status} />
      </div>

      <div className="mt-8 grid gap-6 lg:grid-cols-[3fr_2fr]">
        <div className="space-y-6">
          {inspection.status === 'in_review' || inspection.status === 'released' ? (
            <Card title={inspection.status === 'in_review' ? 'Survey submitted' : 'Report released'}>
              <p className="text-ink-soft">
                {inspection.status === 'in_review'
                  ? 'The inspector has submitted the survey. Review the graded draft beside the readings and photos, then release it or send it back.'
                  : 'The report is out. A correction reopens the survey and is released as a new version; buyers of this version are told.'}
              </p>
              <ButtonLink href={`/inspections/${inspection.id}/review`} className="mt-4">
                {inspection.status === 'in_review' ? 'Review the report' : 'Open the review page'}
              </ButtonLink>
            </Card>
          ) : null}
          {canBook ? (
            <Card title={inspection.status === 'requested' ? 'Book the visit' : 'Move the visit'}>
              <BookingForm
                inspectionId={inspection.id}
                minDate={new Date().toISOString().slice(0, 10)}
                feeHint={fee ? `Fee table, ${SIZE_CLASS_LABELS[machine.sizeClass].toLowerCase()}: ${formatMoney(fee.amountMinor, fee.currency)}` : 'No fee set for this size class'}
                inspectors={inspectors.map((i) => ({
                  id: i.id,
                  name: i.name ?? i.email,
                  jobs: i.jobs.map((j) => ({ when: formatDateTime(j.scheduledAt), town: j.town })),
                }))}
                defaults={{
                  inspectorId: inspection.inspectorId ?? '',
                  date: scheduled ? scheduled.toISOString().slice(0, 10) : (inspection.preferredDates?.[0] ?? ''),
                  time: scheduled ? scheduled.toISOString().slice(11, 16) : '09:00',
                  feeEuros: (inspection.feeMinor ?? fee?.amountMinor ?? 0) / 100,
                }}
              />
            </Card>
          ) : null}
          <Card title="Timeline">
            <ol className="space-y-3">
              {bundle.events.map((event, i) => (
                <li key={i} className="flex flex-wrap justify-between gap-2 border-b border-line pb-2 last:border-0">
                  <div>
                    <p className="font-medium">{INSPECTION_STATUS_LABELS[event.toStatus]}</p>
                    {event.note ? <p className="text-sm">{event.note}</p> : null}
                  </div>
                  <p className="figures text-sm text-ink-soft">
                    {formatDateTime(event.createdAt)} · {event.actorName ?? '—'}
                  </p>
                </li>
              ))}
            </ol>
          </Card>
          {mayTransition(user.role, inspection.status, 'cancelled') ? (
            <Card title="Cancel">
              <CancelForm inspectionId={inspection.id} />
            </Card>
          ) : null}
        </div>

        <div className="space-y-6">
          <Card title="Machine">
            <dl className="figures grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5">
              <dt className="text-ink-soft">Size</dt>
              <dd>
                {formatMm(machine.swingMm)} swing × {formatMm(machine.betweenCentresMm)}
              </dd>
              <dt className="text-ink-soft">Year</dt>
              <dd>{machine.yearBuilt ?? '—'}</dd>
              <dt className="text-ink-soft">Seller</dt>
              <dd>{bundle.sellerName}</dd>
              <dt className="text-ink-soft">Site</dt>
              <dd>
                {machine.town}, {machine.region}
              </dd>
            </dl>
          </Card>
          <Card title="Site visit">
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5">
              <dt className="text-ink-soft">Dates offered</dt>
              <dd className="figures">{(inspection.preferredDates ?? []).join(', ') || '—'}</dd>
              <dt className="text-ink-soft">Contact</dt>
              <dd>
                {inspection.siteContactName} {inspection.siteContactPhone ? <span className="figures">· {inspection.siteContactPhone}</span> : null}
              </dd>
              <dt className="text-ink-soft">Access</dt>
              <dd>{inspection.siteAccessNotes ?? '—'}</dd>
              <dt className="text-ink-soft">Inspector</dt>
              <dd>{bundle.inspector?.name ?? 'Not assigned'}</dd>
              <dt className="text-ink-soft">Fee</dt>
              <dd className="figures">{formatMoney(inspection.feeMinor, inspection.currency)}</dd>
            </dl>
          </Card>
        </div>
      </div>
    </>
  );
}
