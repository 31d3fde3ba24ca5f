/**
 * Ratio q of a measured deviation to its permissible value, with the sign rules of machine-tool
 * acceptance tests: some limits are one-sided (free end of a test bar may only rise, tailstock
 * centre may only be higher, a faced surface may only be concave). A deviation the forbidden way
 * fails even when small, so it is scored as q = 1 + |d|/T (always beyond the limit and growing with
 * |d|). A deviation no larger than one instrument step has no reliable sign and is scored as
 * allowed.
 */
export type AllowedDirection = 'both' | 'positive-only' | 'negative-only';

export interface DeviationRatio {
  q: number;
  wrongDirection: boolean;
}

export function deviationRatio(
  deviation: number,
  permissible: number,
  allowed: AllowedDirection = 'both',
  resolution = 0,
): DeviationRatio {
  const magnitude = Math.abs(deviation);
  const forbiddenSign = allowed === 'positive-only' ? -1 : allowed === 'negative-only' ? 1 : 0;
  const wrongDirection = forbiddenSign !== 0 && Math.sign(deviation) === forbiddenSign && magnitude > resolution;
  const plain = magnitude / permissible;
  return { q: wrongDirection ? 1 + plain : plain, wrongDirection };
}

/**
 * Piecewise-linear map from a measured value to q through knots (value, q), used where a standard
 * gives zone boundaries rather than one limit (vibration zones, sound levels). Beyond the last knot
 * q keeps the last segment's slope so a worse reading always gives a larger q.
 */
export interface RatioKnot {
  value: number;
  q: number;
}

export function ratioFromKnots(value: number, knots: readonly RatioKnot[]): number {
  const first = knots[0];
  if (!first) return 0;
  if (value <= first.value) return first.value === 0 ? first.q : (first.q * Math.max(0, value)) / first.value;
  for (let i = 1; i < knots.length; i++) {
    const a = knots[i - 1]!;
    const b = knots[i]!;
    if (value <= b.value) return a.q + ((b.q - a.q) * (value - a.value)) / (b.value - a.value);
  }
  const last = knots[knots.length - 1]!;
  const prev = knots[knots.length - 2] ?? { value: 0, q: 0 };
  return last.q + ((last.q - prev.q) * (value - last.value)) / (last.value - prev.value);
}
