import type { SIZE_CLASSES } from '@/db/schema/machines';

export type SizeClass = (typeof SIZE_CLASSES)[number];

/**
 * Fee and handling class by swing over bed. The 800 mm line follows the swing class the lathe test
 * standards use for their limits (see domain notes); 400 mm separates bench and small floor lathes
 * (common practice, no source).
 */
const SIZE_CLASS_LIMITS: ReadonlyArray<{ maxSwingMm: number; sizeClass: SizeClass }> = [
  { maxSwingMm: 400, sizeClass: 'small' },
  { maxSwingMm: 800, sizeClass: 'medium' },
  { maxSwingMm: Number.POSITIVE_INFINITY, sizeClass: 'large' },
];

export function sizeClassForSwing(swingMm: number): SizeClass {
  return SIZE_CLASS_LIMITS.find((limit) => swingMm <= limit.maxSwingMm)!.sizeClass;
}

export const SIZE_CLASS_LABELS: Record<SizeClass, string> = {
  small: 'Small (swing up to 400 mm)',
  medium: 'Medium (swing 401–800 mm)',
  large: 'Large (swing over 800 mm)',
};
