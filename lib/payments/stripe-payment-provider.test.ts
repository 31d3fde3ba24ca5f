import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { paidPaymentIntentId, startPaymentsHarness, type PaymentsHarness } from '@/services/payments/test-support/payments-harness';
import { stripePaymentProvider } from './stripe-payment-provider';

// The refund call through the real SDK against the local payments stand-in, which replays a repeated
// Idempotency-Key as the hosted API does (Stripe API reference, "Idempotent requests").
describe('refunds through the payment provider', () => {
  let harness: PaymentsHarness;
  beforeAll(async () => {
    harness = await startPaymentsHarness();
  });
  afterAll(() => harness.close());

  const paidIntentId = () => paidPaymentIntentId(harness.stripe);

  it('refunds a payment once, however often the refund is asked for', async () => {
    const provider = stripePaymentProvider(harness.stripe);
    const paymentIntentId = await paidIntentId();
    const first = await provider.refundPayment({ orderId: 7, paymentIntentId, reason: 'Refunded by a coordinator' });
    const again = await provider.refundPayment({ orderId: 7, paymentIntentId, reason: 'Refunded by a coordinator' });
    // A second refund of the whole amount would be refused as more than was paid; the replay is not.
    expect(again.refundId).toBe(first.refundId);
  });

  it('refunds two payments that carry the same order number, as after the database was recreated', async () => {
    const provider = stripePaymentProvider(harness.stripe);
    const [earlier, later] = [await paidIntentId(), await paidIntentId()];
    const a = await provider.refundPayment({ orderId: 1, paymentIntentId: earlier, reason: 'Refunded by a coordinator' });
    const b = await provider.refundPayment({ orderId: 1, paymentIntentId: later, reason: 'Refunded by a coordinator' });
    expect(b.refundId).not.toBe(a.refundId);
    expect((await harness.stripe.refunds.retrieve(b.refundId)).payment_intent).toBe(later);
  });
});
