import 'server-only';
import type { Actor, Transaction } from '@/lib/auth/operation';
import type { PaymentProvider } from '@/lib/payments/apply-payment-event';
import { stripePaymentProvider } from '@/lib/payments/stripe-payment-provider';
import { cancelReinspectionsBeforeVisit, REINSPECTION_CANCEL_REASONS, type BeforeVisitCancellation } from './refund-reinspections';

type ListingStatus = 'draft' | 'listed' | 'sold' | 'withdrawn';

/**
 * When a listing becomes sold or withdrawn, paid re-inspections whose visit has not started are
 * cancelled and refunded. Call with the machine row locked and its status already changed, in the
 * same transaction. Nothing happens when the status did not change into sold or withdrawn.
 */
export async function endReinspectionsWhenListingEnds(
  tx: Transaction,
  input: { machineId: number; from: ListingStatus | null; to: ListingStatus; actor: Actor },
  provider: () => PaymentProvider = () => stripePaymentProvider(),
): Promise<BeforeVisitCancellation | null> {
  if (input.from === input.to || (input.to !== 'sold' && input.to !== 'withdrawn')) return null;
  const cancelledBy = input.actor.role === 'admin' ? `${input.actor.name ?? 'A coordinator'} (Waygrade)` : `${input.actor.name ?? 'The seller'} (seller)`;
  return cancelReinspectionsBeforeVisit(
    tx,
    { machineId: input.machineId, reason: REINSPECTION_CANCEL_REASONS[input.to], actorId: input.actor.id, cancelledBy },
    lazyProvider(provider),
  );
}

/** Builds the provider only if a refund is actually attempted. */
export function lazyProvider(provider: () => PaymentProvider): PaymentProvider {
  let built: PaymentProvider | undefined;
  const get = () => (built ??= provider());
  return {
    orderIdOfPayment: (paymentIntentId) => get().orderIdOfPayment(paymentIntentId),
    refundPayment: (input) => get().refundPayment(input),
  };
}
