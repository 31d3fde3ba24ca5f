import { and, eq } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { orders } from '@/db/schema';
import { startCheckout } from '@/lib/payments/start-checkout';
import { stripeClient } from '@/lib/payments/stripe-client';
import { createAccount } from '../support/accounts';
import { createReleasedReport } from '../support/purchase-fixtures';

// Runs against the payments stand-in the test stack starts (STRIPE_API_URL), through the real SDK.

async function ordersOf(buyerId: string, reportId: number) {
  return db.select().from(orders).where(and(eq(orders.buyerId, buyerId), eq(orders.reportId, reportId)));
}

afterAll(() => closeDatabase());

describe('starting a checkout for a report', () => {
  it('reuses the open checkout page of the same buyer and report instead of opening a second one', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');

    const first = await startCheckout.execute(buyer.actor, { reportId });
    const again = await startCheckout.execute(buyer.actor, { reportId });

    if (!first.ok || !again.ok) throw new Error(`checkout refused: ${JSON.stringify([first, again])}`);
    expect(again.data).toEqual(first.data);
    expect(await ordersOf(buyer.id, reportId)).toHaveLength(1);
  });

  it('opens one page when the same buyer starts two checkouts at once', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');

    const both = await Promise.all([startCheckout.execute(buyer.actor, { reportId }), startCheckout.execute(buyer.actor, { reportId })]);

    expect(both.every((outcome) => outcome.ok)).toBe(true);
    const urls = new Set(both.map((outcome) => (outcome.ok ? outcome.data.checkoutUrl : null)));
    expect(urls.size).toBe(1);
    expect(await ordersOf(buyer.id, reportId)).toHaveLength(1);
  });

  it('opens a new page when the earlier one has expired at the provider', async () => {
    const { reportId } = await createReleasedReport();
    const buyer = await createAccount('buyer');
    const first = await startCheckout.execute(buyer.actor, { reportId });
    if (!first.ok) throw new Error(first.message);
    const [order] = await ordersOf(buyer.id, reportId);
    await stripeClient().checkout.sessions.expire(order!.providerCheckoutSessionId!);

    const second = await startCheckout.execute(buyer.actor, { reportId });

    if (!second.ok) throw new Error(second.message);
    expect(second.data.orderId).not.toBe(first.data.orderId);
    expect(second.data.checkoutUrl).not.toBe(first.data.checkoutUrl);
  });

  it('gives separate pages to two buyers of the same report', async () => {
    const { reportId } = await createReleasedReport();
    const [one, two] = await Promise.all([createAccount('buyer'), createAccount('buyer')]);
    const a = await startCheckout.execute(one.actor, { reportId });
    const b = await startCheckout.execute(two.actor, { reportId });
    if (!a.ok || !b.ok) throw new Error('checkout refused');
    expect(a.data.orderId).not.toBe(b.data.orderId);
  });
});
