/**
 * V-belt tension by mid-span deflection.
 * Span between tangent points of an open drive: t = √(C² − ((D − d)/2)²)  [src: belt makers'
 * design guides]. Target deflection under the specified test force:
 *  - 1/64 in per inch of span, i.e. t/64 [src: belt makers' design guides];
 *  - 16 mm per metre of span, i.e. 0.016·t [src: the "Fenner method"].
 * The two rules agree within 2.4 %. Status bands of the measured deflection (±30 % of the target
 * is correct, over twice the target is slipping) are common practice.
 */
export interface BeltGeometry {
  centreDistanceMm: number;
  largePulleyDiameterMm: number;
  smallPulleyDiameterMm: number;
}

export function beltSpanMm(g: BeltGeometry): number {
  const halfDifference = (g.largePulleyDiameterMm - g.smallPulleyDiameterMm) / 2;
  return Math.sqrt(Math.max(0, g.centreDistanceMm ** 2 - halfDifference ** 2));
}

export function deflectionBySixtyFourthRule(spanMm: number): number {
  return spanMm / 64;
}

export function deflectionBySixteenPerMetreRule(spanMm: number): number {
  return (spanMm * 16) / 1000;
}

export type BeltTensionStatus = 'too-tight' | 'correct' | 'slack' | 'slipping';

/** Measured / target deflection bands (common practice): least ratio at which each status begins. */
export const BELT_TENSION_BANDS: readonly { fromRatio: number; status: BeltTensionStatus }[] = [
  { fromRatio: 0, status: 'too-tight' },
  { fromRatio: 0.7, status: 'correct' },
  { fromRatio: 1.3, status: 'slack' },
  { fromRatio: 2, status: 'slipping' },
];

export function beltTensionStatus(measuredMm: number, targetMm: number): BeltTensionStatus {
  const ratio = measuredMm / targetMm;
  let status: BeltTensionStatus = 'too-tight';
  for (const band of BELT_TENSION_BANDS) if (ratio >= band.fromRatio) status = band.status;
  return status;
}

/** Ratio for grading: the tolerance is ±30 % of the target deflection (common practice). */
export function beltTensionRatio(measuredMm: number, targetMm: number): number {
  return Math.abs(measuredMm / targetMm - 1) / 0.3;
}
