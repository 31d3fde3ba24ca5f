import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import Stripe from 'stripe';
import { db } from '@/db/client';
import { emailOutbox, orders, reportAccessGrants, reports } from '@/db/schema';
import { releaseDraftReport } from '@/db/queries/report-writes';
import { createAccount } from './accounts';
import { createInspection, createMachine, createSubmittedSurvey } from './workflow-fixtures';

/** A released report on a fresh seller's machine, reviewed by a fresh coordinator. */
export async function createReleasedReport(machine: Parameters<typeof createMachine>[1] = {}) {
  const [seller, coordinator, inspector] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector')]);
  const machineId = await createMachine(seller.id, machine);
  const inspectionId = await createInspection(machineId, seller.id, 'in_review', inspector.id);
  const { reportId } = await createSubmittedSurvey(inspectionId);
  await db.transaction((tx) => releaseDraftReport(tx, { reportId, reviewerId: coordinator.id, sellerId: seller.id }));
  return { reportId, inspectionId, machineId, seller, coordinator, inspector };
}

/** A buyer's order waiting for payment, tied to an invented checkout session id. */
export async function createPendingOrder(reportId: number, buyerId: string, amountMinor = 39_000) {
  const sessionId = `cs_test_${randomUUID().replaceAll('-', '')}`;
  const [row] = await db.insert(orders).values({ reportId, buyerId, amountMinor, status: 'pending', providerCheckoutSessionId: sessionId }).$returningId();
  return { orderId: row!.id, sessionId };
}

export async function readOrder(orderId: number) {
  const [row] = await db.select().from(orders).where(eq(orders.id, orderId));
  return row!;
}

export async function activeGrants(orderId: number) {
  const rows = await db.select().from(reportAccessGrants).where(eq(reportAccessGrants.orderId, orderId));
  return rows.filter((g) => g.revokedAt === null);
}

export async function queuedMails(to: string, template: string) {
  return db.select().from(emailOutbox).where(and(eq(emailOutbox.toAddress, to), eq(emailOutbox.template, template)));
}

export async function reportStatus(reportId: number) {
  const [row] = await db.select({ status: reports.status }).from(reports).where(eq(reports.id, reportId));
  return row?.status;
}

let eventCounter = 0;

/** A provider event as the payment service sends it (ids and times invented). */
export function providerEvent(type: string, object: Record<string, unknown>) {
  eventCounter += 1;
  return {
    id: `evt_test_${randomUUID().replaceAll('-', '').slice(0, 20)}${eventCounter}`,
    object: 'event',
    api_version: '2025-01-27.acacia',
    created: Math.floor(Date.now() / 1000),
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type,
    data: { object },
  };
}

export function completedSession(sessionId: string, orderId: number, paymentIntentId: string) {
  return {
    id: sessionId,
    object: 'checkout.session',
    client_reference_id: String(orderId),
    metadata: { orderId: String(orderId) },
    payment_status: 'paid',
    status: 'complete',
    payment_intent: paymentIntentId,
  };
}

export function refundedCharge(paymentIntentId: string) {
  return { id: `ch_${randomUUID().slice(0, 12)}`, object: 'charge', payment_intent: paymentIntentId, refunded: true, amount: 39_000, amount_refunded: 39_000, metadata: {} };
}

/** Signs a body the way the provider does, with the secret the app verifies against. */
export function signedHeader(body: string, secret = process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_waygrade_local') {
  return new Stripe('sk_test_unused').webhooks.generateTestHeaderString({ payload: body, secret });
}
