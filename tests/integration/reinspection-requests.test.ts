import { afterAll, describe, expect, it, vi } from 'vitest';
import { and, eq, isNull } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { inspections, machines, reportAccessGrants, reports } from '@/db/schema';
import { listOutstandingReinspectionRefunds } from '@/db/queries/reinspection-requests';
import { applyPaymentEvent, type PaymentProvider } from '@/lib/payments/apply-payment-event';
import { refundOrderOperation } from '@/lib/payments/refund-order';
import { OFF_MARKET_REFUND_REASON } from '@/lib/reinspection/confirm-reinspection-payment';
import { REINSPECTION_CANCEL_REASONS } from '@/lib/reinspection/refund-reinspections';
import { retryDueReinspectionRefunds } from '@/lib/reinspection/refund-worker';
import { startReinspectionCheckout } from '@/lib/reinspection/start-reinspection-checkout';
import { bookInspection } from '@/lib/workflow/inspections';
import { setListingStatus, setListingStatusOperation } from '@/lib/workflow/listing-status';
import { releaseReport } from '@/lib/workflow/review';
import { createAccount, type TestAccount } from '../support/accounts';
import { completedSession, providerEvent, queuedMails, refundedCharge, signedHeader } from '../support/purchase-fixtures';
import {
  createAgedReleasedReport,
  createDraftReport,
  daysAgo,
  eventually,
  payAtCheckout,
  queuedInspections,
  readInspection,
  readOrderOf,
  readRequest,
  refundEventsAtStandIn,
} from '../support/reinspection-fixtures';

const APP_URL = process.env.APP_URL ?? 'http://localhost:3100';

afterAll(() => closeDatabase());

/** A buyer's request on a stale report, checkout opened at the payments stand-in. */
async function startRequest(buyer?: TestAccount) {
  const stale = await createAgedReleasedReport();
  const requester = buyer ?? (await createAccount('buyer'));
  const started = await startReinspectionCheckout.execute(requester.actor, { reportId: stale.reportId });
  if (!started.ok) throw new Error(started.message);
  return { ...stale, buyer: requester, ...started.data };
}

/** Pays at the stand-in and waits for its webhook to reach the app server and mark the request paid. */
async function paidRequest() {
  const request = await startRequest();
  await payAtCheckout(request.checkoutUrl);
  await eventually(async () => (await readRequest(request.requestId)).status === 'paid');
  const { inspectionId } = await readRequest(request.requestId);
  return { ...request, newInspectionId: inspectionId! };
}

function fakeProvider(refund: PaymentProvider['refundPayment'] = async ({ orderId }) => ({ refundId: `re_test_${orderId}` })) {
  return { orderIdOfPayment: vi.fn(async () => null), refundPayment: vi.fn(refund) } satisfies PaymentProvider;
}

describe('a re-inspection request', () => {
  it('reaches the coordinators’ queue as a new inspection only once the provider confirms the payment', async () => {
    const request = await startRequest();
    expect(await readRequest(request.requestId)).toMatchObject({ status: 'awaiting_payment', inspectionId: null });
    expect(await readOrderOf(request.requestId)).toMatchObject({ status: 'pending', purpose: 'reinspection', amountMinor: 39_000 });
    expect(await queuedInspections(request.machineId)).toHaveLength(0);

    // The browser's return from the payment page proves nothing; only the signed webhook counts.
    const back = await fetch(`${APP_URL}/reports/${request.reportId}?reinspection=returned`, { redirect: 'manual' });
    expect(back.status).toBeLessThan(500);
    expect(await queuedInspections(request.machineId)).toHaveLength(0);

    await payAtCheckout(request.checkoutUrl);
    const paid = await eventually(async () => {
      const row = await readRequest(request.requestId);
      return row.status === 'paid' ? row : null;
    });
    const queued = await queuedInspections(request.machineId);
    expect(queued).toHaveLength(1);
    expect(queued[0]).toMatchObject({ id: paid.inspectionId, requestedById: request.buyer.id, siteContactName: 'Site contact', feeMinor: 39_000, inspectorId: null });
    expect(await readOrderOf(request.requestId)).toMatchObject({ status: 'paid' });
    expect(await queuedMails(request.buyer.email, 'reinspection-paid')).toHaveLength(1);
    // Paying for a visit does not buy the old report.
    const grants = await db.select().from(reportAccessGrants).where(eq(reportAccessGrants.userId, request.buyer.id));
    expect(grants).toHaveLength(0);
  });

  it('refuses a report that is still current, and a machine no longer on the market', async () => {
    const current = await createAgedReleasedReport({ inspectedDaysAgo: 10 });
    const buyer = await createAccount('dealer');
    const early = await startReinspectionCheckout.execute(buyer.actor, { reportId: current.reportId });
    expect(early).toMatchObject({ ok: false, code: 'conflict' });
    if (!early.ok) expect(early.message).toMatch(/current for \d+ more days/);

    const nearlyStale = await createAgedReleasedReport({ inspectedDaysAgo: 80 });
    const allowed = await startReinspectionCheckout.execute(buyer.actor, { reportId: nearlyStale.reportId });
    expect(allowed.ok).toBe(true);

    const sold = await createAgedReleasedReport({ machine: { listingStatus: 'sold' } });
    expect(await startReinspectionCheckout.execute(buyer.actor, { reportId: sold.reportId })).toMatchObject({ ok: false, code: 'conflict' });
  });

  it('lets the seller ask for their own machine only', async () => {
    const stale = await createAgedReleasedReport();
    const own = await startReinspectionCheckout.execute(stale.seller.actor, { reportId: stale.reportId });
    expect(own.ok).toBe(true);
    const stranger = await createAccount('seller');
    expect(await startReinspectionCheckout.execute(stranger.actor, { reportId: stale.reportId })).toMatchObject({ ok: false, code: 'not_found' });
  });

  it('queues one inspection and sends one receipt when the same completion is delivered three times', async () => {
    const request = await startRequest();
    const order = await readOrderOf(request.requestId);
    const event = providerEvent('checkout.session.completed', completedSession(order.providerCheckoutSessionId!, order.id, `pi_dup_${order.id}`));
    const body = JSON.stringify(event);
    const deliver = () => fetch(`${APP_URL}/api/payments/webhook`, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': signedHeader(body) }, body });

    const together = await Promise.all([deliver(), deliver()]);
    const later = await deliver();
    const outcomes = await Promise.all([...together, later].map(async (r) => ((await r.json()) as { outcome: string }).outcome));
    expect(outcomes.sort()).toEqual(['duplicate', 'duplicate', 'reinspection-queued']);
    expect(await queuedInspections(request.machineId)).toHaveLength(1);
    expect(await queuedMails(request.buyer.email, 'reinspection-paid')).toHaveLength(1);
  });

  it('cancels the booked visit and refunds the fee at the provider when the machine sells first', async () => {
    const request = await paidRequest();
    const coordinator = await createAccount('admin');
    const inspector = await createAccount('inspector');
    const tomorrow = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
    const booked = await bookInspection.execute(coordinator.actor, { inspectionId: request.newInspectionId, inspectorId: inspector.id, date: tomorrow, time: '09:30', feeEuros: 390 });
    expect(booked.ok).toBe(true);

    const sold = await setListingStatus.execute(request.seller.actor, { machineId: request.machineId, listingStatus: 'sold' });
    expect(sold).toMatchObject({ ok: true, data: { reinspections: { refundsDue: 1, refunded: 1, refundsRetrying: 0, inspectionsCancelled: 1 } } });

    const order = await readOrderOf(request.requestId);
    expect(order).toMatchObject({ status: 'refunded', refundReason: REINSPECTION_CANCEL_REASONS.sold });
    expect(order.providerRefundId).toMatch(/^re_/);
    expect(await readRequest(request.requestId)).toMatchObject({ status: 'refunded' });
    expect(await readInspection(request.newInspectionId)).toMatchObject({ status: 'cancelled', cancelReason: REINSPECTION_CANCEL_REASONS.sold });
    const refundEvents = await eventually(async () => {
      const events = await refundEventsAtStandIn(order.providerPaymentIntentId!);
      return events.length > 0 ? events : null;
    });
    expect(refundEvents).toHaveLength(1);
    expect(refundEvents[0]!.event.data.object.amount_refunded).toBe(39_000);
    expect(await queuedMails(request.buyer.email, 'refund')).toHaveLength(1);
    expect(await queuedMails(inspector.email, 'inspection-cancelled')).toHaveLength(1);

    // Back on the market and sold again: nothing is paid any more, so nothing more is refunded.
    await setListingStatus.execute(request.seller.actor, { machineId: request.machineId, listingStatus: 'listed' });
    const again = await setListingStatus.execute(request.seller.actor, { machineId: request.machineId, listingStatus: 'sold' });
    expect(again).toMatchObject({ ok: true, data: { reinspections: { refundsDue: 0 } } });
    // The provider's own charge.refunded webhook finds the order refunded already.
    await new Promise((resolve) => setTimeout(resolve, 1500));
    expect(await refundEventsAtStandIn(order.providerPaymentIntentId!)).toHaveLength(1);
    expect(await queuedMails(request.buyer.email, 'refund')).toHaveLength(1);
    expect(await readOrderOf(request.requestId)).toMatchObject({ status: 'refunded', refundReason: REINSPECTION_CANCEL_REASONS.sold });
  });

  it('refunds nothing automatically when the machine sells after the visit has started', async () => {
    const request = await paidRequest();
    const inspector = await createAccount('inspector');
    await db.update(inspections).set({ status: 'on_site', inspectorId: inspector.id, scheduledAt: new Date() }).where(eq(inspections.id, request.newInspectionId));

    const sold = await setListingStatus.execute(request.seller.actor, { machineId: request.machineId, listingStatus: 'sold' });
    expect(sold).toMatchObject({ ok: true, data: { reinspections: { refundsDue: 0, keptVisitStarted: 1 } } });
    const order = await readOrderOf(request.requestId);
    expect(order.status).toBe('paid');
    expect(await readRequest(request.requestId)).toMatchObject({ status: 'paid' });
    expect(await readInspection(request.newInspectionId)).toMatchObject({ status: 'on_site' });
    await new Promise((resolve) => setTimeout(resolve, 1000));
    expect(await refundEventsAtStandIn(order.providerPaymentIntentId!)).toHaveLength(0);
    expect(await queuedMails(request.buyer.email, 'refund')).toHaveLength(0);
  });

  it('cancels the booked visit when a coordinator refunds the fee, and tells the inspector', async () => {
    const request = await paidRequest();
    const coordinator = await createAccount('admin');
    const inspector = await createAccount('inspector');
    const tomorrow = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
    await bookInspection.execute(coordinator.actor, { inspectionId: request.newInspectionId, inspectorId: inspector.id, date: tomorrow, time: '10:00', feeEuros: 390 });
    const order = await readOrderOf(request.requestId);
    const refunded = await refundOrderOperation(() => fakeProvider()).execute(coordinator.actor, { orderId: order.id, reason: 'Requester changed their mind' });
    expect(refunded.ok).toBe(true);
    expect(await readRequest(request.requestId)).toMatchObject({ status: 'refunded' });
    const inspection = await readInspection(request.newInspectionId);
    expect(inspection.status).toBe('cancelled');
    expect(inspection.cancelReason).toContain('Requester changed their mind');
    expect(await queuedInspections(request.machineId)).not.toContainEqual(expect.objectContaining({ id: request.newInspectionId }));
    expect(await queuedMails(inspector.email, 'inspection-cancelled')).toHaveLength(1);
  });

  it('cancels a visit not yet booked when the fee is refunded from the payment provider’s dashboard', async () => {
    const request = await paidRequest();
    const order = await readOrderOf(request.requestId);
    const result = await db.transaction((tx) => applyPaymentEvent(tx, providerEvent('charge.refunded', refundedCharge(order.providerPaymentIntentId!)), fakeProvider()));
    expect(result.outcome).toBe('refunded');
    expect(await readRequest(request.requestId)).toMatchObject({ status: 'refunded' });
    expect(await readInspection(request.newInspectionId)).toMatchObject({ status: 'cancelled' });
  });

  it('refunds at once a payment that completes after the machine was withdrawn', async () => {
    const request = await startRequest();
    await db.update(machines).set({ listingStatus: 'withdrawn' }).where(eq(machines.id, request.machineId));
    const order = await readOrderOf(request.requestId);
    const provider = fakeProvider();
    const event = providerEvent('checkout.session.completed', completedSession(order.providerCheckoutSessionId!, order.id, `pi_late_${order.id}`));
    const result = await db.transaction((tx) => applyPaymentEvent(tx, event, provider));
    expect(result.outcome).toBe('refunded-machine-off-market');
    expect(provider.refundPayment).toHaveBeenCalledTimes(1);
    expect(await readOrderOf(request.requestId)).toMatchObject({ status: 'refunded', refundReason: OFF_MARKET_REFUND_REASON });
    expect(await queuedInspections(request.machineId)).toHaveLength(0);
  });

  it('keeps a refund the provider refused in view and retries it until it goes through', async () => {
    const request = await paidRequest();
    const refusing = fakeProvider(async () => {
      throw new Error('The payments service is unavailable');
    });
    const withdraw = setListingStatusOperation(() => refusing);
    const withdrawn = await withdraw.execute(request.seller.actor, { machineId: request.machineId, listingStatus: 'withdrawn' });
    expect(withdrawn).toMatchObject({ ok: true, data: { reinspections: { refundsDue: 1, refunded: 0, refundsRetrying: 1 } } });
    expect(await readRequest(request.requestId)).toMatchObject({ status: 'refund_due', refundAttempts: 1, lastRefundError: 'The payments service is unavailable' });
    expect(await readOrderOf(request.requestId)).toMatchObject({ status: 'paid' });
    expect(await readInspection(request.newInspectionId)).toMatchObject({ status: 'cancelled' });
    expect((await listOutstandingReinspectionRefunds()).map((r) => r.id)).toContain(request.requestId);

    const accepting = fakeProvider();
    await retryDueReinspectionRefunds(() => accepting, new Date(Date.now() + 2 * 60_000));
    expect(accepting.refundPayment).toHaveBeenCalledWith(expect.objectContaining({ orderId: (await readOrderOf(request.requestId)).id }));
    expect(await readRequest(request.requestId)).toMatchObject({ status: 'refunded' });
    expect(await readOrderOf(request.requestId)).toMatchObject({ status: 'refunded', refundReason: REINSPECTION_CANCEL_REASONS.withdrawn });
    expect((await listOutstandingReinspectionRefunds()).map((r) => r.id)).not.toContain(request.requestId);
  });

  it('gives the requester the new report without a second payment when it is released', async () => {
    const request = await paidRequest();
    const inspector = await createAccount('inspector');
    const coordinator = await createAccount('admin');
    await db.update(inspections).set({ status: 'in_review', inspectorId: inspector.id, scheduledAt: new Date() }).where(eq(inspections.id, request.newInspectionId));
    const { reportId } = await createDraftReport(request.newInspectionId, daysAgo(0));

    const released = await releaseReport.execute(coordinator.actor, { inspectionId: request.newInspectionId, reportId });
    expect(released.ok).toBe(true);
    const [grant] = await db
      .select()
      .from(reportAccessGrants)
      .where(and(eq(reportAccessGrants.userId, request.buyer.id), eq(reportAccessGrants.reportId, reportId), isNull(reportAccessGrants.revokedAt)));
    expect(grant).toMatchObject({ reason: 'purchase', orderId: (await readOrderOf(request.requestId)).id });
    expect(await readRequest(request.requestId)).toMatchObject({ status: 'delivered' });
    const [report] = await db.select({ status: reports.status }).from(reports).where(eq(reports.id, reportId));
    expect(report?.status).toBe('released');
    expect(await queuedMails(request.buyer.email, 'reinspection-report-ready')).toHaveLength(1);
    // Delivered requests are past the visit: a later sale refunds nothing.
    const sold = await setListingStatus.execute(request.seller.actor, { machineId: request.machineId, listingStatus: 'sold' });
    expect(sold).toMatchObject({ ok: true, data: { reinspections: { refundsDue: 0 } } });
  });
});
