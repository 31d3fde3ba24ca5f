import 'server-only';
import type Stripe from 'stripe';
import type { PaymentProvider } from './apply-payment-event';
import { stripeClient } from './stripe-client';

/** The provider calls the webhook handling makes, through the SDK. */
export function stripePaymentProvider(stripe: Stripe = stripeClient()): PaymentProvider {
  return {
    async orderIdOfPayment(paymentIntentId) {
      const intent = await stripe.paymentIntents.retrieve(paymentIntentId);
      const id = Number(intent.metadata?.orderId);
      return Number.isInteger(id) && id > 0 ? id : null;
    },
    async refundPayment({ orderId, paymentIntentId, reason }) {
      const refund = await stripe.refunds.create(
        { payment_intent: paymentIntentId, reason: 'requested_by_customer', metadata: { orderId: String(orderId), note: reason.slice(0, 450) } },
        // One refund per order, however often this is retried.
        { idempotencyKey: `waygrade-refund-order-${orderId}` },
      );
      return { refundId: refund.id };
    },
  };
}
