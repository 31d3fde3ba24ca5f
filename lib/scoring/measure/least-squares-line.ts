/**
 * Ordinary least-squares straight line z = intercept + slope·x through points, the reference line
 * ISO 230-1 allows for straightness (the line that minimises the sum of squared deviations).
 * Written out here because the library ships without the statistics package; the tests
 * cross-check it against simple-statistics' linearRegression.
 */
export interface Point {
  x: number;
  z: number;
}

export interface Line {
  slope: number;
  intercept: number;
}

export function leastSquaresLine(points: readonly Point[]): Line {
  const n = points.length;
  if (n === 0) return { slope: 0, intercept: 0 };
  let sumX = 0;
  let sumZ = 0;
  for (const p of points) {
    sumX += p.x;
    sumZ += p.z;
  }
  const meanX = sumX / n;
  const meanZ = sumZ / n;
  let sxx = 0;
  let sxz = 0;
  for (const p of points) {
    const dx = p.x - meanX;
    sxx += dx * dx;
    sxz += dx * (p.z - meanZ);
  }
  // All points at one x: no slope is defined; a horizontal line through the mean is the
  // least-squares answer among horizontal lines and keeps the deviations finite.
  const slope = sxx === 0 ? 0 : sxz / sxx;
  return { slope, intercept: meanZ - slope * meanX };
}

export function lineAt(line: Line, x: number): number {
  return line.intercept + line.slope * x;
}
