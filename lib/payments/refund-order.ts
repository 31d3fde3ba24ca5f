import 'server-only';
import { lockOrderWithContext } from '@/db/queries/purchases';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { refundOrderSchema } from '@/lib/validation/payments';
import type { PaymentProvider } from './apply-payment-event';
import { markOrderRefunded } from './order-transitions';
import { stripePaymentProvider } from './stripe-payment-provider';

/**
 * A coordinator refunds a paid order: the provider returns the money, the buyer's access is
 * revoked and the buyer is told, all or nothing. The provider's later `charge.refunded` event
 * finds the order already refunded and changes nothing.
 */
export function refundOrderOperation(provider: () => PaymentProvider = () => stripePaymentProvider()) {
  return defineOperation({
    name: 'order.refund',
    entityType: 'order',
    access: 'payments.refund',
    input: refundOrderSchema,
    async run({ actor, input, tx }) {
      const ctx = await lockOrderWithContext(tx, input.orderId);
      if (!ctx) throw new AppError('not_found');
      if (ctx.order.status !== 'paid') throw new AppError('conflict', `Only a paid order can be refunded; this one is ${ctx.order.status}.`);
      if (!ctx.order.providerPaymentIntentId) throw new AppError('conflict', 'This order has no payment on record with the provider, so it cannot be refunded here.');
      const { refundId } = await provider().refundPayment({ orderId: ctx.order.id, paymentIntentId: ctx.order.providerPaymentIntentId, reason: input.reason });
      await markOrderRefunded(tx, ctx, { refundId, reason: input.reason, at: new Date(), by: { id: actor!.id, name: actor!.name ?? 'a Waygrade coordinator' } });
      return { data: { orderId: ctx.order.id, refundId }, entityId: ctx.order.id, detail: { refundId, reason: input.reason } };
    },
  });
}

export const refundOrder = refundOrderOperation();
