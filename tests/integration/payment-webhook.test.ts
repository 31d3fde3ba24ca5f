import { afterAll, describe, expect, it } from 'vitest';
import { count, eq } from 'drizzle-orm';
import Stripe from 'stripe';
import { closeDatabase, db } from '@/db/client';
import { paymentEvents } from '@/db/schema';
import { createAccount } from '../support/accounts';
import {
  activeGrants,
  completedSession,
  createPendingOrder,
  createReleasedReport,
  providerEvent,
  queuedMails,
  readOrder,
  signedHeader,
} from '../support/purchase-fixtures';

const APP_URL = process.env.APP_URL ?? 'http://localhost:3100';

async function deliver(body: string, signature: string) {
  return fetch(`${APP_URL}/api/payments/webhook`, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': signature }, body });
}

async function eventRecorded(eventId: string) {
  const [row] = await db.select({ total: count() }).from(paymentEvents).where(eq(paymentEvents.providerEventId, eventId));
  return row!.total;
}

describe('the payment webhook endpoint', () => {
  afterAll(() => closeDatabase());

  it('refuses an event with a wrong signature and changes nothing', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');
    const { orderId, sessionId } = await createPendingOrder(reportId, buyer.id);
    const event = providerEvent('checkout.session.completed', completedSession(sessionId, orderId, 'pi_wrong_signature'));
    const body = JSON.stringify(event);

    const forged = await deliver(body, signedHeader(body, 'whsec_someone_else'));
    const tampered = await deliver(body.replace('"paid"', '"paid" '), signedHeader(body));
    const unsigned = await fetch(`${APP_URL}/api/payments/webhook`, { method: 'POST', body });

    expect([forged.status, tampered.status, unsigned.status]).toEqual([400, 400, 400]);
    expect(await eventRecorded(event.id)).toBe(0);
    expect(await readOrder(orderId)).toMatchObject({ status: 'pending', paidAt: null });
    expect(await activeGrants(orderId)).toHaveLength(0);
    expect(await queuedMails(buyer.email, 'payment-receipt')).toHaveLength(0);
  });

  it('refuses a correctly signed completion captured and replayed after the signature’s five minutes', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');
    const { orderId, sessionId } = await createPendingOrder(reportId, buyer.id);
    const event = providerEvent('checkout.session.completed', completedSession(sessionId, orderId, 'pi_replayed_late'));
    const body = JSON.stringify(event);
    const secret = process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_waygrade_local';
    const capturedAnHourAgo = new Stripe('sk_test_unused').webhooks.generateTestHeaderString({ payload: body, secret, timestamp: Math.floor(Date.now() / 1000) - 3600 });

    const replayed = await deliver(body, capturedAnHourAgo);
    expect(replayed.status).toBe(400);
    expect(await eventRecorded(event.id)).toBe(0);
    expect(await readOrder(orderId)).toMatchObject({ status: 'pending', paidAt: null });
    expect(await activeGrants(orderId)).toHaveLength(0);
  });

  it('grants access once when the same completion arrives twice, one after the other and at once', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');
    const { orderId, sessionId } = await createPendingOrder(reportId, buyer.id);
    const event = providerEvent('checkout.session.completed', completedSession(sessionId, orderId, 'pi_twice'));
    const body = JSON.stringify(event);

    const first = await deliver(body, signedHeader(body));
    const [second, third] = await Promise.all([deliver(body, signedHeader(body)), deliver(body, signedHeader(body))]);

    expect([first.status, second.status, third.status]).toEqual([200, 200, 200]);
    expect(await first.json()).toMatchObject({ outcome: 'granted' });
    expect([await second.json(), await third.json()]).toEqual([{ ok: true, outcome: 'duplicate' }, { ok: true, outcome: 'duplicate' }]);
    expect(await eventRecorded(event.id)).toBe(1);
    expect(await readOrder(orderId)).toMatchObject({ status: 'paid', providerPaymentIntentId: 'pi_twice' });
    expect(await activeGrants(orderId)).toHaveLength(1);
    expect(await queuedMails(buyer.email, 'payment-receipt')).toHaveLength(1);
  });

  it('grants nothing for a completion whose order it does not know', async () => {
    const event = providerEvent('checkout.session.completed', completedSession('cs_test_unknown', 987_654_321, 'pi_unknown'));
    const body = JSON.stringify(event);
    const response = await deliver(body, signedHeader(body));
    expect(response.status).toBe(200);
    expect(await response.json()).toMatchObject({ outcome: 'unknown-order' });
  });
});
