import { findLatestReinspectionRequest, findMachineInspectionUnderWay } from '@/db/queries/reinspection-requests';
import { formatDate, formatDateTime, formatMoney } from '@/lib/format';
import type { ReinspectionOffer } from '@/lib/reinspection/offer';
import { ReinspectionButton } from './reinspection-button';

type Props = {
  reportId: number;
  machineId: number;
  userId: string;
  listingStatus: string;
  offer: ReinspectionOffer;
  fee: { amountMinor: number; currency: string } | null;
  /** Back from the provider's checkout page: the webhook may not have arrived yet. */
  returnedFromCheckout: boolean;
};

const WHAT_HAPPENS = [
  'You pay the inspection fee now, through our payment provider.',
  'A coordinator books the visit with the seller and assigns an inspector.',
  'When the new report is released it is yours to download at no further charge, and we e-mail you.',
  'If the machine is sold or taken off the market before the inspector starts the visit, the visit is cancelled and the fee is refunded to you automatically.',
  'Once the visit has started there is no automatic refund.',
];

function Notice({ tone, mark, title, children }: { tone: 'calm' | 'good' | 'worn'; mark: string; title: string; children: React.ReactNode }) {
  const tones = { calm: 'border-line-strong bg-paper-sunken', good: 'border-band-true/40 bg-band-true/10', worn: 'border-band-worn/40 bg-band-worn/10' };
  return (
    <div role="status" className={`rounded-lg border px-4 py-3 ${tones[tone]}`}>
      <p className="font-semibold">
        <span aria-hidden="true">{mark}</span> {title}
      </p>
      <div className="figures mt-1 text-sm">{children}</div>
    </div>
  );
}

/** The re-inspection request on a report page: what it costs and what happens, or where the person's request stands. */
export async function ReinspectionPanel({ reportId, machineId, userId, listingStatus, offer, fee, returnedFromCheckout }: Props) {
  const [request, underWay] = await Promise.all([findLatestReinspectionRequest(userId, machineId), findMachineInspectionUnderWay(machineId)]);
  const mayRequest = offer.open && listingStatus === 'listed' && !underWay && fee !== null;

  let state: React.ReactNode = null;
  if (request?.status === 'awaiting_payment' && returnedFromCheckout) {
    state = (
      <>
        {/* While the provider's confirmation is on its way, look again every few seconds. */}
        <meta httpEquiv="refresh" content="3" />
        <Notice tone="calm" mark="…" title="Waiting for the payment to be confirmed">
          Your request goes to our coordinators as soon as the payment provider confirms it; this page refreshes by itself.
        </Notice>
      </>
    );
  } else if (request?.status === 'paid') {
    const started = request.inspectionStatus === 'on_site' || request.inspectionStatus === 'in_review';
    state = (
      <Notice tone="good" mark="✓" title="Re-inspection paid">
        <p>
          Paid {formatMoney(request.amountMinor, request.currency)} on {formatDate(request.paidAt)}.{' '}
          {request.inspectionStatus === 'booked' && request.scheduledAt
            ? `Visit booked for ${formatDateTime(request.scheduledAt)} UTC.`
            : started
              ? 'The inspector has started the visit.'
              : 'Waiting for a coordinator to book the visit.'}
        </p>
        <p className="mt-1">
          {started
            ? 'The visit has started, so the fee is no longer refunded automatically if the machine sells.'
            : 'If the machine sells or is withdrawn before the visit starts, the fee is refunded to you automatically.'}
        </p>
      </Notice>
    );
  } else if (request?.status === 'delivered') {
    state = (
      <Notice tone="good" mark="✓" title="New report delivered">
        The re-inspection report was released on {formatDate(request.deliveredAt)} and is in your downloads at no further charge.
      </Notice>
    );
  } else if (request?.status === 'refund_due') {
    state = (
      <Notice tone="worn" mark="↩" title="Refund under way">
        <p>{request.cancelReason}</p>
        <p className="mt-1">The payment provider has not confirmed the refund yet; we keep trying and a coordinator is watching it.</p>
      </Notice>
    );
  } else if (request?.status === 'refunded') {
    state = (
      <Notice tone="worn" mark="↩" title="Re-inspection refunded">
        <p>
          {formatMoney(request.amountMinor, request.currency)} refunded on {formatDate(request.refundedAt)}.
        </p>
        {request.cancelReason ? <p className="mt-1">{request.cancelReason}</p> : null}
      </Notice>
    );
  }

  // Once the machine is off the market there is nothing to offer; a request already made still shows where it stands.
  const showsOffer =
    offer.open &&
    listingStatus === 'listed' &&
    !(request?.status === 'awaiting_payment' && returnedFromCheckout) &&
    (!request || request.status === 'expired' || request.status === 'awaiting_payment' || request.status === 'refunded');
  if (!state && !showsOffer) return null;
  return (
    <section aria-labelledby="reinspection-heading" className="mt-6 rounded-card border border-line bg-paper-raised p-5 shadow-sm">
      <h2 id="reinspection-heading" className="text-lg font-semibold">
        Re-inspection
      </h2>
      {state ? <div className="mt-3">{state}</div> : null}
      {showsOffer ? (
        <div className="mt-3">
          <p className="text-ink-soft">
            {offer.stale
              ? 'This report is stale. You can ask for the machine to be inspected again.'
              : `This report stays current for ${offer.daysLeft} more ${offer.daysLeft === 1 ? 'day' : 'days'}. You can ask for the machine to be inspected again now.`}
          </p>
          <ol className="mt-3 list-decimal space-y-1 pl-5 text-sm">
            {WHAT_HAPPENS.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ol>
          <div className="mt-4">
            {mayRequest ? (
              <ReinspectionButton reportId={reportId} price={formatMoney(fee.amountMinor, fee.currency)} />
            ) : underWay ? (
              <p className="text-ink-soft">A new inspection of this machine is already under way; its report will be offered when released.</p>
            ) : (
              <p className="text-ink-soft">The inspection fee for this size of machine is not set yet. Please look again later.</p>
            )}
          </div>
        </div>
      ) : null}
    </section>
  );
}
