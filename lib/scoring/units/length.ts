/**
 * Length units an inspector may type in, and their conversion to millimetres (the canonical unit
 * inside the library). The inch is exactly 25.4 mm by the 1959 international yard and pound
 * agreement; a thou is 0.001 in and a "tenth" (shop word) is 0.0001 in.
 */
export const LENGTH_UNITS = ['mm', 'µm', 'in', 'thou', 'tenths'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

export interface Length {
  value: number;
  unit: LengthUnit;
}

export const MM_PER_LENGTH_UNIT: Readonly<Record<LengthUnit, number>> = {
  mm: 1,
  'µm': 0.001,
  in: 25.4,
  thou: 0.0254,
  tenths: 0.00254,
};

export function toMillimetres(length: Length): number {
  return length.value * MM_PER_LENGTH_UNIT[length.unit];
}

export function fromMillimetres(mm: number, unit: LengthUnit): number {
  return mm / MM_PER_LENGTH_UNIT[unit];
}

/**
 * Half a unit of the last decimal typed, in millimetres: the resolution of the entry itself
 * ("11.811 in" is known to ±0.0005 in = ±0.0127 mm). Two lengths closer than this are the same
 * length as far as the entry can tell.
 */
export function entryResolutionMm(length: Length): number {
  const text = String(length.value);
  const exponent = text.includes('e') ? Number(text.slice(text.indexOf('e') + 1)) : 0;
  const mantissa = text.includes('e') ? text.slice(0, text.indexOf('e')) : text;
  const dot = mantissa.indexOf('.');
  const decimals = (dot < 0 ? 0 : mantissa.length - dot - 1) - exponent;
  return 0.5 * 10 ** -decimals * MM_PER_LENGTH_UNIT[length.unit];
}
