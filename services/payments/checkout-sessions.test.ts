import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { payOnCheckoutPage, reportPurchaseParams, startPaymentsHarness, type PaymentsHarness } from './test-support/payments-harness';

describe('checkout sessions API', () => {
  let harness: PaymentsHarness;
  beforeAll(async () => {
    harness = await startPaymentsHarness();
  });
  afterAll(() => harness.close());

  it('creates an open, unpaid session with a checkout page on localhost', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    const port = new URL(harness.standIn.url).port;

    expect(session).toMatchObject({
      object: 'checkout.session',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: 4_900,
      currency: 'eur',
      payment_intent: null,
      customer_email: 'buyer@example.test',
      client_reference_id: 'report-12',
      metadata: { reportId: '12', buyerId: '7' },
      livemode: false,
      url: `http://localhost:${port}/checkout/${session.id}`,
    });
    expect(session.id).toMatch(/^cs_test_[A-Za-z0-9]+$/);
    expect(session.created).toBeCloseTo(Date.now() / 1000, -1);
    expect(session.expires_at - session.created).toBe(24 * 60 * 60);
  });

  it('totals several line items with quantities', async () => {
    const session = await harness.stripe.checkout.sessions.create(
      reportPurchaseParams({
        line_items: [
          { price_data: { currency: 'eur', unit_amount: 4_900, product_data: { name: 'Report' } }, quantity: 1 },
          { price_data: { currency: 'eur', unit_amount: 1_250, product_data: { name: 'Photo set' } }, quantity: 2 },
        ],
      }),
    );
    expect(session.amount_total).toBe(7_400);
    const items = await harness.stripe.checkout.sessions.listLineItems(session.id);
    expect(items.data.map((item) => [item.description, item.quantity, item.amount_total])).toEqual([
      ['Report', 1, 4_900],
      ['Photo set', 2, 2_500],
    ]);
  });

  it('retrieves a session and expands its payment intent once paid', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    const unpaid = await harness.stripe.checkout.sessions.retrieve(session.id, { expand: ['payment_intent'] });
    expect(unpaid.payment_intent).toBeNull();

    await payOnCheckoutPage(session);
    const paid = await harness.stripe.checkout.sessions.retrieve(session.id, { expand: ['payment_intent'] });
    const intent = paid.payment_intent as Stripe.PaymentIntent;
    expect(paid.status).toBe('complete');
    expect(intent).toMatchObject({ object: 'payment_intent', status: 'succeeded', amount_received: 4_900, currency: 'eur' });
    expect(intent.id).toMatch(/^pi_/);
  });

  it('takes a custom expires_at within Stripe’s 30 minute to 24 hour window', async () => {
    const expiresAt = Math.floor(Date.now() / 1000) + 45 * 60;
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams({ expires_at: expiresAt }));
    expect(session.expires_at).toBe(expiresAt);

    const tooSoon = harness.stripe.checkout.sessions.create(
      reportPurchaseParams({ expires_at: Math.floor(Date.now() / 1000) + 60 }),
    );
    await expect(tooSoon).rejects.toMatchObject({ type: 'StripeInvalidRequestError', param: 'expires_at' });
  });

  it('expires an open session and refuses to expire it again', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    const expired = await harness.stripe.checkout.sessions.expire(session.id);
    expect(expired).toMatchObject({ id: session.id, status: 'expired', payment_status: 'unpaid', url: null });

    await expect(harness.stripe.checkout.sessions.expire(session.id)).rejects.toMatchObject({
      type: 'StripeInvalidRequestError',
      statusCode: 400,
    });
  });

  it('answers an unknown session with resource_missing', async () => {
    await expect(harness.stripe.checkout.sessions.retrieve('cs_test_doesnotexist')).rejects.toMatchObject({
      type: 'StripeInvalidRequestError',
      statusCode: 404,
      code: 'resource_missing',
      message: "No such checkout.session: 'cs_test_doesnotexist'",
    });
  });

  it.each([
    ['an unknown parameter', { colour: 'blue' }, 'colour', 'Received unknown parameter: colour'],
    ['a missing success_url', { success_url: undefined }, 'success_url', 'Missing required param: success_url.'],
    ['an unknown currency', {
      line_items: [{ price_data: { currency: 'zzz', unit_amount: 100, product_data: { name: 'Report' } }, quantity: 1 }],
    }, 'line_items[0][price_data][currency]', undefined],
    ['a negative quantity', {
      line_items: [{ price_data: { currency: 'eur', unit_amount: 100, product_data: { name: 'Report' } }, quantity: -1 }],
    }, 'line_items[0][quantity]', undefined],
  ])('rejects %s naming the parameter', async (_case, overrides, param, message) => {
    const request = harness.stripe.checkout.sessions.create({
      ...reportPurchaseParams(),
      ...overrides,
    } as Stripe.Checkout.SessionCreateParams);
    await expect(request).rejects.toMatchObject({ type: 'StripeInvalidRequestError', statusCode: 400, param });
    if (message) await expect(request).rejects.toThrow(message);
  });
});
