import { z } from 'zod';
import { INCLUSION_CONDITIONS, INCLUSION_KINDS } from '@/db/schema/machine-inclusions';

/** One thing that comes with the machine. Replacement cost in whole euros, optional. */
export const inclusionSchema = z.object({
  kind: z.enum(INCLUSION_KINDS, 'Choose what it is'),
  description: z.string().trim().min(1, 'Describe it, e.g. “250 mm 3-jaw chuck”').max(200),
  condition: z.enum(INCLUSION_CONDITIONS, 'Choose its condition'),
  replacementCost: z.preprocess(
    (value) => (value === '' || value === null || value === undefined ? undefined : value),
    z.coerce.number('Whole euros').int('Whole euros').min(0, 'Zero or more').max(1_000_000, 'At most €1 000 000').optional(),
  ),
});

export type InclusionFormInput = z.input<typeof inclusionSchema>;
export type InclusionForm = z.output<typeof inclusionSchema>;
