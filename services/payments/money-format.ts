// Amounts travel in minor units (cents); people read them in major units. The number of
// minor digits per currency comes from Intl (0 for JPY, 2 for EUR, 3 for KWD).

export function minorUnitDigits(currency: string): number {
  return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

export function formatMinorAmount(amount: number, currency: string, locale = 'en-US'): string {
  const digits = minorUnitDigits(currency);
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(amount / 10 ** digits);
}
