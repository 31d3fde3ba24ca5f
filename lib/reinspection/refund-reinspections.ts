import 'server-only';
import { and, eq, inArray } from 'drizzle-orm';
import { inspections, reinspectionRequests } from '@/db/schema';
import { lockOrderWithContext } from '@/db/queries/purchases';
import { BEFORE_VISIT_STATUSES, markReinspectionRequestRefunded } from '@/db/queries/reinspection-requests';
import type { Transaction } from '@/lib/auth/operation';
import type { PaymentProvider } from '@/lib/payments/apply-payment-event';
import { markOrderRefunded } from '@/lib/payments/order-transitions';
import { cancelVisitBeforeItStarts } from './cancel-visit';

/** Why paid re-inspections end before the visit, as the requester and the inspector read it. */
export const REINSPECTION_CANCEL_REASONS = {
  sold: 'The machine was sold before the re-inspection visit started, so the visit is cancelled and the fee refunded.',
  withdrawn: 'The machine was taken off the market before the re-inspection visit started, so the visit is cancelled and the fee refunded.',
  cancelled: 'The re-inspection visit was cancelled before it started, so the fee is refunded.',
} as const;

/** A failed refund is tried again after a minute, doubling up to an hour; coordinators see it meanwhile. */
export function refundRetryDelayMs(attemptsSoFar: number) {
  return Math.min(60_000 * 2 ** Math.max(0, attemptsSoFar - 1), 60 * 60_000);
}

export type RefundAttemptOutcome = 'refunded' | 'already-refunded' | 'failed' | 'not-due';

/**
 * One try at returning a request's fee, in the caller's transaction. The order is locked before the
 * request (the webhook's order), the provider's idempotency key makes a repeat return the same
 * refund, and a provider failure is recorded with the next attempt time instead of being thrown,
 * so the change that made the refund due still commits.
 */
export async function attemptReinspectionRefund(tx: Transaction, requestId: number, provider: PaymentProvider, now = new Date()): Promise<RefundAttemptOutcome> {
  const [probe] = await tx.select({ orderId: reinspectionRequests.orderId }).from(reinspectionRequests).where(eq(reinspectionRequests.id, requestId));
  if (!probe) return 'not-due';
  const ctx = await lockOrderWithContext(tx, probe.orderId);
  const [request] = await tx.select().from(reinspectionRequests).where(eq(reinspectionRequests.id, requestId)).for('update');
  if (!ctx || !request || request.status !== 'refund_due') return 'not-due';
  if (ctx.order.status === 'refunded') {
    await markReinspectionRequestRefunded(tx, ctx.order.id, ctx.order.refundedAt ?? now);
    return 'already-refunded';
  }
  const reason = request.cancelReason ?? REINSPECTION_CANCEL_REASONS.cancelled;
  const recordFailure = async (message: string) => {
    const attempts = request.refundAttempts + 1;
    await tx
      .update(reinspectionRequests)
      .set({ refundAttempts: attempts, lastRefundError: message.slice(0, 1000), nextRefundAttemptAt: new Date(now.getTime() + refundRetryDelayMs(attempts)) })
      .where(eq(reinspectionRequests.id, request.id));
    return 'failed' as const;
  };
  if (ctx.order.status !== 'paid' || !ctx.order.providerPaymentIntentId) {
    return recordFailure(`The order is ${ctx.order.status} with no payment on record at the provider; a coordinator must settle it.`);
  }
  let refundId: string;
  try {
    ({ refundId } = await provider.refundPayment({ orderId: ctx.order.id, paymentIntentId: ctx.order.providerPaymentIntentId, reason }));
  } catch (error) {
    console.error(`[reinspection] refund of order ${ctx.order.id} failed; will try again`, error);
    return recordFailure(error instanceof Error ? error.message : String(error));
  }
  // Also marks the request refunded and tells the requester.
  await markOrderRefunded(tx, ctx, { refundId, reason, at: now });
  return 'refunded';
}

export type BeforeVisitCancellation = { refundsDue: number; refunded: number; refundsRetrying: number; keptVisitStarted: number; inspectionsCancelled: number };

/**
 * Ends every paid re-inspection of a machine whose visit has not started: the requests owe their fee
 * back, the not-yet-started inspections they opened are cancelled with the inspector told, and each
 * refund is tried at once. Requests whose visit has started are kept: no automatic refund then.
 * Runs in the caller's transaction, after the caller has locked the machine row. Idempotent: a
 * second call finds nothing paid left to cancel.
 */
export async function cancelReinspectionsBeforeVisit(
  tx: Transaction,
  input: { machineId: number; reason: string; actorId: string; cancelledBy: string; onlyInspectionId?: number },
  provider: PaymentProvider,
  now = new Date(),
): Promise<BeforeVisitCancellation> {
  const paid = await tx
    .select({ id: reinspectionRequests.id, inspectionId: reinspectionRequests.inspectionId, inspectionStatus: inspections.status })
    .from(reinspectionRequests)
    .leftJoin(inspections, eq(inspections.id, reinspectionRequests.inspectionId))
    .where(
      and(
        eq(reinspectionRequests.machineId, input.machineId),
        eq(reinspectionRequests.status, 'paid'),
        input.onlyInspectionId ? eq(reinspectionRequests.inspectionId, input.onlyInspectionId) : undefined,
      ),
    )
    .for('update');
  const beforeVisit = paid.filter((r) => r.inspectionStatus === null || (BEFORE_VISIT_STATUSES as readonly string[]).includes(r.inspectionStatus));
  const summary: BeforeVisitCancellation = { refundsDue: beforeVisit.length, refunded: 0, refundsRetrying: 0, keptVisitStarted: paid.length - beforeVisit.length, inspectionsCancelled: 0 };
  if (beforeVisit.length === 0) return summary;
  await tx
    .update(reinspectionRequests)
    .set({ status: 'refund_due', cancelReason: input.reason, nextRefundAttemptAt: now })
    .where(inArray(reinspectionRequests.id, beforeVisit.map((r) => r.id)));

  const inspectionIds = [...new Set(beforeVisit.map((r) => r.inspectionId).filter((id): id is number => id !== null))];
  for (const inspectionId of inspectionIds) {
    if (await cancelVisitBeforeItStarts(tx, inspectionId, input)) summary.inspectionsCancelled += 1;
  }
  for (const request of beforeVisit) {
    const outcome = await attemptReinspectionRefund(tx, request.id, provider, now);
    if (outcome === 'refunded' || outcome === 'already-refunded') summary.refunded += 1;
    else if (outcome === 'failed') summary.refundsRetrying += 1;
  }
  return summary;
}
