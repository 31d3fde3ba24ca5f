const POWERS_OF_TEN = [1, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12];
const ZEROS = ['', '0', '00', '000', '0000', '00000', '000000', '0000000', '00000000'];

/**
 * Numbers in explanations: up to `digits` decimals, trailing zeros dropped, never "-0" — exactly
 * String(roundTo(n, digits)), written out from the rounded integer k = round(n × 10^digits)
 * instead. Why that is the same text: k / 10^digits is the double nearest the decimal k·10^−digits;
 * while k has at most 15 significant digits no shorter decimal maps to that double (IEEE 754
 * doubles keep 15 significant decimal digits), so String() prints exactly that decimal. Outside
 * that range (15 or more digits, more than 9 decimals, or below 1e−6 where String() turns to
 * exponent form) String() itself is used. Writing out the integer avoids the shortest-decimal
 * search String() runs on every fractional number, the largest single cost of scoring a survey.
 */
export function fmt(n: number, digits = 4): string {
  const d = Math.min(12, Math.max(0, digits));
  const scale = POWERS_OF_TEN[d]!;
  const scaled = n * scale;
  // 10 or more decimals, 15 or more significant digits, NaN and ±Infinity: String() itself.
  if (d > 9 || !(scaled < 1e15 && scaled > -1e15)) return String(roundTo(n, digits));
  const k = Math.round(scaled);
  if (k === 0) return '0';
  const magnitude = k < 0 ? -k : k;
  // Below 1e−6 (k < 10^(d−6)) String() writes exponent form.
  if (d > 6 && magnitude < POWERS_OF_TEN[d - 6]!) return String(roundTo(n, digits));
  // Exact: magnitude < 1e15 and scale ≤ 1e9, so both parts are integers held without rounding,
  // and the fraction (below 1e9) fits a 32-bit integer.
  const whole = Math.floor(magnitude / scale);
  let fraction = (magnitude - whole * scale) | 0;
  const sign = k < 0 ? '-' : '';
  if (fraction === 0) return `${sign}${whole}`;
  let width = d;
  while (fraction % 10 === 0) {
    fraction = (fraction / 10) | 0;
    width--;
  }
  const fractionText = `${fraction}`;
  return `${sign}${whole}.${ZEROS[width - fractionText.length]}${fractionText}`;
}

/**
 * Exactly String(n) — a reading as entered, at full precision — by way of fmt when n has at most 6
 * decimals (readings as typed do), which gives the same text (see fmt) without the search.
 */
export function plainNumber(n: number): string {
  for (let d = 0; d <= 6; d++) {
    const scale = POWERS_OF_TEN[d]!;
    if (Math.round(n * scale) / scale === n) return fmt(n, d);
  }
  return String(n);
}

/** Numbers as String() writes them, joined by ", " (what Array.prototype.join gives for numbers). */
export function joinNumbers(values: readonly number[]): string {
  let text = '';
  for (let i = 0; i < values.length; i++) text += i === 0 ? plainNumber(values[i]!) : `, ${plainNumber(values[i]!)}`;
  return text;
}

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
