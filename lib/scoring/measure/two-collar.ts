import { fmt } from '../format-number';
import type { TailstockMove } from './tailstock-alignment';

/**
 * Two-collar test cut: two collars a known distance apart turned at one tool setting. The diameter
 * difference shows taper; the radial offset of the work axis over the collar distance is
 *   e = (D_tail − D_head) / 2,    taper on diameter = ΔD / L
 * [src: two-collar method as taught in classic lathe-operation manuals; 25.000 and 25.030 mm
 * 300 mm apart → e = 0.015 mm]. Between centres, e is the tailstock set-over error: a larger
 * diameter at the tailstock end means the tailstock centre sits away from the tool, so the
 * tailstock must move toward the tool (the operator, front tool post) and vice versa. When the
 * distance between centres is known, the set-over at the tailstock centre is e scaled from the
 * collar distance to the centre distance (the axis error grows linearly from the headstock centre).
 */
export interface TwoCollarInput {
  setup: 'between-centres' | 'in-chuck';
  diameterNearHeadstockMm: number;
  diameterNearTailstockMm: number;
  collarDistanceMm: number;
  centresDistanceMm?: number;
}

export interface TwoCollarResult {
  /** D_tail − D_head, mm. */
  diameterDifferenceMm: number;
  /** Radial offset over the collar distance, mm (sign as diameter difference). */
  radialOffsetMm: number;
  /** Taper on diameter per metre of length, mm/m. */
  taperMmPerM: number;
  /** Correction at the tailstock; null when the work was held in the chuck only. */
  tailstockCorrection: { move: TailstockMove; byMm: number; basis: string } | null;
}

export function twoCollarTest(input: TwoCollarInput): TwoCollarResult {
  const diameterDifferenceMm = input.diameterNearTailstockMm - input.diameterNearHeadstockMm;
  const radialOffsetMm = diameterDifferenceMm / 2;
  const taperMmPerM = (diameterDifferenceMm / input.collarDistanceMm) * 1000;
  if (input.setup === 'in-chuck') {
    return { diameterDifferenceMm, radialOffsetMm, taperMmPerM, tailstockCorrection: null };
  }
  const scale = input.centresDistanceMm ? input.centresDistanceMm / input.collarDistanceMm : 1;
  const byMm = Math.abs(radialOffsetMm) * scale;
  const move: TailstockMove = radialOffsetMm > 0 ? 'toward-operator' : radialOffsetMm < 0 ? 'away-from-operator' : 'none';
  const basis = input.centresDistanceMm
    ? `e × centre distance / collar distance = ${fmt(Math.abs(radialOffsetMm))} × ${fmt(input.centresDistanceMm)} / ${fmt(input.collarDistanceMm)}`
    : 'e (collars taken as near the centres)';
  return { diameterDifferenceMm, radialOffsetMm, taperMmPerM, tailstockCorrection: { move, byMm, basis } };
}

