import Stripe from 'stripe';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import type { Delivery, DeliverySettings } from './webhook-dispatcher';
import {
  controlRequest,
  payOnCheckoutPage,
  reportPurchaseParams,
  startPaymentsHarness,
  TEST_WEBHOOK_SECRET,
  type PaymentsHarness,
} from './test-support/payments-harness';
import type { ReceivedWebhook } from './test-support/webhook-receiver';

interface ControlEvent {
  id: string;
  type: string;
  objectId: string;
  deliveries: Delivery[];
}

function eventsAbout(webhooks: ReceivedWebhook[], objectId: string): Stripe.Event[] {
  return webhooks
    .map((webhook) => JSON.parse(webhook.body) as Stripe.Event)
    .filter((event) => (event.data.object as { id?: string }).id === objectId);
}

function mentions(objectId: string) {
  return (webhook: ReceivedWebhook) => webhook.body.includes(objectId);
}

async function controlEvent(harness: PaymentsHarness, objectId: string, type: string): Promise<ControlEvent> {
  const { body } = await controlRequest<{ data: ControlEvent[] }>(harness.standIn, `events?type=${type}`);
  const event = body.data.find((candidate) => candidate.objectId === objectId);
  if (!event) throw new Error(`no ${type} event for ${objectId}`);
  return event;
}

async function waitForIdle(harness: PaymentsHarness): Promise<void> {
  const { status } = await controlRequest(harness.standIn, 'idle?timeoutMs=5000');
  expect(status).toBe(200);
}

describe('webhook delivery', () => {
  let harness: PaymentsHarness;
  beforeAll(async () => {
    harness = await startPaymentsHarness({ retryDelaysMs: [50, 100, 200] });
  });
  afterAll(() => harness.close());
  afterEach(async () => {
    harness.receiver.answerWith([]);
    await controlRequest(harness.standIn, 'delivery', {
      method: 'PUT',
      body: { duplicate: false, delayMs: 0, reorder: false } satisfies DeliverySettings,
    });
  });

  it('posts checkout.session.completed signed so that stripe.webhooks.constructEvent accepts it', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    await payOnCheckoutPage(session);
    const [webhook] = await harness.receiver.waitFor(mentions(session.id));

    expect(webhook?.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(webhook?.signature).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
    const event = harness.stripe.webhooks.constructEvent(webhook?.body ?? '', webhook?.signature ?? '', TEST_WEBHOOK_SECRET);
    expect(event.type).toBe('checkout.session.completed');
    expect(event.id).toMatch(/^evt_/);
    expect(event).toMatchObject({ object: 'event', livemode: false, api_version: Stripe.API_VERSION });
    const paid = event.data.object as Stripe.Checkout.Session;
    expect(paid).toMatchObject({
      id: session.id,
      status: 'complete',
      payment_status: 'paid',
      client_reference_id: 'report-12',
      metadata: { reportId: '12', buyerId: '7' },
      amount_total: 4_900,
    });
    expect(paid.payment_intent).toMatch(/^pi_/);
  });

  it('fails verification with the wrong secret or a changed body', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    await payOnCheckoutPage(session);
    const [webhook] = await harness.receiver.waitFor(mentions(session.id));
    const body = webhook?.body ?? '';
    const signature = webhook?.signature ?? '';

    expect(() => harness.stripe.webhooks.constructEvent(body, signature, 'whsec_some_other_secret')).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
    expect(() =>
      harness.stripe.webhooks.constructEvent(body.replace('"paid"', '"unpaid"'), signature, TEST_WEBHOOK_SECRET),
    ).toThrow(Stripe.errors.StripeSignatureVerificationError);
  });

  it('sends checkout.session.expired with the request that caused it', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    const expired = await harness.stripe.checkout.sessions.expire(session.id, {}, { idempotencyKey: 'expire-report-12' });
    const [webhook] = await harness.receiver.waitFor(mentions(session.id));
    const event = harness.stripe.webhooks.constructEvent(webhook?.body ?? '', webhook?.signature ?? '', TEST_WEBHOOK_SECRET);

    expect(event.type).toBe('checkout.session.expired');
    expect(event.request).toEqual({ id: expired.lastResponse.requestId, idempotency_key: 'expire-report-12' });
  });

  it('retries with growing delays after the endpoint answers 500, then stops once it answers 200', async () => {
    harness.receiver.answerWith([500, 500]);
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    await harness.stripe.checkout.sessions.expire(session.id);
    const webhooks = await harness.receiver.waitFor(mentions(session.id), 3);
    await waitForIdle(harness);

    expect(new Set(eventsAbout(webhooks, session.id).map((event) => event.id)).size).toBe(1);
    const [first, second, third] = webhooks.map((webhook) => webhook.receivedAt);
    expect((second ?? 0) - (first ?? 0)).toBeGreaterThanOrEqual(45);
    expect((third ?? 0) - (second ?? 0)).toBeGreaterThanOrEqual(95);
    const { deliveries } = await controlEvent(harness, session.id, 'checkout.session.expired');
    expect(deliveries).toHaveLength(1);
    expect(deliveries[0]?.state).toBe('succeeded');
    expect(deliveries[0]?.attempts.map((attempt) => attempt.status)).toEqual([500, 500, 200]);
    expect(harness.receiver.received.filter(mentions(session.id))).toHaveLength(3);
  });

  it('gives up after the last retry and records the failure', async () => {
    harness.receiver.answerWith([503, 503, 503, 503, 503]);
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    await harness.stripe.checkout.sessions.expire(session.id);
    await harness.receiver.waitFor(mentions(session.id), 4);
    await waitForIdle(harness);

    const { deliveries } = await controlEvent(harness, session.id, 'checkout.session.expired');
    expect(deliveries[0]?.state).toBe('failed');
    expect(deliveries[0]?.attempts).toHaveLength(4);
    expect(deliveries[0]?.attempts[0]?.error).toBe('endpoint answered 503');
  });

  it('answers the API call at once and delivers later when delivery is delayed', async () => {
    await controlRequest(harness.standIn, 'delivery', { method: 'PUT', body: { delayMs: 300 } });
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    const expiredAt = Date.now();
    await harness.stripe.checkout.sessions.expire(session.id);
    expect(harness.receiver.received.filter(mentions(session.id))).toHaveLength(0);

    const [webhook] = await harness.receiver.waitFor(mentions(session.id));
    expect((webhook?.receivedAt ?? 0) - expiredAt).toBeGreaterThanOrEqual(290);
  });

  it('delivers every event twice with the same id in duplicate mode', async () => {
    await controlRequest(harness.standIn, 'delivery', { method: 'PUT', body: { duplicate: true } });
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    await payOnCheckoutPage(session);
    const webhooks = await harness.receiver.waitFor(mentions(session.id), 2);
    await waitForIdle(harness);

    const events = webhooks.map((webhook) =>
      harness.stripe.webhooks.constructEvent(webhook.body, webhook.signature ?? '', TEST_WEBHOOK_SECRET),
    );
    expect(events).toHaveLength(2);
    expect(events[0]?.id).toBe(events[1]?.id);
    const { deliveries } = await controlEvent(harness, session.id, 'checkout.session.completed');
    expect(deliveries.map((delivery) => delivery.reason)).toEqual(['initial', 'duplicate']);
  });

  it('holds events in reorder mode and releases them newest first', async () => {
    await controlRequest(harness.standIn, 'delivery', { method: 'PUT', body: { reorder: true } });
    const older = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    const newer = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    await harness.stripe.checkout.sessions.expire(older.id);
    await harness.stripe.checkout.sessions.expire(newer.id);
    await waitForIdle(harness);
    expect(harness.receiver.received.filter((webhook) => mentions(older.id)(webhook) || mentions(newer.id)(webhook))).toHaveLength(0);

    const { body } = await controlRequest<{ released: number }>(harness.standIn, 'release', { method: 'POST' });
    expect(body.released).toBe(2);
    const webhooks = await harness.receiver.waitFor((webhook) => mentions(older.id)(webhook) || mentions(newer.id)(webhook), 2);
    expect(webhooks.map((webhook) => (JSON.parse(webhook.body) as Stripe.Event).data.object)).toMatchObject([
      { id: newer.id },
      { id: older.id },
    ]);
  });

  it('redelivers an event on request with the same id and a fresh signature', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    await harness.stripe.checkout.sessions.expire(session.id);
    const [original] = await harness.receiver.waitFor(mentions(session.id));
    const { id } = await controlEvent(harness, session.id, 'checkout.session.expired');

    const { status } = await controlRequest(harness.standIn, `redeliver/${id}`, { method: 'POST' });
    expect(status).toBe(202);
    const [, again] = await harness.receiver.waitFor(mentions(session.id), 2);
    const event = harness.stripe.webhooks.constructEvent(again?.body ?? '', again?.signature ?? '', TEST_WEBHOOK_SECRET);
    expect(event.id).toBe(id);
    expect(again?.body).toBe(original?.body);
    expect((await controlRequest(harness.standIn, 'redeliver/evt_unknown', { method: 'POST' })).status).toBe(404);
  });

  it('rejects malformed delivery settings', async () => {
    const { status } = await controlRequest(harness.standIn, 'delivery', { method: 'PUT', body: { delayMs: -5 } });
    expect(status).toBe(400);
  });
});

describe('webhook delivery to an endpoint that is down', () => {
  let harness: PaymentsHarness;
  beforeAll(async () => {
    harness = await startPaymentsHarness({ retryDelaysMs: [400, 400] });
  });
  afterAll(() => harness.close());

  it('keeps retrying until the endpoint is back', async () => {
    // Port 9 (discard) is closed on loopback, so the first attempt is refused.
    await controlRequest(harness.standIn, 'delivery', { method: 'PUT', body: { endpointUrl: 'http://127.0.0.1:9/webhook' } });
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    await harness.stripe.checkout.sessions.expire(session.id);
    // Wait for the first (refused) attempt to be recorded; a busy machine may take a while.
    let refused = await controlEvent(harness, session.id, 'checkout.session.expired');
    for (let waited = 0; !refused.deliveries[0]?.attempts[0] && waited < 10_000; waited += 50) {
      await new Promise((resolve) => setTimeout(resolve, 50));
      refused = await controlEvent(harness, session.id, 'checkout.session.expired');
    }
    expect(refused.deliveries[0]?.attempts[0]).toMatchObject({ status: null });
    expect(refused.deliveries[0]?.attempts[0]?.error).toMatch(/fetch failed/);

    await controlRequest(harness.standIn, 'delivery', { method: 'PUT', body: { endpointUrl: harness.receiver.url } });
    await harness.receiver.waitFor(mentions(session.id));
    await waitForIdle(harness);
    const recovered = await controlEvent(harness, session.id, 'checkout.session.expired');
    expect(recovered.deliveries[0]?.state).toBe('succeeded');
    expect(recovered.deliveries[0]?.attempts.map((attempt) => attempt.status)).toEqual([null, 200]);
  });
});
