import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import { orders, reinspectionRequests, reportAccessGrants } from '@/db/schema';
import type { OrderWithContext } from '@/db/queries/purchases';
import { markReinspectionRequestRefunded } from '@/db/queries/reinspection-requests';
import type { Transaction } from '@/lib/auth/operation';
import { appLink } from '@/lib/mail/links';
import { enqueueEmail } from '@/lib/mail/outbox';
import { cancelVisitBeforeItStarts } from '@/lib/reinspection/cancel-visit';
import { receiptNumber } from './receipt-number';

/**
 * The two ways an order's money moves, each with its grant change and its e-mail in the caller's
 * transaction: the buyer is told only if the change commits.
 */

export async function markOrderPaid(tx: Transaction, ctx: OrderWithContext, input: { paymentIntentId: string | null; at: Date }) {
  const { order } = ctx;
  await tx
    .update(orders)
    .set({ status: 'paid', paidAt: input.at, providerPaymentIntentId: input.paymentIntentId ?? order.providerPaymentIntentId })
    .where(eq(orders.id, order.id));
  const [existing] = await tx
    .select({ id: reportAccessGrants.id })
    .from(reportAccessGrants)
    .where(and(eq(reportAccessGrants.orderId, order.id), isNull(reportAccessGrants.revokedAt)))
    .limit(1);
  if (!existing) {
    await tx.insert(reportAccessGrants).values({ reportId: order.reportId, userId: order.buyerId, reason: 'purchase', orderId: order.id, grantedAt: input.at });
  }
  await enqueueEmail(tx, {
    to: ctx.buyer.email,
    template: 'payment-receipt',
    data: {
      recipientName: ctx.buyer.name,
      receiptNumber: receiptNumber(order.id),
      machine: ctx.machine,
      reportCode: ctx.report.verificationCode,
      amountMinor: order.amountMinor,
      currency: order.currency,
      paidAt: input.at,
      url: appLink('/purchases'),
    },
  });
}

export async function markOrderRefunded(
  tx: Transaction,
  ctx: OrderWithContext,
  input: { paymentIntentId?: string | null; refundId?: string | null; reason: string; at: Date; by?: { id: string; name: string } },
) {
  const { order } = ctx;
  await tx
    .update(orders)
    .set({
      status: 'refunded',
      refundedAt: input.at,
      refundReason: input.reason,
      providerPaymentIntentId: input.paymentIntentId ?? order.providerPaymentIntentId,
      providerRefundId: input.refundId ?? order.providerRefundId,
    })
    .where(eq(orders.id, order.id));
  await tx
    .update(reportAccessGrants)
    .set({ revokedAt: input.at })
    .where(and(eq(reportAccessGrants.orderId, order.id), isNull(reportAccessGrants.revokedAt)));
  const reinspection = order.purpose === 'reinspection';
  if (reinspection) {
    await markReinspectionRequestRefunded(tx, order.id, input.at);
    // The fee paid for a visit: without it the visit does not happen, whoever refunded it.
    const [request] = await tx
      .select({ inspectionId: reinspectionRequests.inspectionId, machineId: reinspectionRequests.machineId })
      .from(reinspectionRequests)
      .where(eq(reinspectionRequests.orderId, order.id));
    if (request?.inspectionId) {
      await cancelVisitBeforeItStarts(tx, request.inspectionId, {
        machineId: request.machineId,
        reason: `The re-inspection fee was refunded before the visit started, so the visit is cancelled. Reason for the refund: ${input.reason}`,
        actorId: input.by?.id ?? null,
        cancelledBy: input.by?.name ?? 'Waygrade',
      });
    }
  }
  await enqueueEmail(tx, {
    to: ctx.buyer.email,
    template: 'refund',
    data: {
      recipientName: ctx.buyer.name,
      receiptNumber: receiptNumber(order.id),
      machine: ctx.machine,
      // A re-inspection fee pays for a visit, not for the report it was requested from.
      reportCode: reinspection ? null : ctx.report.verificationCode,
      amountMinor: order.amountMinor,
      currency: order.currency,
      refundedAt: input.at,
      reason: input.reason,
    },
  });
}
