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
        // One refund per payment, however often or from wherever it is retried. The payment's id is the
        // provider's own, so the key cannot meet another payment's after our database is recreated.
        { idempotencyKey: `waygrade-refund-${paymentIntentId}` },
      );
      return { refundId: refund.id };
    },
  };
}
