import { z } from 'zod';
import { SALE_TERMS, USAGE_KINDS } from '@/lib/decision/seller-disclosure';

const optionalNumber = <S extends z.ZodType<number, number>>(schema: S) =>
  z.preprocess((value) => (value === '' || value === null || value === undefined ? undefined : value), z.coerce.number().pipe(schema).optional());

/**
 * The seller's disclosure form. A yes/no question is answered "none known" or with a description,
 * so "no known faults" is a choice the seller makes, never an empty box left by accident.
 */
export const sellerDisclosureSchema = z
  .object({
    hasKnownFaults: z.enum(['no', 'yes'], 'Answer whether you know of any faults'),
    knownFaults: z.string().trim().max(2000).optional().default(''),
    hasRepairs: z.enum(['no', 'yes'], 'Answer whether it has been repaired or rebuilt'),
    repairsAndRebuilds: z.string().trim().max(2000).optional().default(''),
    hasCrashes: z.enum(['no', 'yes'], 'Answer whether it has been crashed or dropped'),
    crashesOrDrops: z.string().trim().max(2000).optional().default(''),
    usage: z.enum(USAGE_KINDS, 'Choose how the machine was used'),
    usageNotes: z.string().trim().max(1000).optional().default(''),
    supplyVoltage: optionalNumber(z.number().int('Whole volts').min(100, 'At least 100 V').max(1000, 'At most 1000 V')),
    supplyPhases: optionalNumber(z.union([z.literal(1), z.literal(3)], 'Single or three phase')),
    included: z.string().trim().max(2000).optional().default(''),
    saleTerm: z.enum(SALE_TERMS, 'Choose the terms of sale'),
  })
  .superRefine((v, ctx) => {
    const described: Array<[keyof typeof v, keyof typeof v, string]> = [
      ['hasKnownFaults', 'knownFaults', 'Describe the faults you know of'],
      ['hasRepairs', 'repairsAndRebuilds', 'Describe the repairs or rebuilds'],
      ['hasCrashes', 'crashesOrDrops', 'Describe what happened'],
    ];
    for (const [answer, text, message] of described) {
      if (v[answer] === 'yes' && !String(v[text]).trim()) ctx.addIssue({ code: 'custom', path: [text], message });
    }
    if ((v.supplyVoltage === undefined) !== (v.supplyPhases === undefined)) {
      ctx.addIssue({ code: 'custom', path: [v.supplyVoltage === undefined ? 'supplyVoltage' : 'supplyPhases'], message: 'Give both the voltage and the phases, or neither' });
    }
  });

export type SellerDisclosureFormInput = z.input<typeof sellerDisclosureSchema>;
export type SellerDisclosureForm = z.output<typeof sellerDisclosureSchema>;
