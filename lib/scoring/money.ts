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

/** "€12,500.00"-style text in a fixed locale, so reports read the same wherever they are run. */
export function formatMoney(m: Money, minorDigits = 2): string {
  const major = m.amountMinor / 10 ** minorDigits;
  const text = Math.abs(major).toLocaleString('en-GB', {
    minimumFractionDigits: minorDigits,
    maximumFractionDigits: minorDigits,
  });
  return `${major < 0 ? '−' : ''}${m.currency} ${text}`;
}
