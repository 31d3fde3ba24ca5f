import type { LengthUnit } from '@/lib/scoring';

/**
 * The unit an inspector reads a section in: the instrument is metric or inch, chosen once per
 * section. Every length typed on that screen is stored with this unit.
 */
export const SECTION_UNITS = [
  { unit: 'mm', label: 'Metric', hint: 'mm' },
  { unit: 'in', label: 'Inch', hint: 'in' },
] as const satisfies ReadonlyArray<{ unit: LengthUnit; label: string; hint: string }>;
export type SectionUnit = (typeof SECTION_UNITS)[number]['unit'];

const LENGTH_UNIT_SET = new Set<string>(['mm', 'µm', 'in', 'thou', 'tenths']);
const INCH_FAMILY = new Set<string>(['in', 'thou', 'tenths']);

/** Walks a section's values for the first length and reports its family; metric when none yet. */
export function sectionUnitOf(sectionData: unknown): SectionUnit {
  const stack: unknown[] = [sectionData];
  while (stack.length) {
    const node = stack.shift();
    if (!node || typeof node !== 'object') continue;
    const record = node as Record<string, unknown>;
    if (typeof record.unit === 'string' && LENGTH_UNIT_SET.has(record.unit)) return INCH_FAMILY.has(record.unit) ? 'in' : 'mm';
    stack.push(...Object.values(record));
  }
  return 'mm';
}

/**
 * Re-tags every length in a section with the chosen unit, keeping the numbers: the inspector
 * switches the unit to say which scale the figures on this screen were read from.
 */
export function withSectionUnit<T>(sectionData: T, unit: SectionUnit): T {
  if (Array.isArray(sectionData)) return sectionData.map((item) => withSectionUnit(item, unit)) as T;
  if (!sectionData || typeof sectionData !== 'object') return sectionData;
  const record = sectionData as Record<string, unknown>;
  const isLength = typeof record.unit === 'string' && LENGTH_UNIT_SET.has(record.unit);
  const entries = Object.entries(record).map(([key, value]) => [key, key === 'unit' && isLength ? unit : withSectionUnit(value, unit)]);
  return Object.fromEntries(entries) as T;
}
