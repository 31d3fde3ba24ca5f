import { z } from 'zod';
import { SIZE_CLASSES } from '@/db/schema/machines';

const id = (what: string) => z.coerce.number().int().positive(`Unknown ${what}`);

export const reportIdSchema = z.object({ reportId: id('report') });

export const refundOrderSchema = z.object({
  orderId: id('order'),
  reason: z.string().trim().min(3, 'Say why the fee is refunded; the buyer reads this').max(300, 'Keep the reason under 300 characters'),
});

/** A fee as typed by a coordinator, in whole euros and cents ("490" or "490.00"), stored in cents. */
export const inspectionFeeSchema = z.object({
  sizeClass: z.enum(SIZE_CLASSES, 'Choose a size class'),
  amount: z
    .string()
    .trim()
    .regex(/^\d{1,5}(\.\d{1,2})?$/, 'Enter an amount in euros, e.g. 490 or 490.00')
    .transform((text) => Math.round(Number(text) * 100))
    .refine((cents) => cents >= 100, 'A fee must be at least €1'),
});
