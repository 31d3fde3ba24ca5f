import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  paidPaymentIntentId,
  startPaymentsHarness,
  TEST_WEBHOOK_SECRET,
  type PaymentsHarness,
} from './test-support/payments-harness';

describe('refunds API', () => {
  let harness: PaymentsHarness;
  beforeAll(async () => {
    harness = await startPaymentsHarness();
  });
  afterAll(() => harness.close());

  const paidIntentId = () => paidPaymentIntentId(harness.stripe);

  it('refunds the whole payment by default and can be retrieved', async () => {
    const paymentIntent = await paidIntentId();
    const refund = await harness.stripe.refunds.create({
      payment_intent: paymentIntent,
      reason: 'requested_by_customer',
      metadata: { reportId: '12' },
    });

    expect(refund).toMatchObject({
      object: 'refund',
      status: 'succeeded',
      amount: 4_900,
      currency: 'eur',
      payment_intent: paymentIntent,
      reason: 'requested_by_customer',
      metadata: { reportId: '12' },
    });
    expect(refund.id).toMatch(/^re_/);
    expect(await harness.stripe.refunds.retrieve(refund.id)).toEqual(refund);
  });

  it('takes partial refunds up to the amount paid', async () => {
    const paymentIntent = await paidIntentId();
    await harness.stripe.refunds.create({ payment_intent: paymentIntent, amount: 900 });
    const rest = await harness.stripe.refunds.create({ payment_intent: paymentIntent, amount: 4_000 });
    expect(rest.amount).toBe(4_000);
    const charge = await harness.stripe.charges.retrieve(String(rest.charge));
    expect(charge).toMatchObject({ amount_refunded: 4_900, refunded: true });
  });

  it('rejects a refund larger than what is left, in Stripe’s error shape', async () => {
    const paymentIntent = await paidIntentId();
    await harness.stripe.refunds.create({ payment_intent: paymentIntent, amount: 4_000 });
    const overRefund = harness.stripe.refunds.create({ payment_intent: paymentIntent, amount: 1_000 });

    await expect(overRefund).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    await expect(overRefund).rejects.toMatchObject({
      statusCode: 400,
      code: 'amount_too_large',
      param: 'amount',
      message: 'Refund amount (€10.00) is greater than unrefunded amount on charge (€9.00)',
    });
  });

  it('rejects refunding a fully refunded payment', async () => {
    const paymentIntent = await paidIntentId();
    await harness.stripe.refunds.create({ payment_intent: paymentIntent });
    await expect(harness.stripe.refunds.create({ payment_intent: paymentIntent })).rejects.toMatchObject({
      code: 'charge_already_refunded',
    });
  });

  it('rejects a refund for an unknown payment intent', async () => {
    await expect(harness.stripe.refunds.create({ payment_intent: 'pi_unknown' })).rejects.toMatchObject({
      statusCode: 404,
      code: 'resource_missing',
      param: 'payment_intent',
    });
  });

  it('announces the refund with a signed charge.refunded event', async () => {
    const paymentIntent = await paidIntentId();
    const refund = await harness.stripe.refunds.create({ payment_intent: paymentIntent, amount: 1_500 });

    const isRefundNews = (body: string) =>
      body.includes(paymentIntent) && /"type": "(charge\.refunded|refund\.created)"/.test(body);
    const deliveries = await harness.receiver.waitFor((webhook) => isRefundNews(webhook.body), 2);
    const events = deliveries.map((delivery) => harness.stripe.webhooks.constructEvent(delivery.body, delivery.signature ?? '', TEST_WEBHOOK_SECRET));
    const chargeRefunded = events.find((event) => event.type === 'charge.refunded') as Stripe.ChargeRefundedEvent;
    const refundCreated = events.find((event) => event.type === 'refund.created') as Stripe.RefundCreatedEvent;

    expect(chargeRefunded.data.object).toMatchObject({ id: refund.charge, amount_refunded: 1_500, refunded: false, payment_intent: paymentIntent });
    expect(chargeRefunded.data.previous_attributes).toEqual({ amount_refunded: 0, refunded: false });
    expect(refundCreated.data.object).toMatchObject({ id: refund.id, amount: 1_500 });
  });
});
