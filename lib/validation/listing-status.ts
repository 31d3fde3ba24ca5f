import { z } from 'zod';

/** The seller's one-click listing changes on the machine page. */
export const listingStatusSchema = z.object({
  machineId: z.coerce.number().int().positive('Unknown machine'),
  listingStatus: z.enum(['listed', 'sold', 'withdrawn'], 'Choose listed, sold or withdrawn'),
});
