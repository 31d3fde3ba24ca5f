import { z } from 'zod';
import { LATHE_KINDS } from '@/db/schema/machines';
import { CONDITION_GRADES } from '@/db/schema/reports';
import { SUBSYSTEMS, type SubsystemId } from '@/lib/scoring/subsystems';

// The comparison table's query as it travels in the URL and to /api/compare. Parsed strictly: an
// unknown key, a sort column outside the allow-list or a malformed value is refused with 400 and the
// field named, never guessed at, because the same parameters reach SQL.

/** Short URL keys for the subsystems, so a shared link stays readable. */
export const SUBSYSTEM_KEYS = {
  'bed-and-ways': 'bed',
  'spindle-and-headstock': 'spindle',
  'gearbox-and-feeds': 'gearbox',
  'slides-and-screws': 'slides',
  tailstock: 'tailstock',
  drive: 'drive',
  'electrical-and-safety': 'electrical',
  accessories: 'accessories',
} as const satisfies Record<SubsystemId, string>;
export type SubsystemKey = (typeof SUBSYSTEM_KEYS)[SubsystemId];
export const SUBSYSTEM_KEY_LIST = SUBSYSTEMS.map((id) => SUBSYSTEM_KEYS[id]);
export const subsystemOfKey = (key: string): SubsystemId | undefined => SUBSYSTEMS.find((id) => SUBSYSTEM_KEYS[id] === key);

/** Every column the table may be sorted by; nothing else reaches ORDER BY. */
export const SORT_COLUMNS = [
  'machine',
  'kind',
  'swing',
  'centres',
  'year',
  'location',
  'condition',
  ...SUBSYSTEM_KEY_LIST,
  'confidence',
  'price',
  'value',
  'ratio',
  'repair',
  'landed',
  'inclusions',
  'dealBreakers',
  'daysListed',
  'reportAge',
  'released',
] as const;
export type SortColumn = (typeof SORT_COLUMNS)[number];

export const DEAL_BREAKER_FILTERS = ['none', 'any'] as const;

export const PAGE_SIZES = [25, 50, 100] as const;
export const DEFAULT_SORT: { sort: SortColumn; dir: 'asc' | 'desc' } = { sort: 'condition', dir: 'desc' };

// Words, digits and the few marks that occur in makers, models and place names; quotes, semicolons,
// comment markers and brackets are refused outright.
const PLAIN_TEXT = /^[\p{L}\p{N}][\p{L}\p{N} .&/-]*$/u;
const plainText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `At most ${max} characters`)
    .regex(PLAIN_TEXT, 'Only letters, digits, spaces and . & / - are allowed')
    .refine((value) => !value.includes('--'), 'Only letters, digits, spaces and . & / - are allowed');

const emptyToUndefined = (value: unknown) => (value === '' || value === null ? undefined : value);

/**
 * A comma-separated multi-select, e.g. condition=Good,Fair. A bad choice is reported on the field
 * itself (not at a list position), quoting the choice.
 */
const multi = <T extends z.ZodType<string, string>>(item: T, maxItems = 20) =>
  z.preprocess(
    (value) => (typeof value === 'string' ? (value.trim() === '' ? undefined : value.split(',').map((part) => part.trim())) : emptyToUndefined(value)),
    z
      .array(z.string(), { error: 'A comma-separated list' })
      .max(maxItems, `At most ${maxItems} choices`)
      .optional()
      .transform((values, ctx) => {
        if (!values) return undefined;
        const chosen: Array<z.output<T>> = [];
        for (const value of values) {
          const parsed = item.safeParse(value);
          if (parsed.success) chosen.push(parsed.data);
          else ctx.addIssue({ code: 'custom', message: `“${value.slice(0, 40)}”: ${parsed.error.issues[0]?.message ?? 'not a choice'}` });
        }
        return chosen;
      }),
  );

const whole = (min: number, max: number, unit: string) =>
  z.preprocess(emptyToUndefined, z.coerce.number({ error: `Enter a number in ${unit}` }).int(`Whole ${unit} only`).min(min, `At least ${min} ${unit}`).max(max, `At most ${max} ${unit}`).optional());

const decimal = (min: number, max: number, what: string) =>
  z.preprocess(emptyToUndefined, z.coerce.number({ error: `Enter ${what} as a number` }).min(min, `At least ${min}`).max(max, `At most ${max}`).optional());

const isoDay = z.preprocess(emptyToUndefined, z.iso.date('Use a date as YYYY-MM-DD').optional());

const grades = multi(z.enum(CONDITION_GRADES, { error: `Grades are ${CONDITION_GRADES.join(', ')}` }), CONDITION_GRADES.length);

const subsystemGradeFilters = Object.fromEntries(SUBSYSTEM_KEY_LIST.map((key) => [`grade.${key}`, grades])) as Record<`grade.${SubsystemKey}`, typeof grades>;

/** Ranges that must not be upside down: [from field, to field]. */
const RANGE_PAIRS = [
  ['swingMin', 'swingMax'],
  ['centresMin', 'centresMax'],
  ['yearMin', 'yearMax'],
  ['confidenceMin', 'confidenceMax'],
  ['priceMin', 'priceMax'],
  ['valueMin', 'valueMax'],
  ['ratioMin', 'ratioMax'],
  ['repairMin', 'repairMax'],
  ['landedMin', 'landedMax'],
  ['inclusionsMin', 'inclusionsMax'],
  ['daysListedMin', 'daysListedMax'],
  ['reportAgeMin', 'reportAgeMax'],
  ['releasedFrom', 'releasedTo'],
] as const;

export const comparisonFiltersShape = {
  q: z.preprocess(emptyToUndefined, plainText(80).optional()),
  kind: multi(z.enum(LATHE_KINDS, { error: `Types are ${LATHE_KINDS.join(', ')}` }), LATHE_KINDS.length),
  region: multi(plainText(120)),
  condition: grades,
  ...subsystemGradeFilters,
  swingMin: whole(0, 5000, 'mm'),
  swingMax: whole(0, 5000, 'mm'),
  centresMin: whole(0, 30000, 'mm'),
  centresMax: whole(0, 30000, 'mm'),
  yearMin: whole(1850, 2100, 'years'),
  yearMax: whole(1850, 2100, 'years'),
  // Confidence in percent, as the table shows it.
  confidenceMin: whole(0, 100, '%'),
  confidenceMax: whole(0, 100, '%'),
  // Money in whole euros, as a dealer types it; the query converts to minor units.
  priceMin: whole(0, 100_000_000, '€'),
  priceMax: whole(0, 100_000_000, '€'),
  valueMin: whole(0, 100_000_000, '€'),
  valueMax: whole(0, 100_000_000, '€'),
  ratioMin: decimal(0, 100, 'the price ÷ value ratio'),
  ratioMax: decimal(0, 100, 'the price ÷ value ratio'),
  repairMin: whole(0, 100_000_000, '€'),
  repairMax: whole(0, 100_000_000, '€'),
  landedMin: whole(0, 100_000_000, '€'),
  landedMax: whole(0, 100_000_000, '€'),
  inclusionsMin: whole(0, 100_000_000, '€'),
  inclusionsMax: whole(0, 100_000_000, '€'),
  /** "none": no deal-breaker recorded; "any": at least one. */
  dealBreakers: z.preprocess(emptyToUndefined, z.enum(DEAL_BREAKER_FILTERS, { error: `Deal-breakers are ${DEAL_BREAKER_FILTERS.join(' or ')}` }).optional()),
  // Whole UTC days, as the report page counts them.
  daysListedMin: whole(0, 36_500, 'days'),
  daysListedMax: whole(0, 36_500, 'days'),
  reportAgeMin: whole(0, 36_500, 'days'),
  reportAgeMax: whole(0, 36_500, 'days'),
  releasedFrom: isoDay,
  releasedTo: isoDay,
  shortlist: z.preprocess(emptyToUndefined, z.coerce.number().int().positive('Not a shortlist').optional()),
};

function rangesInOrder(value: Record<string, unknown>, ctx: z.core.$RefinementCtx) {
  for (const [from, to] of RANGE_PAIRS) {
    const low = value[from];
    const high = value[to];
    if (low !== undefined && high !== undefined && (low as number | string) > (high as number | string)) {
      ctx.addIssue({ code: 'custom', path: [to], message: 'The upper end is below the lower end' });
    }
  }
}

export const comparisonFiltersSchema = z.strictObject(comparisonFiltersShape).superRefine(rangesInOrder);

export const comparisonQuerySchema = z
  .strictObject({
    ...comparisonFiltersShape,
    sort: z.enum(SORT_COLUMNS, { error: 'Not a column the table can be sorted by' }).default(DEFAULT_SORT.sort),
    dir: z.enum(['asc', 'desc'], { error: 'Sort direction is asc or desc' }).default(DEFAULT_SORT.dir),
    page: z.preprocess(emptyToUndefined, z.coerce.number().int('Whole pages only').min(1, 'Pages start at 1').max(10_000).default(1)),
    pageSize: z.preprocess(
      emptyToUndefined,
      z.coerce
        .number()
        .refine((n): n is (typeof PAGE_SIZES)[number] => (PAGE_SIZES as readonly number[]).includes(n), `Page size is one of ${PAGE_SIZES.join(', ')}`)
        .default(50),
    ),
  })
  .superRefine(rangesInOrder);

export type ComparisonQuery = z.output<typeof comparisonQuerySchema>;
export type ComparisonFilters = z.output<typeof comparisonFiltersSchema>;
export type ComparisonQueryParams = Record<string, string>;

/** Keys of the query that filter (everything but sort, direction and paging). */
export const FILTER_KEYS = Object.keys(comparisonFiltersShape) as Array<keyof typeof comparisonFiltersShape>;
