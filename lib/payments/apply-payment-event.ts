import 'server-only';
import type Stripe from 'stripe';
import { and, eq } from 'drizzle-orm';
import { orders, paymentEvents, reinspectionRequests } from '@/db/schema';
import { findOrderBuyer, findOrderIdByPaymentIntent, lockBuyer, lockOrderWithContext } from '@/db/queries/purchases';
import { hasReportAccess } from '@/db/queries/report-access';
import type { Transaction } from '@/lib/auth/operation';
import { confirmReinspectionPayment, type ReinspectionPaymentOutcome } from '@/lib/reinspection/confirm-reinspection-payment';
import { markOrderPaid, markOrderRefunded } from './order-transitions';

/** What the app needs from the provider while handling an event; the SDK in production, fakes in tests. */
export interface PaymentProvider {
  /** The order id written into the payment's metadata at checkout. */
  orderIdOfPayment(paymentIntentId: string): Promise<number | null>;
  /** Refunds a payment in full; the same order never causes two refunds. */
  refundPayment(input: { orderId: number; paymentIntentId: string; reason: string }): Promise<{ refundId: string }>;
}

export type PaymentEventOutcome =
  | 'duplicate'
  | 'granted'
  | 'refunded'
  | 'refunded-report-withdrawn'
  | 'refunded-already-bought'
  | 'expired'
  | 'unchanged'
  | 'unknown-order'
  | 'ignored'
  | ReinspectionPaymentOutcome;

export const WITHDRAWN_REPORT_REFUND_REASON = 'The report was withdrawn before your payment completed, so it could not be delivered.';
export const PROVIDER_REFUND_REASON = 'Refunded by Waygrade.';
export const ALREADY_BOUGHT_REFUND_REASON = 'You had already paid for this report, so this second payment was refunded in full. You keep your access to the report.';

/** The fields of a provider event that are read here; `type` stays a string so unknown kinds pass. */
export type PaymentEventInput = { id: string; type: string; created: number; data: { object: unknown } };

function orderIdFrom(value: string | null | undefined): number | null {
  const id = Number(value);
  return Number.isInteger(id) && id > 0 ? id : null;
}

function paymentIntentIdOf(value: string | { id: string } | null | undefined) {
  return typeof value === 'string' ? value : (value?.id ?? null);
}

/**
 * Applies one verified provider event inside the caller's transaction. The event id is recorded
 * first: a second delivery finds it and changes nothing, and a concurrent one waits on the row
 * lock until this transaction ends. Orders only move forward (pending → paid → refunded, or
 * pending → expired), so events arriving late or out of order cannot undo a refund.
 */
export async function applyPaymentEvent(tx: Transaction, event: PaymentEventInput, provider: PaymentProvider, now = new Date()): Promise<{ outcome: PaymentEventOutcome; orderId: number | null }> {
  const [inserted] = await tx
    .insert(paymentEvents)
    .ignore()
    .values({ providerEventId: event.id, type: event.type, providerCreatedAt: new Date(event.created * 1000) });
  if (inserted.affectedRows === 0) return { outcome: 'duplicate', orderId: null };

  switch (event.type) {
    case 'checkout.session.completed':
      return sessionCompleted(tx, event.data.object as Stripe.Checkout.Session, provider, now);
    case 'checkout.session.expired':
      return sessionExpired(tx, event.data.object as Stripe.Checkout.Session);
    case 'charge.refunded':
      return chargeRefunded(tx, event.data.object as Stripe.Charge, provider, now);
    default:
      return { outcome: 'ignored', orderId: null };
  }
}

async function sessionCompleted(tx: Transaction, session: Stripe.Checkout.Session, provider: PaymentProvider, now: Date) {
  const orderId = orderIdFrom(session.client_reference_id ?? session.metadata?.orderId);
  // The buyer first, then the order, the order starting a checkout takes them in: one buyer's two
  // payments take turns, and the second sees the grant the first wrote.
  const buyerId = orderId ? await findOrderBuyer(tx, orderId) : null;
  if (buyerId) await lockBuyer(tx, buyerId);
  const ctx = orderId ? await lockOrderWithContext(tx, orderId) : null;
  if (!ctx || ctx.order.providerCheckoutSessionId !== session.id) return { outcome: 'unknown-order' as const, orderId };
  // Delayed payment methods complete the session before the money arrives; only paid counts.
  if (session.payment_status !== 'paid') return { outcome: 'unchanged' as const, orderId };
  const paymentIntentId = paymentIntentIdOf(session.payment_intent);
  const { order } = ctx;
  if (order.status === 'paid' || order.status === 'refunded') {
    if (paymentIntentId && !order.providerPaymentIntentId) {
      await tx.update(orders).set({ providerPaymentIntentId: paymentIntentId }).where(eq(orders.id, order.id));
    }
    return { outcome: 'unchanged' as const, orderId };
  }
  // A re-inspection pays for a visit: the order's report is only the one it was requested from.
  if (order.purpose === 'reinspection') {
    return { outcome: await confirmReinspectionPayment(tx, ctx, { paymentIntentId, provider, now }), orderId };
  }
  if (ctx.report.status === 'withdrawn') {
    if (!paymentIntentId) return { outcome: 'unchanged' as const, orderId };
    const { refundId } = await provider.refundPayment({ orderId: order.id, paymentIntentId, reason: WITHDRAWN_REPORT_REFUND_REASON });
    await tx.update(orders).set({ paidAt: now }).where(eq(orders.id, order.id));
    await markOrderRefunded(tx, ctx, { paymentIntentId, refundId, reason: WITHDRAWN_REPORT_REFUND_REASON, at: now });
    return { outcome: 'refunded-report-withdrawn' as const, orderId };
  }
  // A second payment for a report the buyer already has (two pages paid, or a page paid after the
  // other): the money goes back at once and the buyer keeps the one grant.
  if (await hasReportAccess(tx, order.buyerId, order.reportId, { locking: true })) {
    if (!paymentIntentId) return { outcome: 'unchanged' as const, orderId };
    // Keyed by the provider's payment id, so a retried event cannot refund twice.
    const { refundId } = await provider.refundPayment({ orderId: order.id, paymentIntentId, reason: ALREADY_BOUGHT_REFUND_REASON });
    await tx.update(orders).set({ paidAt: now }).where(eq(orders.id, order.id));
    await markOrderRefunded(tx, ctx, { paymentIntentId, refundId, reason: ALREADY_BOUGHT_REFUND_REASON, at: now });
    return { outcome: 'refunded-already-bought' as const, orderId };
  }
  await markOrderPaid(tx, ctx, { paymentIntentId, at: now });
  return { outcome: 'granted' as const, orderId };
}

async function sessionExpired(tx: Transaction, session: Stripe.Checkout.Session) {
  const orderId = orderIdFrom(session.client_reference_id ?? session.metadata?.orderId);
  const ctx = orderId ? await lockOrderWithContext(tx, orderId) : null;
  if (!ctx || ctx.order.providerCheckoutSessionId !== session.id) return { outcome: 'unknown-order' as const, orderId };
  if (ctx.order.status !== 'pending') return { outcome: 'unchanged' as const, orderId };
  await tx.update(orders).set({ status: 'expired' }).where(eq(orders.id, ctx.order.id));
  if (ctx.order.purpose === 'reinspection') {
    await tx.update(reinspectionRequests).set({ status: 'expired' }).where(and(eq(reinspectionRequests.orderId, ctx.order.id), eq(reinspectionRequests.status, 'awaiting_payment')));
  }
  return { outcome: 'expired' as const, orderId };
}

async function chargeRefunded(tx: Transaction, charge: Stripe.Charge, provider: PaymentProvider, now: Date) {
  const paymentIntentId = paymentIntentIdOf(charge.payment_intent);
  if (!paymentIntentId) return { outcome: 'unknown-order' as const, orderId: null };
  // Partial refunds are not something Waygrade issues; access stays until the whole fee is back.
  if (!charge.refunded) return { outcome: 'unchanged' as const, orderId: null };
  // A refund can arrive before the completion event: then only the payment's metadata names the order.
  const orderId = (await findOrderIdByPaymentIntent(tx, paymentIntentId)) ?? (await provider.orderIdOfPayment(paymentIntentId));
  const ctx = orderId ? await lockOrderWithContext(tx, orderId) : null;
  if (!ctx) return { outcome: 'unknown-order' as const, orderId };
  if (ctx.order.status === 'refunded') return { outcome: 'unchanged' as const, orderId };
  await markOrderRefunded(tx, ctx, { paymentIntentId, reason: ctx.order.refundReason ?? PROVIDER_REFUND_REASON, at: now });
  return { outcome: 'refunded' as const, orderId };
}
