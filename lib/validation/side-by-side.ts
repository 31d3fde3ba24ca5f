import { z } from 'zod';

/** ?reports=12,40,7 — two to four different report ids, in the order the dealer picked them. */
export const sideBySideSchema = z.object({
  reports: z.preprocess(
    (value) => (typeof value === 'string' ? value.split(',').map((part) => part.trim()) : value),
    z
      .array(z.coerce.number().int().positive('Not a report'), { error: 'Choose machines in the comparison table first' })
      .min(2, 'Pick at least two machines to compare')
      .max(4, 'Side by side shows at most four machines')
      .refine((ids) => new Set(ids).size === ids.length, 'Each machine once'),
  ),
});
