import 'server-only';
import { and, eq, inArray } from 'drizzle-orm';
import { db } from '@/db/client';
import { orders, reinspectionRequests } from '@/db/schema';
import { findInspectionFee } from '@/db/queries/fees';
import { findReportDecisionFacts } from '@/db/queries/report-decision';
import { findReinspectionBasis, lockOpenInspectionOfMachine } from '@/db/queries/reinspection-requests';
import { defineOperation } from '@/lib/auth/operation';
import { reportCurrency } from '@/lib/decision/report-currency';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';
import { stripeClient } from '@/lib/payments/stripe-client';
import { reportIdSchema } from '@/lib/validation/payments';
import { reinspectionOffer } from './offer';

/**
 * A buyer, dealer or the machine's seller starts paying for a new inspection of a machine whose
 * released report is stale or nearly so: a pending order of purpose "reinspection", the request
 * waiting for payment, and a hosted checkout page for the inspection fee of the machine's size.
 * Nothing reaches the coordinators here; only the provider's webhook confirms the payment.
 */
export const startReinspectionCheckout = defineOperation({
  name: 'reinspection.checkout',
  entityType: 'order',
  access: 'reinspection.request',
  input: reportIdSchema,
  // A seller may only ask for their own machine; buyers and dealers for any listed one.
  async authorize({ actor, input }) {
    if (actor?.role !== 'seller') return true;
    const basis = await findReinspectionBasis(db, input.reportId);
    return basis?.sellerId === actor.id;
  },
  async run({ actor, input, tx }) {
    const basis = await findReinspectionBasis(tx, input.reportId);
    if (!basis || basis.reportStatus !== 'released') throw new AppError('not_found', 'This report is not released.');
    if (basis.supersededById) throw new AppError('conflict', 'A newer version of this report has been released; request the re-inspection from that one.');
    if (basis.listingStatus !== 'listed') throw new AppError('conflict', 'This machine is no longer on the market, so it cannot be inspected again.');
    const facts = await findReportDecisionFacts(basis.reportId);
    if (!facts) throw new AppError('not_found');
    const now = new Date();
    const offer = reinspectionOffer(reportCurrency(facts.inspectedOn ?? now, now, facts.validityDays), now);
    if (!offer.open) throw new AppError('conflict', `This report is current for ${offer.daysLeft} more days; a re-inspection can be requested in its last two weeks or once it is stale.`);
    if (await lockOpenInspectionOfMachine(tx, basis.machineId)) {
      throw new AppError('conflict', 'A new inspection of this machine is already under way; its report will be offered here when released.');
    }
    const [mine] = await tx
      .select({ id: reinspectionRequests.id })
      .from(reinspectionRequests)
      .where(and(eq(reinspectionRequests.machineId, basis.machineId), eq(reinspectionRequests.requesterId, actor!.id), inArray(reinspectionRequests.status, ['paid', 'refund_due'])))
      .limit(1);
    if (mine) throw new AppError('conflict', 'You have already paid for a re-inspection of this machine.');
    const fee = await findInspectionFee(tx, basis.machineType, basis.sizeClass);
    if (!fee) throw new AppError('conflict', 'No inspection fee is set for this size of machine yet. Please try again later.');

    const [order] = await tx
      .insert(orders)
      .values({ reportId: basis.reportId, buyerId: actor!.id, purpose: 'reinspection', amountMinor: fee.amountMinor, currency: fee.currency, status: 'pending' })
      .$returningId();
    const orderId = order!.id;
    const [request] = await tx
      .insert(reinspectionRequests)
      .values({ machineId: basis.machineId, basedOnReportId: basis.reportId, requesterId: actor!.id, orderId, status: 'awaiting_payment' })
      .$returningId();
    const appUrl = env().APP_URL.replace(/\/$/, '');
    const machineName = `${basis.maker} ${basis.model}${basis.serialNumber ? `, serial ${basis.serialNumber}` : ''}`;
    const metadata = { orderId: String(orderId), reinspectionRequestId: String(request!.id), purpose: 'reinspection' };
    // Created inside the transaction: if the provider refuses, the pending order and request go with it.
    const session = await stripeClient().checkout.sessions.create(
      {
        mode: 'payment',
        line_items: [
          {
            quantity: 1,
            price_data: {
              currency: fee.currency.toLowerCase(),
              unit_amount: fee.amountMinor,
              product_data: {
                name: `Waygrade re-inspection: ${machineName}`,
                description: 'A new on-site inspection and report. Refunded automatically if the machine sells before the visit starts.',
              },
            },
          },
        ],
        client_reference_id: String(orderId),
        customer_email: actor!.email ?? undefined,
        metadata,
        payment_intent_data: { metadata, description: `Waygrade re-inspection request ${request!.id}` },
        success_url: `${appUrl}/reports/${basis.reportId}?reinspection=returned`,
        cancel_url: `${appUrl}/reports/${basis.reportId}?reinspection=cancelled`,
      },
      { idempotencyKey: `waygrade-checkout-order-${orderId}` },
    );
    if (!session.url) throw new AppError('unavailable', 'The payment page could not be opened. Nothing was charged; please try again.');
    await tx.update(orders).set({ providerCheckoutSessionId: session.id }).where(eq(orders.id, orderId));
    return {
      data: { orderId, requestId: request!.id, checkoutUrl: session.url },
      entityId: orderId,
      detail: { reinspectionRequestId: request!.id, reportId: basis.reportId, machineId: basis.machineId, amountMinor: fee.amountMinor },
    };
  },
});
