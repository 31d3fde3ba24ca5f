import { z } from 'zod';
import { CONDITION_GRADES } from '@/db/schema/reports';
import { SALE_KINDS } from '@/db/schema/market';

const blankToUndefined = (value: unknown) => (value === '' || value === null || (typeof value === 'string' && value.trim() === '') ? undefined : value);
const optionalText = (max: number) => z.preprocess(blankToUndefined, z.string().trim().max(max, `At most ${max} characters`).optional());

export const SALE_KIND_LABELS: Record<(typeof SALE_KINDS)[number], string> = {
  dealer_retail: 'Dealer retail',
  private: 'Private sale',
  auction: 'Auction',
  liquidation: 'Liquidation',
};

/**
 * One comparable sale, as an admin types it or as one CSV row: sizes in mm, price in whole units
 * of the currency. The form and the import validate with this same schema.
 */
export const comparableSaleSchema = z.object({
  description: z.string({ error: 'Describe the machine sold' }).trim().min(3, 'Describe the machine sold (maker, model, year)').max(200, 'At most 200 characters'),
  swingMm: z.coerce.number({ error: 'Swing over bed in whole mm' }).int('Whole millimetres').min(100, 'Swing over bed is at least 100 mm').max(3000, 'At most 3000 mm'),
  betweenCentresMm: z.preprocess(blankToUndefined, z.coerce.number({ error: 'Between centres in whole mm' }).int('Whole millimetres').min(150, 'At least 150 mm').max(20000, 'At most 20 000 mm').optional()),
  yearBuilt: z.preprocess(
    blankToUndefined,
    z.coerce.number({ error: 'A year such as 1987' }).int('Whole years').min(1900, 'Year looks too early').max(new Date().getUTCFullYear(), 'Year cannot be in the future').optional(),
  ),
  condition: z.preprocess(blankToUndefined, z.enum(CONDITION_GRADES, { error: `Condition is one of ${CONDITION_GRADES.join(', ')}` }).optional()),
  saleKind: z.enum(SALE_KINDS, { error: `Kind of sale is one of ${SALE_KINDS.join(', ')}` }),
  price: z.coerce.number({ error: 'Price in whole units, e.g. 8500' }).int('Whole units, no cents').min(1, 'Price must be above 0').max(10_000_000, 'At most 10 000 000'),
  currency: z.preprocess(blankToUndefined, z.string().trim().toUpperCase().regex(/^[A-Z]{3}$/, 'A three-letter currency code such as EUR').default('EUR')),
  soldOn: z.iso
    .date('Date sold as YYYY-MM-DD')
    .refine((day) => day <= new Date().toISOString().slice(0, 10), 'The sale date cannot be in the future'),
  region: optionalText(120),
  source: optionalText(200),
});

export type ComparableSaleInput = z.input<typeof comparableSaleSchema>;
export type ComparableSale = z.output<typeof comparableSaleSchema>;

/** The import: the CSV text as read in the browser, bounded so one upload cannot tie up the server. */
export const comparableSalesImportSchema = z.object({
  csv: z.string({ error: 'Choose a CSV file' }).min(1, 'The file is empty').max(2_000_000, 'The file is larger than 2 MB; split it'),
});
