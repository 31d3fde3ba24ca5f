import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { listOrdersForAdmin } from '@/db/queries/purchases';
import { requirePageSession } from '@/lib/auth/session';
import { formatDateTime, formatMoney } from '@/lib/format';
import { receiptNumber } from '@/lib/payments/receipt-number';
import { can } from '@/lib/roles';
import { OutstandingRefunds } from './outstanding-refunds';
import { RefundForm } from './refund-form';

export const metadata: Metadata = { title: 'Report orders' };

const STATUS_WORDS = { pending: '… Awaiting payment', paid: '✓ Paid', refunded: '↩ Refunded', expired: '○ Not completed' } as const;

export default async function OrdersPage() {
  const user = await requirePageSession();
  if (!can(user.role, 'payments.refund')) notFound();
  const orders = await listOrdersForAdmin();
  return (
    <>
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">Coordinator</p>
      <h1 className="mt-1 text-3xl font-semibold">Report orders</h1>
      <p className="mt-2 max-w-2xl text-ink-soft">
        Every purchase of a report, newest first. A refund returns the fee through the payment provider, ends the buyer&apos;s access and tells
        the buyer by e-mail. Payments for reports withdrawn in the meantime are refunded automatically, and so are re-inspections of machines
        sold or withdrawn before the visit started.
      </p>
      <OutstandingRefunds />
      <Card className="mt-8">
        {orders.length === 0 ? (
          <EmptyState title="No orders yet" text="Orders appear here when a buyer starts paying for a report." />
        ) : (
          <div className="overflow-x-auto">
            <table className="figures w-full text-left">
              <thead className="text-sm text-ink-soft">
                <tr>
                  <th className="py-2 pr-4 font-medium">Receipt</th>
                  <th className="py-2 pr-4 font-medium">Buyer</th>
                  <th className="py-2 pr-4 font-medium">Report</th>
                  <th className="py-2 pr-4 text-right font-medium">Amount</th>
                  <th className="py-2 pr-4 font-medium">Status</th>
                  <th className="py-2 font-medium">Action</th>
                </tr>
              </thead>
              <tbody className="divide-y divide-line align-top">
                {orders.map((o) => (
                  <tr key={o.id}>
                    <td className="py-3 pr-4">
                      {receiptNumber(o.id)}
                      <span className="block text-sm text-ink-soft">{formatDateTime(o.createdAt)}</span>
                    </td>
                    <td className="py-3 pr-4">
                      {o.buyerName ?? '—'}
                      <span className="block text-sm text-ink-soft">{o.buyerEmail}</span>
                    </td>
                    <td className="py-3 pr-4">
                      {o.purpose === 'reinspection' ? `Re-inspection: ${o.maker} ${o.model} (from v${o.version})` : `${o.maker} ${o.model}, v${o.version}`}
                      {o.reportStatus === 'withdrawn' ? <span className="block text-sm text-band-worn">report withdrawn</span> : null}
                    </td>
                    <td className="py-3 pr-4 text-right">{formatMoney(o.amountMinor, o.currency)}</td>
                    <td className="py-3 pr-4">
                      {STATUS_WORDS[o.status]}
                      {o.refundReason ? <span className="block max-w-xs text-sm text-ink-soft">{o.refundReason}</span> : null}
                    </td>
                    <td className="py-3">{o.status === 'paid' ? <RefundForm orderId={o.id} receipt={receiptNumber(o.id)} /> : null}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </Card>
    </>
  );
}
