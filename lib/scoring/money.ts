/**
 * Money as integer minor units with an ISO 4217 currency code (e.g. 1 250 000 EUR cents =
 * €12 500.00), so sums never pick up binary fractions. Multiplying by a rate rounds half away from
 * zero to a whole minor unit.
 */
export interface Money {
  amountMinor: number;
  currency: string;
}

export function money(amountMinor: number, currency: string): Money {
  return { amountMinor: Math.round(amountMinor), currency };
}

export function multiplyMoney(m: Money, factor: number): Money {
  const raw = m.amountMinor * factor;
  return { amountMinor: Math.sign(raw) * Math.round(Math.abs(raw)), currency: m.currency };
}

export function sumMoney(items: readonly Money[], currency: string): Money {
  return { amountMinor: items.reduce((s, m) => s + m.amountMinor, 0), currency };
}

/** "1234567" → "1,234,567": a comma before every group of three digits counted from the right. */
function groupThousands(whole: string): string {
  let grouped = whole.slice(0, whole.length % 3 || 3);
  for (let i = grouped.length; i < whole.length; i += 3) grouped += `,${whole.slice(i, i + 3)}`;
  return grouped;
}

const MINOR_SCALES = [1, 10, 100, 1000, 10_000, 100_000, 1_000_000];

/** n (0 ≤ n < 10^width, an integer) with leading zeros to `width` digits. */
function padDigits(n: number, width: number): string {
  const text = `${n}`;
  return text.length >= width ? text : '0'.repeat(width - text.length) + text;
}

/**
 * "EUR 12,500.00"-style text, formatted by hand rather than through Intl: the same on every
 * runtime and locale, and fast enough to call for every line of a report. Amounts below 10^15
 * minor units are split into groups by integer arithmetic (exact there); larger ones, and more
 * than 6 minor digits, go through the digit string.
 */
export function formatMoney(m: Money, minorDigits = 2): string {
  const negative = m.amountMinor < 0;
  const magnitude = Math.abs(Math.round(m.amountMinor));
  const scale = MINOR_SCALES[minorDigits];
  if (scale !== undefined && magnitude < 1e15) {
    let whole = Math.floor(magnitude / scale);
    const fraction = magnitude - whole * scale;
    let grouped = '';
    while (whole >= 1000) {
      const group = whole % 1000;
      grouped = `,${padDigits(group, 3)}${grouped}`;
      whole = (whole - group) / 1000;
    }
    grouped = `${whole}${grouped}`;
    return `${negative ? '−' : ''}${m.currency} ${grouped}${minorDigits ? `.${padDigits(fraction, minorDigits)}` : ''}`;
  }
  const digits = String(magnitude).padStart(minorDigits + 1, '0');
  const whole = digits.slice(0, digits.length - minorDigits);
  const fraction = digits.slice(digits.length - minorDigits);
  // Below 1e21 String() gives plain digits; beyond it, exponent form, which the pattern leaves almost as it is.
  const grouped = magnitude < 1e21 ? groupThousands(whole) : whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${negative ? '−' : ''}${m.currency} ${grouped}${minorDigits ? `.${fraction}` : ''}`;
}
