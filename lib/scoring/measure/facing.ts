/**
 * Facing test: a face turned across its full diameter may only be concave (centre low), so that
 * parts clamped face to face bear on their rims. Flatness is stated over a diameter, 0.025 over
 * 300 mm [memory: ISO 1708 / Schlesinger], scaled to the faced diameter by the proportional rule.
 * Input convention: centre deviation positive = centre low (concave).
 */
export type FaceShape = 'concave' | 'convex' | 'flat';

export function faceShape(centreDeviationMm: number): FaceShape {
  return centreDeviationMm > 0 ? 'concave' : centreDeviationMm < 0 ? 'convex' : 'flat';
}
