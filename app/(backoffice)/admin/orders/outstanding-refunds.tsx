import { listOutstandingReinspectionRefunds } from '@/db/queries/reinspection-requests';
import { formatDateTime, formatMoney } from '@/lib/format';
import { receiptNumber } from '@/lib/payments/receipt-number';

/** Re-inspection refunds the provider has not accepted yet: retried by every app server, shown here so none is lost. */
export async function OutstandingRefunds() {
  const rows = await listOutstandingReinspectionRefunds();
  if (rows.length === 0) return null;
  return (
    <section aria-labelledby="outstanding-refunds-heading" className="mt-6 rounded-card border border-band-rebuild/40 bg-band-rebuild/5 p-5">
      <h2 id="outstanding-refunds-heading" className="flex items-center gap-2 text-lg font-semibold text-band-rebuild">
        <svg aria-hidden="true" width="18" height="18" viewBox="0 0 16 16">
          <path d="M8 1.8l6.6 12H1.4z" fill="currentColor" />
        </svg>
        Re-inspection refunds not yet through ({rows.length})
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        Each is tried again automatically, a minute after a failure and then less often, up to once an hour. Refund the order below by hand if the
        provider keeps refusing.
      </p>
      <ul className="figures mt-3 divide-y divide-line">
        {rows.map((r) => (
          <li key={r.id} className="py-2">
            <span className="font-medium">{receiptNumber(r.orderId)}</span> · {r.maker} {r.model} · {r.requesterEmail} · {formatMoney(r.amountMinor, r.currency)}
            <span className="block text-sm text-ink-soft">
              {r.refundAttempts} failed {r.refundAttempts === 1 ? 'attempt' : 'attempts'}
              {r.lastRefundError ? ` · last error: ${r.lastRefundError}` : ''}
              {r.nextRefundAttemptAt ? ` · next try ${formatDateTime(r.nextRefundAttemptAt)} UTC` : ''}
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}
