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
