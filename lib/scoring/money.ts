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

/**
 * "EUR 12,500.00"-style text, formatted by hand rather than through Intl: the same on every
 * runtime and locale, and fast enough to call for every line of a report.
 */
export function formatMoney(m: Money, minorDigits = 2): string {
  const negative = m.amountMinor < 0;
  const magnitude = Math.abs(Math.round(m.amountMinor));
  const digits = String(magnitude).padStart(minorDigits + 1, '0');
  const whole = digits.slice(0, digits.length - minorDigits);
  const fraction = digits.slice(digits.length - minorDigits);
  // Below 1e21 String() gives plain digits; beyond it, exponent form, which the pattern leaves almost as it is.
  const grouped = magnitude < 1e21 ? groupThousands(whole) : whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${negative ? '−' : ''}${m.currency} ${grouped}${minorDigits ? `.${fraction}` : ''}`;
}
