import 'server-only';
import { and, desc, eq, isNotNull } from 'drizzle-orm';
import { machines, orders, reports } from '@/db/schema';
import { lockBuyer } from '@/db/queries/purchases';
import { findInspectionFee } from '@/db/queries/fees';
import { hasReportAccess } from '@/db/queries/report-access';
import { defineOperation, type Transaction } from '@/lib/auth/operation';
import { env } from '@/lib/env';
import { sealedMachineOf } from '@/db/queries/sealed-machine';
import { AppError } from '@/lib/errors';
import { reportIdSchema } from '@/lib/validation/payments';
import { stripeClient } from './stripe-client';

/**
 * A buyer starts paying for a report: a pending order and a hosted checkout page for the fee of the
 * machine's size class. Nothing is granted here; access comes only from the provider's webhook.
 * One open checkout per buyer and report: a second click, a second tab or a retry gets the page
 * already open at the provider, so the same report cannot be paid twice through two pages. (A payment
 * that still arrives twice is refunded by the webhook handling: see apply-payment-event.ts.)
 */
export const startCheckout = defineOperation({
  name: 'report.checkout',
  entityType: 'order',
  access: 'report.buy',
  input: reportIdSchema,
  async run({ actor, input, tx }) {
    const [report] = await tx
      .select({
        id: reports.id,
        status: reports.status,
        supersededById: reports.supersededById,
        version: reports.version,
        // As sealed with the version the buyer pays for.
        maker: sealedMachineOf().maker,
        model: sealedMachineOf().model,
        serialNumber: sealedMachineOf().serialNumber,
        machineType: machines.machineType,
        sizeClass: machines.sizeClass,
      })
      .from(reports)
      .innerJoin(machines, eq(machines.id, reports.machineId))
      .where(eq(reports.id, input.reportId))
      .limit(1);
    if (!report || report.status !== 'released') throw new AppError('not_found', 'This report is not for sale.');
    if (report.supersededById) throw new AppError('conflict', 'A newer version of this report has been released; buy that one instead.');
    // The buyer's row is held until commit: two checkouts of one buyer take turns, so the second
    // finds the first's pending order instead of opening another page.
    await lockBuyer(tx, actor!.id);
    if (await hasReportAccess(tx, actor!.id, report.id, { locking: true })) throw new AppError('conflict', 'You already have this report: it is in your purchases.');
    const open = await findOpenCheckout(tx, actor!.id, report.id);
    if (open) return { data: { orderId: open.orderId, checkoutUrl: open.url }, entityId: open.orderId, detail: { reportId: report.id, reused: true } };
    const fee = await findInspectionFee(tx, report.machineType, report.sizeClass);
    if (!fee) throw new AppError('conflict', 'No fee is set for this size of machine yet. Please try again later.');

    const [order] = await tx
      .insert(orders)
      .values({ reportId: report.id, buyerId: actor!.id, amountMinor: fee.amountMinor, currency: fee.currency, status: 'pending' })
      .$returningId();
    const orderId = order!.id;
    const appUrl = env().APP_URL.replace(/\/$/, '');
    const machineName = `${report.maker} ${report.model}${report.serialNumber ? `, serial ${report.serialNumber}` : ''}`;
    const metadata = { orderId: String(orderId), reportId: String(report.id) };
    // Created inside the transaction: if the provider refuses, the pending order disappears with it.
    const session = await stripeClient().checkout.sessions.create(
      {
        mode: 'payment',
        line_items: [
          {
            quantity: 1,
            price_data: {
              currency: fee.currency.toLowerCase(),
              unit_amount: fee.amountMinor,
              product_data: { name: `Waygrade condition report: ${machineName}`, description: `Report ${report.id}, version ${report.version}` },
            },
          },
        ],
        client_reference_id: String(orderId),
        customer_email: actor!.email ?? undefined,
        metadata,
        payment_intent_data: { metadata, description: `Waygrade report ${report.id} v${report.version}` },
        success_url: `${appUrl}/purchases?checkout={CHECKOUT_SESSION_ID}`,
        cancel_url: `${appUrl}/reports/${report.id}?checkout=cancelled`,
      },
      { idempotencyKey: `waygrade-checkout-order-${orderId}` },
    );
    if (!session.url) throw new AppError('unavailable', 'The payment page could not be opened. Nothing was charged; please try again.');
    await tx.update(orders).set({ providerCheckoutSessionId: session.id }).where(eq(orders.id, orderId));
    return { data: { orderId, checkoutUrl: session.url }, entityId: orderId, detail: { reportId: report.id, amountMinor: fee.amountMinor } };
  },
});

/**
 * The buyer's pending order for this report whose checkout page is still open at the provider, if any.
 * A page the provider has expired or completed is not reused; its own webhook event settles its order.
 */
async function findOpenCheckout(tx: Transaction, buyerId: string, reportId: number) {
  const pending = await tx
    .select({ id: orders.id, sessionId: orders.providerCheckoutSessionId })
    .from(orders)
    .where(and(eq(orders.buyerId, buyerId), eq(orders.reportId, reportId), eq(orders.purpose, 'report'), eq(orders.status, 'pending'), isNotNull(orders.providerCheckoutSessionId)))
    .orderBy(desc(orders.id))
    .limit(3)
    // A locking read sees the order another checkout committed while this one waited for the buyer.
    .for('update');
  for (const order of pending) {
    const session = await stripeClient().checkout.sessions.retrieve(order.sessionId!);
    if (session.status === 'open' && session.url) return { orderId: order.id, url: session.url };
  }
  return null;
}
