/**
 * ISO 3448 viscosity grades for industrial lubricants: grade VG n has a mid-point kinematic
 * viscosity of n mm²/s at 40 °C and a permitted range of mid-point ±10 %
 * [src: ISO 3448; VG 32 = 28.8–35.2, VG 68 = 61.2–74.8 mm²/s].
 */
export const ISO_3448_GRADES: readonly number[] = [
  2, 3, 5, 7, 10, 15, 22, 32, 46, 68, 100, 150, 220, 320, 460, 680, 1000, 1500, 2200, 3200,
];

export function iso3448Range(grade: number): { min: number; max: number } | null {
  if (!ISO_3448_GRADES.includes(grade)) return null;
  // Rounded to 0.01 mm²/s so 32 × 0.9 reads 28.8, not 28.800000000000004.
  return { min: Math.round(grade * 90) / 100, max: Math.round(grade * 110) / 100 };
}

/** The grade whose range contains the viscosity, or null when it falls between grades. */
export function iso3448GradeFor(viscosityMm2s: number): number | null {
  for (const grade of ISO_3448_GRADES) {
    const r = iso3448Range(grade)!;
    if (viscosityMm2s >= r.min && viscosityMm2s <= r.max) return grade;
  }
  return null;
}

export interface ViscosityCheck {
  grade: number;
  range: { min: number; max: number } | null;
  withinGrade: boolean;
  /** Measured / mid-point − 1, e.g. −0.15 = 15 % thinner than the grade mid-point. */
  relativeDeviation: number;
}

export function checkViscosityGrade(viscosityMm2s: number, grade: number): ViscosityCheck {
  const range = iso3448Range(grade);
  return {
    grade,
    range,
    withinGrade: range !== null && viscosityMm2s >= range.min && viscosityMm2s <= range.max,
    relativeDeviation: viscosityMm2s / grade - 1,
  };
}
