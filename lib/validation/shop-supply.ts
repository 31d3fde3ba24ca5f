import { z } from 'zod';

/** The buyer's shop supply: what the machine will be plugged into. */
export const shopSupplySchema = z.object({
  supplyVoltage: z.coerce.number('Enter the voltage in volts').int('Whole volts').min(100, 'At least 100 V').max(1000, 'At most 1000 V'),
  supplyPhases: z.coerce.number().pipe(z.union([z.literal(1), z.literal(3)], 'Single or three phase')),
});

export type ShopSupplyFormInput = z.input<typeof shopSupplySchema>;
export type ShopSupplyForm = z.output<typeof shopSupplySchema>;
