import { z } from 'zod';
import { LATHE_KINDS, LISTING_STATUSES } from '@/db/schema/machines';

const optionalNumber = <S extends z.ZodType<number, number>>(schema: S) =>
  z.preprocess((value) => (value === '' || value === null || value === undefined ? undefined : value), z.coerce.number().pipe(schema).optional());

const currentYear = new Date().getUTCFullYear();

/** No line break, tab or other control character anywhere: C0 controls, DEL and the C1 range. */
const ONE_LINE = /^[^\u0000-\u001f\u007f-\u009f\u2028\u2029]*$/;

/**
 * A field shown on one line (on the page, in the PDF, in a CSV cell): a line break or another control
 * character in it is refused with a message, not silently kept or dropped.
 */
const singleLine = (label: string) => z.string().regex(ONE_LINE, `Keep the ${label} on one line, without line breaks, tabs or other control characters`).trim();

/** A seller's machine listing. Sizes in mm, power in kW, asking price in whole euros. */
export const machineFormSchema = z.object({
  maker: singleLine('maker').min(1, 'Enter the maker as on the nameplate').max(120),
  model: singleLine('model').min(1, 'Enter the model').max(120),
  serialNumber: singleLine('serial number').max(80).optional().default(''),
  latheKind: z.enum(LATHE_KINDS),
  yearBuilt: optionalNumber(z.number().int('Whole years only').min(1900, 'Year looks too early').max(currentYear, 'Year cannot be in the future')),
  swingMm: z.coerce.number().int('Whole millimetres').min(100, 'Swing over bed is at least 100 mm').max(3000, 'Swing over bed above 3000 mm is not a centre lathe we grade'),
  betweenCentresMm: z.coerce.number().int('Whole millimetres').min(150, 'At least 150 mm').max(20000, 'At most 20 000 mm'),
  spindleBoreMm: optionalNumber(z.number().int().min(5).max(1000)),
  motorKw: optionalNumber(z.number().min(0.1, 'At least 0.1 kW').max(500)),
  supplyVoltage: optionalNumber(z.number().int().min(100).max(1000)),
  supplyPhases: optionalNumber(z.union([z.literal(1), z.literal(3)])),
  town: singleLine('town').min(1, 'Where is the machine?').max(120),
  region: singleLine('region').min(1, 'Enter the region').max(120),
  askingPrice: optionalNumber(z.number().int('Whole euros').min(0).max(10_000_000)),
  accessories: z.string().trim().max(2000).optional().default(''),
  description: z.string().trim().max(5000).optional().default(''),
  listingStatus: z.enum(LISTING_STATUSES).default('draft'),
});

export type MachineFormInput = z.input<typeof machineFormSchema>;
export type MachineForm = z.output<typeof machineFormSchema>;
