/** Numbers in explanations: up to `digits` decimals, trailing zeros dropped, never "-0". */
export function fmt(n: number, digits = 4): string {
  const rounded = Number(n.toFixed(digits));
  return String(Object.is(rounded, -0) ? 0 : rounded);
}
