import type { Metadata } from 'next';
import Link from 'next/link';
import { Card } from '@/components/ui/card';
import { ConditionBadge } from '@/components/ui/condition-badge';
import { EmptyState } from '@/components/ui/empty-state';
import { listBuyerOrders, listDownloadableReports, type OrderStatus } from '@/db/queries/purchases';
import { requirePageSession } from '@/lib/auth/session';
import { formatDate, formatMoney } from '@/lib/format';
import { receiptNumber } from '@/lib/payments/receipt-number';
import { DownloadLink } from './download-link';

export const metadata: Metadata = { title: 'Your reports' };

const ORDER_STATUS_WORDS: Record<OrderStatus, { word: string; mark: string; className: string }> = {
  pending: { word: 'Awaiting payment', mark: '…', className: 'text-ink-soft' },
  paid: { word: 'Paid', mark: '✓', className: 'text-band-true' },
  refunded: { word: 'Refunded', mark: '↩', className: 'text-band-worn' },
  expired: { word: 'Not completed', mark: '○', className: 'text-ink-faint' },
};

export default async function PurchasesPage({ searchParams }: { searchParams: Promise<{ checkout?: string }> }) {
  const user = await requirePageSession();
  const { checkout } = await searchParams;
  const [orders, downloads] = await Promise.all([listBuyerOrders(user.id), listDownloadableReports(user.id)]);
  const returning = checkout ? orders.find((o) => o.providerCheckoutSessionId === checkout) : undefined;
  const waiting = returning?.status === 'pending';

  return (
    <>
      {/* While the provider's confirmation is on its way, look again every few seconds. */}
      {waiting ? <meta httpEquiv="refresh" content="3" /> : null}
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">Purchases and downloads</p>
      <h1 className="mt-1 text-3xl font-semibold">Your reports</h1>
      {returning ? (
        <p
          role="status"
          className={`mt-6 rounded-lg border px-4 py-3 ${waiting ? 'border-line-strong bg-paper-sunken' : 'border-band-true/40 bg-band-true/10 text-band-true'}`}
        >
          {waiting
            ? 'Thank you. We are waiting for the payment provider to confirm your payment; this page refreshes by itself.'
            : returning.status === 'paid' && returning.purpose === 'reinspection'
              ? `Payment confirmed. The re-inspection of the ${returning.maker} ${returning.model} is with our coordinators, and a receipt is on its way by e-mail.`
              : returning.status === 'paid'
              ? `Payment confirmed. The ${returning.maker} ${returning.model} report is ready below, and a receipt is on its way by e-mail.`
              : `This payment is ${ORDER_STATUS_WORDS[returning.status].word.toLowerCase()}.`}
        </p>
      ) : null}

      <section aria-labelledby="downloads-heading" className="mt-8">
        <h2 id="downloads-heading" className="text-xl font-semibold">
          Downloads
        </h2>
        {downloads.length === 0 ? (
          <div className="mt-3">
            <EmptyState title="No reports yet" text="Reports you buy, and reports on your own machines, are listed here for download." />
          </div>
        ) : (
          <ul className="mt-3 divide-y divide-line rounded-card border border-line bg-paper-raised">
            {downloads.map((d) => (
              <li key={d.reportId} className="flex flex-wrap items-center justify-between gap-3 px-5 py-4">
                <div>
                  <p className="font-medium">
                    {d.maker} {d.model}
                    {d.serialNumber ? <span className="text-ink-soft">, serial {d.serialNumber}</span> : null}
                  </p>
                  <p className="figures text-sm text-ink-soft">
                    Version {d.version} · released {formatDate(d.releasedAt)} · {d.reason === 'owner' ? 'your machine' : d.reason === 'staff' ? 'staff access' : 'bought'}
                    {d.supersededById ? ' · replaced by a newer version' : ''}
                    {d.status === 'withdrawn' ? ' · withdrawn' : ''}
                  </p>
                </div>
                <div className="flex items-center gap-3">
                  <ConditionBadge grade={d.overallCondition} provisional={d.overallProvisional} />
                  <DownloadLink reportId={d.reportId} label={`Download v${d.version}`} quiet={Boolean(d.supersededById)} />
                </div>
              </li>
            ))}
          </ul>
        )}
      </section>

      <Card title="Payments" className="mt-8">
        {orders.length === 0 ? (
          <EmptyState title="No payments yet" text="Browse the inspected machines and buy a report to see it here." />
        ) : (
          <div className="overflow-x-auto">
            <table className="figures w-full text-left">
              <thead className="text-sm text-ink-soft">
                <tr>
                  <th className="py-2 pr-4 font-medium">Receipt</th>
                  <th className="py-2 pr-4 font-medium">Report</th>
                  <th className="py-2 pr-4 text-right font-medium">Amount</th>
                  <th className="py-2 pr-4 font-medium">Status</th>
                  <th className="py-2 font-medium">Date</th>
                </tr>
              </thead>
              <tbody className="divide-y divide-line">
                {orders.map((o) => {
                  const status = ORDER_STATUS_WORDS[o.status];
                  return (
                    <tr key={o.id}>
                      <td className="py-2 pr-4">{receiptNumber(o.id)}</td>
                      <td className="py-2 pr-4">
                        <Link href={`/reports/${o.reportId}`} className="hover:text-copper">
                          {o.purpose === 'reinspection' ? `Re-inspection: ${o.maker} ${o.model}` : `${o.maker} ${o.model}, v${o.version}`}
                        </Link>
                      </td>
                      <td className="py-2 pr-4 text-right">{formatMoney(o.amountMinor, o.currency)}</td>
                      <td className={`py-2 pr-4 font-medium ${status.className}`}>
                        <span aria-hidden="true">{status.mark}</span> {status.word}
                        {o.status === 'refunded' && o.refundReason ? <span className="block text-sm font-normal text-ink-soft">{o.refundReason}</span> : null}
                      </td>
                      <td className="py-2">{formatDate(o.refundedAt ?? o.paidAt ?? o.createdAt)}</td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        )}
      </Card>
    </>
  );
}
