import { leastSquaresLine, lineAt, type Line, type Point } from './least-squares-line';

/**
 * Bed levelling: readings of a precision level (in vial divisions) taken at stations spaced one
 * level base apart are turned into a height profile by cumulative sum,
 *   z_k = Σ_{i≤k} r_i · s · L        (s in mm/m per division, L in m → z in mm),
 * and the straightness deviation is the largest deviation above plus the largest below a
 * reference line, by end points or by least squares [src: ISO 230-1:2012, definitions].
 * Profiles are kept in µm for plotting because bed deviations are a few hundredths of a mm.
 */

/**
 * convex = middle high (on or above every chord), concave = middle low, mixed = a concave stretch
 * beside a raised one (S-shaped), straight = within one instrument step of a line.
 */
export type ProfileShape = 'convex' | 'concave' | 'mixed' | 'straight';

export interface StraightnessAgainstLine {
  line: Line;
  /** Deviation of each profile point from the line, µm; positive = above the line. */
  deviationsUm: number[];
  maxAboveUm: number;
  maxBelowUm: number;
  /** Largest above + |largest below|, µm. */
  straightnessUm: number;
}

export interface LevelProfile {
  /** Profile points: x in mm from the first station, z in µm. */
  points: Point[];
  endPoint: StraightnessAgainstLine;
  leastSquares: StraightnessAgainstLine;
  /**
   * Shape judged over every stretch: convex when no point lies below the chord of any stretch by
   * more than the resolution; concave when some does and none lies above the end-point line;
   * mixed when both; straight when neither side of the end-point line exceeds the resolution.
   */
  shape: ProfileShape;
  /** Deepest point below the chord of any stretch of the profile, µm: how concave the worst stretch is. */
  deepestDipUm: number;
  /** Worst straightness of any stretch no longer than the local window, against its own chord, µm. */
  worstLocalUm: number | null;
  localWindowMm: number;
}

export interface LevelProfileInput {
  readingsDivisions: readonly number[];
  sensitivityMmPerM: number;
  stationSpacingMm: number;
  /** Height step treated as no deviation when judging shape, µm (one instrument step). */
  resolutionUm?: number;
  localWindowMm?: number;
}

export function heightProfile(
  readingsDivisions: readonly number[],
  sensitivityMmPerM: number,
  stationSpacingMm: number,
): Point[] {
  // mm/m × mm = µm: a 0.02 mm/m division over a 250 mm base is a 5 µm rise.
  const risePerDivisionUm = sensitivityMmPerM * stationSpacingMm;
  const points: Point[] = [{ x: 0, z: 0 }];
  let z = 0;
  readingsDivisions.forEach((r, i) => {
    z += r * risePerDivisionUm;
    points.push({ x: (i + 1) * stationSpacingMm, z });
  });
  return points;
}

export function straightnessAgainst(points: readonly Point[], line: Line): StraightnessAgainstLine {
  const deviationsUm: number[] = [];
  // Math.max/min step by step equal Math.max(0, ...all) and Math.min(0, ...all), NaN and ±0 included.
  let maxAboveUm = 0;
  let maxBelowUm = 0;
  for (const p of points) {
    const d = p.z - lineAt(line, p.x);
    deviationsUm.push(d);
    maxAboveUm = Math.max(maxAboveUm, d);
    maxBelowUm = Math.min(maxBelowUm, d);
  }
  return { line, deviationsUm, maxAboveUm, maxBelowUm, straightnessUm: maxAboveUm - maxBelowUm };
}

/**
 * Straightness of points[from..to] against the chord through its end points: the same arithmetic
 * as straightnessAgainst(segment, endPointLine(segment)), without copying the segment or keeping
 * the deviations (every window of the local check runs through here).
 */
function chordStraightness(points: readonly Point[], from: number, to: number): number {
  const first = points[from]!;
  const last = points[to]!;
  const slope = last.x === first.x ? 0 : (last.z - first.z) / (last.x - first.x);
  const line: Line = last.x === first.x ? { slope: 0, intercept: first.z } : { slope, intercept: first.z - slope * first.x };
  let maxAbove = 0;
  let maxBelow = 0;
  for (let k = from; k <= to; k++) {
    const p = points[k]!;
    const d = p.z - lineAt(line, p.x);
    maxAbove = Math.max(maxAbove, d);
    maxBelow = Math.min(maxBelow, d);
  }
  return maxAbove - maxBelow;
}

export function endPointLine(points: readonly Point[]): Line {
  const first = points[0];
  const last = points[points.length - 1];
  if (!first || !last || last.x === first.x) return { slope: 0, intercept: first?.z ?? 0 };
  const slope = (last.z - first.z) / (last.x - first.x);
  return { slope, intercept: first.z - slope * first.x };
}

/**
 * Deepest point below the chord of any stretch i..j. The chords over a point that lie highest
 * form the upper convex hull of the profile, so the deepest dip is the largest distance from a
 * point down to that hull (one pass, monotone chain), not only to the end-point line.
 */
export function deepestDip(points: readonly Point[]): number {
  const hull: Point[] = [];
  for (const p of points) {
    while (hull.length >= 2) {
      const a = hull[hull.length - 2]!;
      const b = hull[hull.length - 1]!;
      // Drop b when it lies on or below the line from a to p (the hull must bend downward).
      if ((b.z - a.z) * (p.x - a.x) <= (p.z - a.z) * (b.x - a.x)) hull.pop();
      else break;
    }
    hull.push(p);
  }
  let deepest = 0;
  let h = 0;
  for (const p of points) {
    while (h < hull.length - 2 && hull[h + 1]!.x <= p.x) h++;
    const a = hull[h]!;
    const b = hull[Math.min(h + 1, hull.length - 1)]!;
    const top = b.x === a.x ? a.z : a.z + ((b.z - a.z) * (p.x - a.x)) / (b.x - a.x);
    deepest = Math.max(deepest, top - p.z);
  }
  return deepest;
}

export function profileShape(endPoint: StraightnessAgainstLine, deepestDipUm: number, resolutionUm: number): ProfileShape {
  const above = endPoint.maxAboveUm;
  const below = -endPoint.maxBelowUm;
  if (deepestDipUm <= resolutionUm) return above <= resolutionUm && below <= resolutionUm ? 'straight' : 'convex';
  return above <= resolutionUm ? 'concave' : 'mixed';
}

/**
 * Worst end-point straightness over every run of consecutive points spanning at most windowMm.
 * null when no window holds an interior point (stations as far apart as the window itself), since
 * a chord through two points shows no deviation at all.
 */
export function worstLocalStraightness(points: readonly Point[], windowMm: number): number | null {
  let worst: number | null = null;
  for (let i = 0; i < points.length; i++) {
    for (let j = i + 2; j < points.length; j++) {
      const a = points[i];
      const b = points[j];
      if (!a || !b || b.x - a.x > windowMm + 1e-9) break;
      const s = chordStraightness(points, i, j);
      worst = worst === null ? s : Math.max(worst, s);
    }
  }
  return worst;
}

export function levelProfile(input: LevelProfileInput): LevelProfile {
  const localWindowMm = input.localWindowMm ?? 250;
  const points = heightProfile(input.readingsDivisions, input.sensitivityMmPerM, input.stationSpacingMm);
  const endPoint = straightnessAgainst(points, endPointLine(points));
  const leastSquares = straightnessAgainst(points, leastSquaresLine(points));
  const deepestDipUm = deepestDip(points);
  return {
    points,
    endPoint,
    leastSquares,
    shape: profileShape(endPoint, deepestDipUm, input.resolutionUm ?? 0),
    deepestDipUm,
    worstLocalUm: worstLocalStraightness(points, localWindowMm),
    localWindowMm,
  };
}

/**
 * Twist: transverse level readings (divisions) at each station, converted to mm/m; the twist is
 * the change of transverse level along the bed, max − min, in mm/m (compared with 0.04 mm/1000 mm,
 * [memory: ISO 1708-style record]).
 */
export interface TwistResult {
  transverseMmPerM: number[];
  twistMmPerM: number;
}

export function bedTwist(transverseDivisions: readonly number[], sensitivityMmPerM: number): TwistResult {
  const transverseMmPerM = transverseDivisions.map((r) => r * sensitivityMmPerM);
  const twistMmPerM = transverseMmPerM.length
    ? Math.max(...transverseMmPerM) - Math.min(...transverseMmPerM)
    : 0;
  return { transverseMmPerM, twistMmPerM };
}
