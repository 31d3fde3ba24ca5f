import 'server-only';
import { eq } from 'drizzle-orm';
import { inspections, machines, orders, reinspectionRequests, users } from '@/db/schema';
import type { OrderWithContext } from '@/db/queries/purchases';
import { lockOpenInspectionOfMachine, lockReinspectionRequestByOrder } from '@/db/queries/reinspection-requests';
import type { Transaction } from '@/lib/auth/operation';
import { appLink } from '@/lib/mail/links';
import { enqueueEmail } from '@/lib/mail/outbox';
import type { PaymentProvider } from '@/lib/payments/apply-payment-event';
import { markOrderRefunded } from '@/lib/payments/order-transitions';
import { receiptNumber } from '@/lib/payments/receipt-number';
import { moveInspection } from '@/lib/workflow/status-events';

export const OFF_MARKET_REFUND_REASON = 'The machine left the market before your payment completed, so no visit will be made.';

export type ReinspectionPaymentOutcome = 'reinspection-queued' | 'refunded-machine-off-market' | 'unknown-order' | 'unchanged';

/**
 * A verified, paid checkout for a re-inspection, inside the webhook's transaction with the order
 * locked: the order is paid, and the machine gets a new inspection in the coordinators' queue (or
 * joins the one already under way). Locks run order → machine → request, the same order as a sale
 * takes after the machine, so the two cannot deadlock. A machine already sold or withdrawn is
 * refunded at once.
 */
export async function confirmReinspectionPayment(
  tx: Transaction,
  ctx: OrderWithContext,
  input: { paymentIntentId: string | null; provider: PaymentProvider; now: Date },
): Promise<ReinspectionPaymentOutcome> {
  const { order } = ctx;
  const [probe] = await tx.select({ machineId: reinspectionRequests.machineId }).from(reinspectionRequests).where(eq(reinspectionRequests.orderId, order.id));
  if (!probe) return 'unknown-order';
  const [machine] = await tx
    .select({ id: machines.id, listingStatus: machines.listingStatus })
    .from(machines)
    .where(eq(machines.id, probe.machineId))
    .for('update');
  const request = await lockReinspectionRequestByOrder(tx, order.id);
  if (!request || !machine) return 'unknown-order';
  if (request.status !== 'awaiting_payment' && request.status !== 'expired') return 'unchanged';

  if (machine.listingStatus !== 'listed') {
    if (!input.paymentIntentId) return 'unchanged';
    const { refundId } = await input.provider.refundPayment({ orderId: order.id, paymentIntentId: input.paymentIntentId, reason: OFF_MARKET_REFUND_REASON });
    await tx.update(orders).set({ paidAt: input.now }).where(eq(orders.id, order.id));
    await tx.update(reinspectionRequests).set({ paidAt: input.now, cancelReason: OFF_MARKET_REFUND_REASON }).where(eq(reinspectionRequests.id, request.id));
    await markOrderRefunded(tx, ctx, { paymentIntentId: input.paymentIntentId, refundId, reason: OFF_MARKET_REFUND_REASON, at: input.now });
    return 'refunded-machine-off-market';
  }

  await tx
    .update(orders)
    .set({ status: 'paid', paidAt: input.now, providerPaymentIntentId: input.paymentIntentId ?? order.providerPaymentIntentId })
    .where(eq(orders.id, order.id));
  const open = await lockOpenInspectionOfMachine(tx, machine.id);
  const inspectionId = open?.id ?? (await queueNewInspection(tx, { machineId: machine.id, previousInspectionId: ctx.report.inspectionId, order, requesterName: ctx.buyer.name ?? ctx.buyer.email }));
  await tx.update(reinspectionRequests).set({ status: 'paid', inspectionId, paidAt: input.now }).where(eq(reinspectionRequests.id, request.id));
  await enqueueEmail(tx, {
    to: ctx.buyer.email,
    template: 'reinspection-paid',
    data: {
      recipientName: ctx.buyer.name,
      receiptNumber: receiptNumber(order.id),
      machine: ctx.machine,
      amountMinor: order.amountMinor,
      currency: order.currency,
      paidAt: input.now,
      url: appLink(`/reports/${request.basedOnReportId}`),
    },
  });
  return 'reinspection-queued';
}

/** A new inspection of the same machine, requested by the payer, with the site details of the last visit. */
async function queueNewInspection(
  tx: Transaction,
  input: { machineId: number; previousInspectionId: number; order: OrderWithContext['order']; requesterName: string },
) {
  const [previous] = await tx
    .select({ siteAccessNotes: inspections.siteAccessNotes, siteContactName: inspections.siteContactName, siteContactPhone: inspections.siteContactPhone })
    .from(inspections)
    .where(eq(inspections.id, input.previousInspectionId));
  const [requester] = await tx.select({ role: users.role }).from(users).where(eq(users.id, input.order.buyerId));
  const [row] = await tx
    .insert(inspections)
    .values({
      machineId: input.machineId,
      requestedById: input.order.buyerId,
      status: 'requested',
      siteAccessNotes: previous?.siteAccessNotes ?? null,
      siteContactName: previous?.siteContactName ?? null,
      siteContactPhone: previous?.siteContactPhone ?? null,
      feeMinor: input.order.amountMinor,
      currency: input.order.currency,
    })
    .$returningId();
  const who = requester?.role === 'seller' ? 'the seller' : `${input.requesterName} (${requester?.role ?? 'buyer'})`;
  await moveInspection(tx, {
    inspectionId: row!.id,
    from: null,
    to: 'requested',
    actorId: input.order.buyerId,
    note: `Re-inspection requested and paid by ${who}. The fee is refunded automatically if the machine sells before the visit starts.`,
  });
  return row!.id;
}
