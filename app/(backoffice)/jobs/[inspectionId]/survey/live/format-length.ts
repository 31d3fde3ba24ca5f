import type { SectionUnit } from '@/lib/survey/section-unit';

// Readings are shown to the instrument's resolution: thousandths of a mm, ten-thousandths of an inch.
const DECIMALS: Readonly<Record<SectionUnit, number>> = { mm: 3, in: 4 };

export function formatLength(value: number, unit: SectionUnit): string {
  return `${value.toFixed(DECIMALS[unit])} ${unit}`;
}
