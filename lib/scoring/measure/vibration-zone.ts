import type { RatioKnot } from './deviation-ratio';

/**
 * Vibration severity zones of ISO 10816-1 Annex B, velocity in mm/s RMS.
 * Zone A: new machines; B: unrestricted long-term operation; C: restricted operation;
 * D: severe enough to cause damage. Boundaries by machine class:
 *  - class I (small machines, e.g. motors up to 15 kW): 0.71 / 1.8 / 4.5 [src: ISO 10816-1 Annex B]
 *  - class II (medium machines, 15–75 kW): 1.12 / 2.8 / 7.1 [src: ISO 10816-1 Annex B]
 *  - class III (large machines, rigid foundations): 1.8 / 4.5 / 11.2 [memory: ISO 10816-1 Annex B]
 *  - class IV (large machines, soft foundations): 2.8 / 7.1 / 18 [memory: ISO 10816-1 Annex B]
 * A value on a boundary belongs to the better zone.
 */
export type VibrationClass = 'I' | 'II' | 'III' | 'IV';
export type VibrationZone = 'A' | 'B' | 'C' | 'D';

export interface ZoneBoundaries {
  ab: number;
  bc: number;
  cd: number;
}

export const ISO_10816_1_BOUNDARIES: Readonly<Record<VibrationClass, ZoneBoundaries>> = {
  I: { ab: 0.71, bc: 1.8, cd: 4.5 },
  II: { ab: 1.12, bc: 2.8, cd: 7.1 },
  III: { ab: 1.8, bc: 4.5, cd: 11.2 },
  IV: { ab: 2.8, bc: 7.1, cd: 18 },
};

/** Machine class from driving motor power (kW): up to 15 kW class I, above class II [memory: ISO 10816-1]. */
export function vibrationClassForMotorPower(kw: number | undefined): VibrationClass {
  return kw !== undefined && kw > 15 ? 'II' : 'I';
}

export function vibrationZone(velocityMmS: number, machineClass: VibrationClass): VibrationZone {
  const b = ISO_10816_1_BOUNDARIES[machineClass];
  if (velocityMmS <= b.ab) return 'A';
  if (velocityMmS <= b.bc) return 'B';
  if (velocityMmS <= b.cd) return 'C';
  return 'D';
}

/**
 * Knots for the grading ratio: the B/C boundary (limit of unrestricted operation) is q = 1, the A/B
 * boundary q = 0.5 and the C/D boundary q = 2, so zones line up with grading bands.
 */
export function vibrationRatioKnots(machineClass: VibrationClass): RatioKnot[] {
  const b = ISO_10816_1_BOUNDARIES[machineClass];
  return [
    { value: b.ab, q: 0.5 },
    { value: b.bc, q: 1 },
    { value: b.cd, q: 2 },
  ];
}
