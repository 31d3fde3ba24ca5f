import { eq } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { paymentEvents } from '@/db/schema';
import { createAccount } from '../support/accounts';
import { sessionCookie } from '../support/private-stack';
import { completedSession, createPendingOrder, createReleasedReport, providerEvent, readOrder, signedHeader } from '../support/purchase-fixtures';

const APP_URL = process.env.APP_URL ?? 'http://localhost:3100';

describe('malformed requests get a clear answer, never a bare 500', () => {
  afterAll(() => closeDatabase());

  // A "%" not followed by two hex digits, or escapes that are not UTF-8 (RFC 3986 section 2.1,
  // RFC 3629): no address of ours looks like this.
  it.each(['/verify/%ZZ', '/verify/%E0%A4%A', '/verify/abc%', '/api/surveys/%ZZ', '/api/reports/%ZZ/pdf', '/reports/%C0%AF'])(
    'answers %s with the product’s 404 page and its headers',
    async (address) => {
      const buyer = await createAccount('buyer');
      const cookie = await sessionCookie({ ...buyer, sessionVersion: 0 });
      const response = await fetch(`${APP_URL}${address}`, { redirect: 'manual', headers: { cookie } });
      expect(response.status).toBe(404);
      expect(await response.text()).toContain('This page is off the bed.');
      expect(response.headers.get('content-security-policy')).toContain("default-src 'self'");
    },
  );

  it('still answers a well-encoded code on the report check page', async () => {
    const response = await fetch(`${APP_URL}/verify/${encodeURIComponent('WG-%ZZ')}`);
    expect(response.status).toBe(200);
    expect(await response.text()).toContain('Not a Waygrade report');
  });

  // The provider's `created` is Unix seconds; JavaScript dates end at 8.64e15 ms (ECMA-262, Time
  // Values and Time Range) and MariaDB's DATETIME at 9999-12-31 (MariaDB docs, DATETIME).
  it.each([1e15, Number.MAX_SAFE_INTEGER, 253_402_300_800, -1])('refuses a correctly signed event created at %s with 400 and changes nothing', async (created) => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');
    const { orderId, sessionId } = await createPendingOrder(reportId, buyer.id);
    const event = { ...providerEvent('checkout.session.completed', completedSession(sessionId, orderId, `pi_created_${orderId}`)), created };
    const body = JSON.stringify(event);
    const response = await fetch(`${APP_URL}/api/payments/webhook`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'stripe-signature': signedHeader(body) },
      body,
    });
    expect(response.status).toBe(400);
    expect(await response.json()).toMatchObject({ ok: false, code: 'invalid_input' });
    expect(await db.select().from(paymentEvents).where(eq(paymentEvents.providerEventId, event.id))).toHaveLength(0);
    expect(await readOrder(orderId)).toMatchObject({ status: 'pending', paidAt: null });
  });
});
