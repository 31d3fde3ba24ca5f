/** Numbers in explanations: up to `digits` decimals, trailing zeros dropped, never "-0". */
export function fmt(n: number, digits = 4): string {
  return String(roundTo(n, digits));
}

/**
 * Round to `digits` decimals for the result data; −0 becomes 0 so results survive a JSON round trip
 * unchanged (JSON has no negative zero).
 */
export function roundTo(n: number, digits: number): number {
  const rounded = Number(n.toFixed(digits));
  return Object.is(rounded, -0) ? 0 : rounded;
}
