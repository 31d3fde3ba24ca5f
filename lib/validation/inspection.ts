import { z } from 'zod';

const isoDate = z.iso.date('Pick a date');

/** A seller's request for an inspection. */
export const inspectionRequestSchema = z.object({
  machineId: z.coerce.number().int().positive(),
  preferredDates: z
    .array(isoDate)
    .min(1, 'Offer at least one date')
    .max(3, 'At most three dates')
    .refine((dates) => dates.every((d) => d >= new Date().toISOString().slice(0, 10)), 'Dates must be today or later'),
  siteAccessNotes: z.string().trim().max(1000).optional().default(''),
  siteContactName: z.string().trim().min(1, 'Who meets the inspector?').max(120),
  siteContactPhone: z
    .string()
    .trim()
    .min(6, 'Enter a phone number the inspector can call')
    .max(40)
    .regex(/^[+0-9 ()\-/]+$/, 'Digits, spaces and + ( ) - / only'),
});

/** The coordinator books a visit and assigns an inspector. Times are local wall-clock in UTC here. */
export const bookingSchema = z.object({
  inspectionId: z.coerce.number().int().positive(),
  inspectorId: z.string().uuid('Choose an inspector'),
  date: isoDate,
  time: z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use a time like 09:30'),
  feeEuros: z.coerce.number().min(0, 'Fee cannot be negative').max(100_000),
});

export const cancelSchema = z.object({
  inspectionId: z.coerce.number().int().positive(),
  reason: z.string().trim().min(5, 'Give a short reason the seller can read').max(1000),
});

export const reviewDecisionSchema = z.object({
  inspectionId: z.coerce.number().int().positive(),
  reportId: z.coerce.number().int().positive(),
  comment: z.string().trim().max(2000).optional().default(''),
});

export const sendBackSchema = reviewDecisionSchema.extend({
  comment: z.string().trim().min(5, 'Tell the inspector what to look at again').max(2000),
});
