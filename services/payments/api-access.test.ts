import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { reportPurchaseParams, startPaymentsHarness, stripeClientFor, type PaymentsHarness } from './test-support/payments-harness';

describe('payments API access', () => {
  let harness: PaymentsHarness;
  beforeAll(async () => {
    harness = await startPaymentsHarness();
  });
  afterAll(() => harness.close());

  it('rejects a key that is not a test secret key with an authentication error', async () => {
    const liveKeyClient = stripeClientFor(harness.standIn.url, 'sk_live_51NotAllowedHere0000');
    const request = liveKeyClient.checkout.sessions.create(reportPurchaseParams());
    await expect(request).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    await expect(request).rejects.toMatchObject({ statusCode: 401, message: expect.stringMatching(/^Invalid API Key provided: sk_live_\*+0000$/) });
  });

  it('answers a request without a key with 401 and Stripe’s error body', async () => {
    const response = await fetch(`${harness.standIn.url}/v1/checkout/sessions/cs_test_x`);
    const body = (await response.json()) as { error: { type: string; message: string } };
    expect(response.status).toBe(401);
    expect(body.error.type).toBe('invalid_request_error');
    expect(body.error.message).toMatch(/^You did not provide an API key/);
  });

  it('accepts the key as the user name of basic auth, as curl -u sends it', async () => {
    const response = await fetch(`${harness.standIn.url}/v1/checkout/sessions/cs_test_x`, {
      headers: { Authorization: `Basic ${Buffer.from('sk_test_waygrade:').toString('base64')}` },
    });
    expect(response.status).toBe(404);
  });

  it('returns the same session for a repeated Idempotency-Key', async () => {
    const first = await harness.stripe.checkout.sessions.create(reportPurchaseParams(), { idempotencyKey: 'report-12-buyer-7' });
    const again = await harness.stripe.checkout.sessions.create(reportPurchaseParams(), { idempotencyKey: 'report-12-buyer-7' });
    const other = await harness.stripe.checkout.sessions.create(reportPurchaseParams(), { idempotencyKey: 'report-12-buyer-8' });

    expect(again).toEqual(first);
    expect(again.lastResponse.headers['idempotent-replayed']).toBe('true');
    expect(other.id).not.toBe(first.id);
  });

  it('rejects an Idempotency-Key reused with different parameters', async () => {
    await harness.stripe.checkout.sessions.create(reportPurchaseParams(), { idempotencyKey: 'report-13' });
    const changed = harness.stripe.checkout.sessions.create(reportPurchaseParams({ client_reference_id: 'report-14' }), {
      idempotencyKey: 'report-13',
    });
    await expect(changed).rejects.toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
  });

  it('echoes Request-Id and Stripe-Version headers like the hosted API', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    expect(session.lastResponse.requestId).toMatch(/^req_/);
    expect(session.lastResponse.apiVersion).toBe(Stripe.API_VERSION);
  });

  it('answers an unknown API path with Stripe’s unrecognized URL error', async () => {
    const response = await fetch(`${harness.standIn.url}/v1/subscriptions`, {
      headers: { Authorization: 'Bearer sk_test_waygrade' },
    });
    const body = (await response.json()) as { error: { message: string } };
    expect(response.status).toBe(404);
    expect(body.error.message).toMatch(/^Unrecognized request URL \(GET: \/v1\/subscriptions\)/);
  });
});
