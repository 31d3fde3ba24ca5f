import 'server-only';
import { z } from 'zod';
import { defineOperation } from '@/lib/auth/operation';
import { applyPaymentEvent, type PaymentProvider } from './apply-payment-event';
import { stripePaymentProvider } from './stripe-payment-provider';

/** 9999-12-31T23:59:59Z, the last second MariaDB's DATETIME holds. */
const LAST_STORABLE_SECOND = Date.UTC(9999, 11, 31, 23, 59, 59) / 1000;

/** The parts of a provider event the handling reads; the rest of the object passes through. */
const paymentEventSchema = z.looseObject({
  id: z.string().min(1).max(255),
  type: z.string().min(1).max(100),
  // Seconds since 1970, as the provider sends them; refused past what a date column holds (9999-12-31),
  // so an absurd value is a clear 400 and not a failed write.
  created: z.number().int().min(0).max(LAST_STORABLE_SECOND),
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
