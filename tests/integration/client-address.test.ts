import { randomInt } from 'node:crypto';
import { and, desc, eq, inArray } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { auditEvents, rateLimitBuckets } from '@/db/schema';
import { createAccount } from '../support/accounts';
import { completedSession, createPendingOrder, createReleasedReport, providerEvent, signedHeader } from '../support/purchase-fixtures';

/**
 * The visitor's address as the app records it (sign-in limits, audit trail) against a forged
 * X-Forwarded-For. The test stack trusts no proxy (TRUSTED_PROXY_COUNT unset = 0), so the address
 * is the socket's: this test's own loopback connection.
 */
const APP_URL = process.env.APP_URL ?? 'http://localhost:3100';
const LOOPBACK = ['127.0.0.1', '::1'];
// A documentation address (RFC 5737) standing for someone else's.
const victim = () => `203.0.113.${randomInt(1, 254)}`;

async function deliverSigned(body: string, forwardedFor: string) {
  return fetch(`${APP_URL}/api/payments/webhook`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'stripe-signature': signedHeader(body), 'x-forwarded-for': forwardedFor },
    body,
  });
}

async function paidEvent() {
  const { reportId } = await createReleasedReport();
  const buyer = await createAccount('buyer');
  const { orderId, sessionId } = await createPendingOrder(reportId, buyer.id);
  const event = providerEvent('checkout.session.completed', completedSession(sessionId, orderId, `pi_address_${randomInt(1e9)}`));
  return { orderId, body: JSON.stringify(event) };
}

async function auditedAddress(orderId: number) {
  const [row] = await db
    .select({ ipAddress: auditEvents.ipAddress })
    .from(auditEvents)
    .where(and(eq(auditEvents.action, 'payment.webhook'), eq(auditEvents.entityId, String(orderId))))
    .orderBy(desc(auditEvents.id))
    .limit(1);
  return row?.ipAddress;
}

/** One sign-in through Auth.js's own endpoint, as the browser's form ends up posting it. */
async function signInOverHttp(email: string, password: string, forwardedFor: string) {
  const csrf = await fetch(`${APP_URL}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const cookie = csrf.headers.getSetCookie().map((line) => line.split(';')[0]).join('; ');
  return fetch(`${APP_URL}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie, 'x-forwarded-for': forwardedFor },
    body: new URLSearchParams({ email, password, csrfToken, callbackUrl: '/dashboard' }),
  });
}

describe('the client address behind a forged X-Forwarded-For', () => {
  afterAll(() => closeDatabase());

  it('applies a signed payment event with a 200-character X-Forwarded-For and audits the socket address', async () => {
    const { orderId, body } = await paidEvent();
    const response = await deliverSigned(body, `${'9'.repeat(200)}, 203.0.113.9`);
    expect(response.status).toBe(200);
    expect(LOOPBACK).toContain(await auditedAddress(orderId));
  });

  it('audits the socket address, not the one a caller wrote first in X-Forwarded-For', async () => {
    const { orderId, body } = await paidEvent();
    const forged = victim();
    const response = await deliverSigned(body, forged);
    expect(response.status).toBe(200);
    const recorded = await auditedAddress(orderId);
    expect(recorded).not.toBe(forged);
    expect(LOOPBACK).toContain(recorded);
  });

  it('counts a failed sign-in against the account and the socket address, never against a forged one', async () => {
    const account = await createAccount('buyer');
    const forged = victim();
    const answer = await signInOverHttp(account.email, 'not the password', forged);
    expect(answer.status).toBeLessThan(500);
    const buckets = await db
      .select({ key: rateLimitBuckets.bucketKey })
      .from(rateLimitBuckets)
      .where(inArray(rateLimitBuckets.bucketKey, [`sign-in:account:${account.email}`, `sign-in:ip:${forged}`]));
    expect(buckets.map((b) => b.key)).toEqual([`sign-in:account:${account.email}`]);
  });
});
