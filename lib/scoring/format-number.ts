/** Numbers in explanations: up to `digits` decimals, trailing zeros dropped, never "-0". */
export function fmt(n: number, digits = 4): string {
  return String(roundTo(n, digits));
}

const POWERS_OF_TEN = [1, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12];

/**
 * Round to `digits` decimals (at most 12) for the result data; −0 becomes 0 so results survive a
 * JSON round trip unchanged (JSON has no negative zero). Scaled Math.round rather than toFixed,
 * which is many times slower and runs for every figure of a report.
 */
export function roundTo(n: number, digits: number): number {
  const scale = POWERS_OF_TEN[Math.min(12, Math.max(0, digits))]!;
  const scaled = n * scale;
  // Beyond 2^53 the number has no fractional part left to round.
  if (!Number.isFinite(scaled) || Math.abs(scaled) >= 9_007_199_254_740_992) return n === 0 ? 0 : n;
  const rounded = Math.round(scaled) / scale;
  return rounded === 0 ? 0 : rounded;
}
