/**
 * Sensitivity of a precision spirit level, per division of its vial, as engravers mark it:
 * mm per metre, arc-seconds, or inch per foot. Canonical unit inside the library: mm/m.
 *
 * arc-seconds: a slope of θ rad is 1000·tan θ mm/m; there are 206 264.8″ in a radian
 * (180·3600/π), so 1″ ≈ 4.848 µm/m ([src: arithmetic]).
 * in/ft: 1 in rise per 12 in run is 1/12 m/m = 83.33 mm/m.
 */
export const SLOPE_UNITS = ['mm/m', 'arcsec', 'in/ft'] as const;
export type SlopeUnit = (typeof SLOPE_UNITS)[number];

export interface Slope {
  value: number;
  unit: SlopeUnit;
}

const ARCSEC_PER_RADIAN = (180 * 3600) / Math.PI;

const TO_MM_PER_M: Readonly<Record<SlopeUnit, (v: number) => number>> = {
  'mm/m': (v) => v,
  arcsec: (v) => 1000 * Math.tan(v / ARCSEC_PER_RADIAN),
  'in/ft': (v) => (v * 1000) / 12,
};

const FROM_MM_PER_M: Readonly<Record<SlopeUnit, (mmPerM: number) => number>> = {
  'mm/m': (v) => v,
  arcsec: (v) => Math.atan(v / 1000) * ARCSEC_PER_RADIAN,
  'in/ft': (v) => (v * 12) / 1000,
};

export function toMillimetresPerMetre(slope: Slope): number {
  return TO_MM_PER_M[slope.unit](slope.value);
}

export function fromMillimetresPerMetre(mmPerM: number, unit: SlopeUnit): number {
  return FROM_MM_PER_M[unit](mmPerM);
}
