import { z } from 'zod';
import { HEAVY_ENDS } from '@/db/schema/machine-moving-sheets';
import { SITE_ACCESS } from '@/lib/decision/rigging-estimate';

const optionalMm = z.preprocess(
  (value) => (value === '' || value === null || value === undefined ? undefined : value),
  z.coerce.number().int('Whole millimetres').min(100, 'At least 100 mm').max(30_000, 'At most 30 000 mm').optional(),
);

/** What riggers need: weight in kg, footprint and height in mm, the heavy end, the way out, the deadline. */
export const movingSheetSchema = z.object({
  weightKg: z.coerce.number('Enter the weight in kg').int('Whole kilograms').min(20, 'At least 20 kg').max(100_000, 'At most 100 000 kg'),
  lengthMm: optionalMm,
  widthMm: optionalMm,
  heightMm: optionalMm,
  heavyEnd: z.enum(HEAVY_ENDS),
  siteAccess: z.enum(SITE_ACCESS, 'Choose how riggers reach the machine'),
  accessNotes: z.string().trim().max(500).optional().default(''),
  removalBy: z.union([z.literal(''), z.iso.date('Enter a date')]).optional().default(''),
});

export type MovingSheetFormInput = z.input<typeof movingSheetSchema>;
export type MovingSheetForm = z.output<typeof movingSheetSchema>;
