import { z } from 'zod';

/** How long a released report speaks for the machine before it is shown as stale. */
export const reportValiditySchema = z.object({
  validityDays: z.coerce.number('Enter a number of days').int('Whole days').min(1, 'At least 1 day').max(3650, 'At most 3650 days'),
});
