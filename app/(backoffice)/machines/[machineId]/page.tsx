import type { Metadata } from 'next';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { StatusPill } from '@/components/ui/status-pill';
import { findListingExtras, listMachineInspections } from '@/db/queries/machines';
import { SITE_ACCESS_LABELS } from '@/lib/decision/rigging-estimate';
import { formatDate, formatDateTime, formatMm, formatMoney } from '@/lib/format';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';
import { SIZE_CLASS_LABELS } from '@/lib/machine-size';
import { mayTransition } from '@/lib/roles';
import { loadOwnMachine } from '../load-machine';
import { CancelInspectionForm } from './cancel-inspection-form';
import { ListingStatusControl } from './listing-status-control';

export const metadata: Metadata = { title: 'Machine' };

const OPEN = new Set(['requested', 'booked', 'on_site', 'in_review']);
const LISTING_WORDS: Record<string, string> = { draft: 'Draft listing', listed: 'Listed machine', sold: 'Sold', withdrawn: 'Withdrawn from sale' };

export default async function MachinePage({ params }: { params: Promise<{ machineId: string }> }) {
  const { machineId } = await params;
  const { user, machine } = await loadOwnMachine(machineId);
  const [history, extras] = await Promise.all([listMachineInspections(machine.id), findListingExtras(machine.id)]);
  const current = history[0];
  const open = current && OPEN.has(current.status);

  const facts: Array<[string, string]> = [
    ['Type', machine.latheKind === 'toolroom' ? 'Toolroom lathe' : 'General-purpose centre lathe'],
    ['Swing over bed', formatMm(machine.swingMm)],
    ['Between centres', formatMm(machine.betweenCentresMm)],
    ['Spindle bore', formatMm(machine.spindleBoreMm)],
    ['Year built', machine.yearBuilt ? String(machine.yearBuilt) : '—'],
    ['Main motor', machine.motorKw ? `${Number(machine.motorKw).toLocaleString('en-GB')} kW` : '—'],
    ['Supply', machine.supplyVoltage ? `${machine.supplyVoltage} V, ${machine.supplyPhases === 1 ? 'single' : 'three'} phase` : '—'],
    ['Size class', SIZE_CLASS_LABELS[machine.sizeClass]],
    ['Location', `${machine.town}, ${machine.region}`],
    ['Asking price', formatMoney(machine.askingPriceMinor, machine.currency)],
  ];

  return (
    <>
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm font-semibold uppercase tracking-widest text-copper">{LISTING_WORDS[machine.listingStatus]}</p>
          <h1 className="mt-1 text-3xl font-semibold">
            {machine.maker} {machine.model}
          </h1>
          {machine.serialNumber ? <p className="figures text-ink-soft">Serial {machine.serialNumber}</p> : null}
          {user.role === 'seller' ? <ListingStatusControl machineId={machine.id} listingStatus={machine.listingStatus} /> : null}
        </div>
        <div className="flex flex-wrap gap-2">
          <ButtonLink href={`/machines/${machine.id}/edit`} variant="secondary">
            Edit listing
          </ButtonLink>
          <ButtonLink href={`/machines/${machine.id}/disclosure`} variant="secondary">
            Seller’s disclosure
          </ButtonLink>
          <ButtonLink href={`/machines/${machine.id}/moving`} variant="secondary">
            Moving sheet
          </ButtonLink>
          <ButtonLink href={`/machines/${machine.id}/inclusions`} variant="secondary">
            What comes with it
          </ButtonLink>
          {!open && user.role === 'seller' ? <ButtonLink href={`/machines/${machine.id}/request`}>Request an inspection</ButtonLink> : null}
        </div>
      </div>

      <div className="mt-8 grid gap-6 lg:grid-cols-[3fr_2fr]">
        <Card title="Inspection">
          {!current ? (
            <p className="text-ink-soft">No inspection requested yet. An independent inspection lets buyers see measured condition instead of guessing.</p>
          ) : (
            <>
              <div className="flex flex-wrap items-center gap-3">
                <StatusPill status={current.status} />
                {current.scheduledAt && current.status === 'booked' ? (
                  <span className="figures">
                    {formatDateTime(current.scheduledAt)} UTC with {current.inspectorName}
                  </span>
                ) : null}
              </div>
              <ol className="mt-5 space-y-0 border-l-2 border-line pl-5" aria-label="Timeline">
                {current.events.map((event, i) => (
                  <li key={i} className="relative pb-4">
                    <span aria-hidden="true" className="absolute -left-[27px] top-1.5 h-3 w-3 rounded-full border-2 border-paper-raised bg-copper" />
                    <p className="font-medium">{INSPECTION_STATUS_LABELS[event.toStatus]}</p>
                    <p className="figures text-sm text-ink-soft">{formatDateTime(event.createdAt)} UTC</p>
                    {event.note ? <p className="mt-1 text-sm">{event.note}</p> : null}
                  </li>
                ))}
              </ol>
              {current.reports.length > 0 ? (
                <div className="mt-2 rounded-lg bg-paper-sunken p-4">
                  <p className="font-medium">Released report</p>
                  {current.reports.map((r) => (
                    <p key={r.id} className="figures text-sm">
                      Version {r.version} · {r.overallCondition}{r.overallProvisional ? ', provisional' : ''} · released {formatDate(r.releasedAt)} · code {r.verificationCode}
                    </p>
                  ))}
                </div>
              ) : null}
              {open && mayTransition(user.role, current.status, 'cancelled') ? <CancelInspectionForm inspectionId={current.id} /> : null}
            </>
          )}
        </Card>
        <div className="space-y-6">
          <Card title="Details">
            <dl className="figures grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5">
              {facts.map(([label, value]) => (
                <div key={label} className="contents">
                  <dt className="text-ink-soft">{label}</dt>
                  <dd>{value}</dd>
                </div>
              ))}
            </dl>
            {machine.accessories ? (
              <>
                <h3 className="mt-4 font-semibold">Accessories</h3>
                <p className="text-ink-soft">{machine.accessories}</p>
              </>
            ) : null}
          </Card>
          <Card title="For buyers">
            <dl className="figures grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5">
              <dt className="text-ink-soft">Disclosure</dt>
              <dd>{extras.disclosureAnsweredAt ? `answered ${formatDate(extras.disclosureAnsweredAt)}` : 'not answered yet'}</dd>
              <dt className="text-ink-soft">Moving sheet</dt>
              <dd>
                {extras.movingSheet
                  ? `${extras.movingSheet.weightKg.toLocaleString('en-GB')} kg, ${SITE_ACCESS_LABELS[extras.movingSheet.siteAccess].toLowerCase()}`
                  : 'not filled in'}
              </dd>
              <dt className="text-ink-soft">What comes with it</dt>
              <dd>{extras.inclusions === 0 ? 'nothing listed' : `${extras.inclusions} ${extras.inclusions === 1 ? 'item' : 'items'}`}</dd>
            </dl>
            <p className="mt-3 text-sm text-ink-soft">
              {history.some((inspection) => inspection.reports.length > 0)
                ? 'The report keeps these as they stood when it was released; a change shows in its next version.'
                : 'The report keeps these as they stand when it is released, so fill them in before then.'}
            </p>
          </Card>
        </div>
      </div>
    </>
  );
}
