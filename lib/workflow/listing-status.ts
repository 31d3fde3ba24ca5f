import 'server-only';
import { eq } from 'drizzle-orm';
import { machines } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import type { PaymentProvider } from '@/lib/payments/apply-payment-event';
import { stripePaymentProvider } from '@/lib/payments/stripe-payment-provider';
import { endReinspectionsWhenListingEnds } from '@/lib/reinspection/listing-ended';
import { listingStatusSchema } from '@/lib/validation/listing-status';
import { ownsMachine } from './inspection-access';

/**
 * The seller marks a machine sold or withdrawn (or back on the market). Leaving the market cancels
 * paid re-inspections whose visit has not started and refunds their fees in the same step.
 */
export function setListingStatusOperation(provider: () => PaymentProvider = () => stripePaymentProvider()) {
  return defineOperation({
    name: 'machine.listing-status',
    entityType: 'machine',
    access: 'machine.edit.own',
    input: listingStatusSchema,
    authorize: ({ actor, input }) => ownsMachine(actor, input.machineId),
    async run({ actor, input, tx }) {
      const [before] = await tx.select({ listingStatus: machines.listingStatus }).from(machines).where(eq(machines.id, input.machineId)).for('update');
      if (!before) throw new AppError('not_found');
      await tx.update(machines).set({ listingStatus: input.listingStatus }).where(eq(machines.id, input.machineId));
      const ended = await endReinspectionsWhenListingEnds(tx, { machineId: input.machineId, from: before.listingStatus, to: input.listingStatus, actor: actor! }, provider);
      return {
        data: { machineId: input.machineId, listingStatus: input.listingStatus, reinspections: ended },
        entityId: input.machineId,
        detail: { from: before.listingStatus, to: input.listingStatus, ...(ended ?? {}) },
      };
    },
  });
}

export const setListingStatus = setListingStatusOperation();
