/**
 * ISO 4406:1999 solid-contamination code: each of the particle counts per mL at ≥4, ≥6 and
 * ≥14 µm(c) is given the scale number whose range contains it; a range runs from just above its
 * lower limit up to and including its upper limit [src: ISO 4406:1999 Table 1]. E.g. 2000/500/60
 * per mL → 18/16/13. The table is not a pure doubling (0.64 → 1.3 → 2.5, 640 → 1300 → 2500 …).
 */

/** Upper limit (inclusive) of scale numbers 0…28, particles per mL. */
export const ISO_4406_UPPER_LIMITS: readonly number[] = [
  0.01, 0.02, 0.04, 0.08, 0.16, 0.32, 0.64, 1.3, 2.5, 5, 10, 20, 40, 80, 160, 320, 640, 1300, 2500, 5000,
  10_000, 20_000, 40_000, 80_000, 160_000, 320_000, 640_000, 1_300_000, 2_500_000,
];

/** Scale number used for counts beyond the top of the table; printed as ">28". */
export const ISO_4406_ABOVE_TABLE = 29;

export function iso4406ScaleNumber(countPerMl: number): number {
  for (let code = 0; code < ISO_4406_UPPER_LIMITS.length; code++) {
    if (countPerMl <= ISO_4406_UPPER_LIMITS[code]!) return code;
  }
  return ISO_4406_ABOVE_TABLE;
}

/** Range of counts per mL for a scale number: more than `above`, up to and including `upTo`. */
export function iso4406Range(scaleNumber: number): { above: number; upTo: number | null } {
  if (scaleNumber <= 0) return { above: 0, upTo: ISO_4406_UPPER_LIMITS[0]! };
  if (scaleNumber >= ISO_4406_ABOVE_TABLE) return { above: ISO_4406_UPPER_LIMITS[28]!, upTo: null };
  return { above: ISO_4406_UPPER_LIMITS[scaleNumber - 1]!, upTo: ISO_4406_UPPER_LIMITS[scaleNumber]! };
}

export interface Iso4406Code {
  atLeast4um: number;
  atLeast6um: number;
  atLeast14um: number;
}

export function iso4406Code(counts: { atLeast4um: number; atLeast6um: number; atLeast14um: number }): Iso4406Code {
  return {
    atLeast4um: iso4406ScaleNumber(counts.atLeast4um),
    atLeast6um: iso4406ScaleNumber(counts.atLeast6um),
    atLeast14um: iso4406ScaleNumber(counts.atLeast14um),
  };
}

function formatScaleNumber(n: number): string {
  return n >= ISO_4406_ABOVE_TABLE ? '>28' : String(n);
}

export function formatIso4406(code: Iso4406Code): string {
  return `${formatScaleNumber(code.atLeast4um)}/${formatScaleNumber(code.atLeast6um)}/${formatScaleNumber(code.atLeast14um)}`;
}

export function parseIso4406(text: string): Iso4406Code | null {
  const m = /^\s*(\d{1,2})\s*\/\s*(\d{1,2})\s*\/\s*(\d{1,2})\s*$/.exec(text);
  if (!m) return null;
  const [a, b, c] = [Number(m[1]), Number(m[2]), Number(m[3])];
  if (a > 28 || b > 28 || c > 28) return null;
  return { atLeast4um: a, atLeast6um: b, atLeast14um: c };
}
