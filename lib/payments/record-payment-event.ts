import 'server-only';
import { z } from 'zod';
import { defineOperation } from '@/lib/auth/operation';
import { applyPaymentEvent, type PaymentProvider } from './apply-payment-event';
import { stripePaymentProvider } from './stripe-payment-provider';

/** The parts of a provider event the handling reads; the rest of the object passes through. */
const paymentEventSchema = z.looseObject({
  id: z.string().min(1).max(255),
  type: z.string().min(1).max(100),
  created: z.number().int(),
  data: z.looseObject({ object: z.looseObject({}) }),
});

/**
 * A payment provider event. Public, because the provider has no session: the route handler only
 * calls this after `stripe.webhooks.constructEvent` has verified the signature on the raw body.
 */
export function recordPaymentEventOperation(provider: () => PaymentProvider = () => stripePaymentProvider()) {
  return defineOperation({
    name: 'payment.webhook',
    entityType: 'payment_event',
    access: 'public',
    input: paymentEventSchema,
    async run({ input, tx }) {
      const result = await applyPaymentEvent(tx, input, provider());
      return { data: result, entityId: result.orderId, detail: { eventId: input.id, type: input.type, outcome: result.outcome } };
    },
  });
}

export const recordPaymentEvent = recordPaymentEventOperation();
