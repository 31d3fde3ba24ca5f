import { afterAll, describe, expect, it, vi } from 'vitest';
import { eq } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { reports } from '@/db/schema';
import { ALREADY_BOUGHT_REFUND_REASON, applyPaymentEvent, WITHDRAWN_REPORT_REFUND_REASON, type PaymentProvider } from '@/lib/payments/apply-payment-event';
import { refundOrderOperation } from '@/lib/payments/refund-order';
import { createAccount } from '../support/accounts';
import {
  activeGrants,
  completedSession,
  createPendingOrder,
  createReleasedReport,
  providerEvent,
  queuedMails,
  readOrder,
  refundedCharge,
} from '../support/purchase-fixtures';

/** The provider as the handling sees it: payments know their order; refunds are counted. */
function fakeProvider(orderOfPayment: Record<string, number> = {}) {
  const refunds: Array<{ orderId: number; paymentIntentId: string }> = [];
  const provider: PaymentProvider = {
    orderIdOfPayment: vi.fn(async (paymentIntentId: string) => orderOfPayment[paymentIntentId] ?? null),
    refundPayment: vi.fn(async ({ orderId, paymentIntentId }) => {
      refunds.push({ orderId, paymentIntentId });
      return { refundId: `re_test_${orderId}` };
    }),
  };
  return { provider, refunds };
}

const apply = (event: ReturnType<typeof providerEvent>, provider: PaymentProvider) => db.transaction((tx) => applyPaymentEvent(tx, event, provider));

afterAll(() => closeDatabase());

describe('payment events applied to orders', () => {
  it('leaves an order refunded when the refund arrives before the completion', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');
    const { orderId, sessionId } = await createPendingOrder(reportId, buyer.id);
    const { provider } = fakeProvider({ pi_late: orderId });

    const refund = await apply(providerEvent('charge.refunded', refundedCharge('pi_late')), provider);
    const completion = await apply(providerEvent('checkout.session.completed', completedSession(sessionId, orderId, 'pi_late')), provider);

    expect([refund.outcome, completion.outcome]).toEqual(['refunded', 'unchanged']);
    expect(await readOrder(orderId)).toMatchObject({ status: 'refunded', providerPaymentIntentId: 'pi_late' });
    expect(await activeGrants(orderId)).toHaveLength(0);
    expect(await queuedMails(buyer.email, 'payment-receipt')).toHaveLength(0);
    expect(await queuedMails(buyer.email, 'refund')).toHaveLength(1);
  });

  it('revokes access and tells the buyer when a paid order is refunded at the provider', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');
    const { orderId, sessionId } = await createPendingOrder(reportId, buyer.id);
    const { provider } = fakeProvider();

    await apply(providerEvent('checkout.session.completed', completedSession(sessionId, orderId, 'pi_paid_then_refunded')), provider);
    expect(await activeGrants(orderId)).toHaveLength(1);
    const refund = await apply(providerEvent('charge.refunded', refundedCharge('pi_paid_then_refunded')), provider);

    expect(refund.outcome).toBe('refunded');
    expect(await readOrder(orderId)).toMatchObject({ status: 'refunded' });
    expect(await activeGrants(orderId)).toHaveLength(0);
    expect(await queuedMails(buyer.email, 'refund')).toHaveLength(1);
  });

  it('refunds a payment for a report withdrawn in the meantime, once, and grants nothing', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');
    const { orderId, sessionId } = await createPendingOrder(reportId, buyer.id);
    await db.update(reports).set({ status: 'withdrawn', withdrawnAt: new Date() }).where(eq(reports.id, reportId));
    const { provider, refunds } = fakeProvider({ pi_withdrawn: orderId });

    const completion = await apply(providerEvent('checkout.session.completed', completedSession(sessionId, orderId, 'pi_withdrawn')), provider);
    const echo = await apply(providerEvent('charge.refunded', refundedCharge('pi_withdrawn')), provider);

    expect([completion.outcome, echo.outcome]).toEqual(['refunded-report-withdrawn', 'unchanged']);
    expect(refunds).toEqual([{ orderId, paymentIntentId: 'pi_withdrawn' }]);
    expect(await readOrder(orderId)).toMatchObject({ status: 'refunded', refundReason: WITHDRAWN_REPORT_REFUND_REASON, providerRefundId: `re_test_${orderId}` });
    expect(await activeGrants(orderId)).toHaveLength(0);
    const [mail] = await queuedMails(buyer.email, 'refund');
    expect(mail?.textBody).toContain('withdrawn');
  });

  it('refunds a second payment for a report the buyer already has, once, and keeps one grant', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');
    // Two checkout pages paid for one report, e.g. opened before checkouts were reused.
    const first = await createPendingOrder(reportId, buyer.id);
    const second = await createPendingOrder(reportId, buyer.id);
    const { provider, refunds } = fakeProvider();

    const outcomes = await Promise.all([
      apply(providerEvent('checkout.session.completed', completedSession(first.sessionId, first.orderId, 'pi_twice_a')), provider),
      apply(providerEvent('checkout.session.completed', completedSession(second.sessionId, second.orderId, 'pi_twice_b')), provider),
    ]);
    const retried = await apply(providerEvent('checkout.session.completed', completedSession(second.sessionId, second.orderId, 'pi_twice_b')), provider);

    expect(outcomes.map((o) => o.outcome).sort()).toEqual(['granted', 'refunded-already-bought']);
    expect(retried.outcome).toBe('unchanged');
    const refunded = outcomes.find((o) => o.outcome === 'refunded-already-bought')!.orderId!;
    const paid = refunded === first.orderId ? second.orderId : first.orderId;
    expect(refunds).toEqual([{ orderId: refunded, paymentIntentId: refunded === first.orderId ? 'pi_twice_a' : 'pi_twice_b' }]);
    expect(await readOrder(refunded)).toMatchObject({ status: 'refunded', refundReason: ALREADY_BOUGHT_REFUND_REASON, providerRefundId: `re_test_${refunded}` });
    expect(await readOrder(paid)).toMatchObject({ status: 'paid' });
    expect([...(await activeGrants(first.orderId)), ...(await activeGrants(second.orderId))]).toHaveLength(1);
    expect(await queuedMails(buyer.email, 'payment-receipt')).toHaveLength(1);
    expect(await queuedMails(buyer.email, 'refund')).toHaveLength(1);
  });

  it('marks an abandoned checkout expired', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');
    const { orderId, sessionId } = await createPendingOrder(reportId, buyer.id);
    const { provider } = fakeProvider();
    const expired = await apply(providerEvent('checkout.session.expired', { id: sessionId, object: 'checkout.session', client_reference_id: String(orderId), metadata: {} }), provider);
    expect(expired.outcome).toBe('expired');
    expect(await readOrder(orderId)).toMatchObject({ status: 'expired' });
  });

  it('records events it has no use for without touching any order', async () => {
    const { provider } = fakeProvider();
    const result = await apply(providerEvent('refund.created', { id: 're_x', object: 'refund' }), provider);
    expect(result).toEqual({ outcome: 'ignored', orderId: null });
  });
});

describe('a coordinator’s refund', () => {
  it('refunds through the provider, revokes access, tells the buyer, and is not repeated by the provider’s echo', async () => {
    const { reportId } = await createReleasedReport();
    const [buyer, coordinator] = await Promise.all([createAccount('buyer'), createAccount('admin')]);
    const { orderId, sessionId } = await createPendingOrder(reportId, buyer.id);
    const { provider, refunds } = fakeProvider();
    await apply(providerEvent('checkout.session.completed', completedSession(sessionId, orderId, 'pi_admin_refund')), provider);

    const result = await refundOrderOperation(() => provider).execute(coordinator.actor, { orderId, reason: 'Bought the wrong machine by mistake' });
    const echo = await apply(providerEvent('charge.refunded', refundedCharge('pi_admin_refund')), provider);

    expect(result).toMatchObject({ ok: true });
    expect(echo.outcome).toBe('unchanged');
    expect(refunds).toHaveLength(1);
    expect(await readOrder(orderId)).toMatchObject({ status: 'refunded', refundReason: 'Bought the wrong machine by mistake' });
    expect(await activeGrants(orderId)).toHaveLength(0);
    expect(await queuedMails(buyer.email, 'refund')).toHaveLength(1);
  });

  it('refuses a buyer, and refuses to refund an order that was never paid, changing nothing', async () => {
    const { reportId } = await createReleasedReport();
    const [buyer, coordinator] = await Promise.all([createAccount('buyer'), createAccount('admin')]);
    const { orderId } = await createPendingOrder(reportId, buyer.id);
    const { provider, refunds } = fakeProvider();
    const operation = refundOrderOperation(() => provider);

    expect(await operation.execute(buyer.actor, { orderId, reason: 'I want my money' })).toMatchObject({ ok: false, code: 'forbidden' });
    expect(await operation.execute(coordinator.actor, { orderId, reason: 'Not paid yet' })).toMatchObject({ ok: false, code: 'conflict' });
    expect(refunds).toHaveLength(0);
    expect(await readOrder(orderId)).toMatchObject({ status: 'pending' });
  });
});
