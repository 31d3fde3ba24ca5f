import type { CheckResult } from '@/lib/scoring';
import { pdfText } from './pdf-text';

/** Units of quantities measured with an instrument; other checks are ratings or states. */
const PHYSICAL_UNITS = new Set(['mm', 'mm/m', 'mm/s', 'K', 's', 'Ω', 'MΩ', 'mm²/s', 'µm']);

/** Decimals by unit, enough for the instrument's resolution and no more. */
const DECIMALS: Readonly<Record<string, number>> = { mm: 3, 'mm/m': 3, 'mm/s': 2, K: 1, s: 1, Ω: 2, MΩ: 1, 'mm²/s': 1, µm: 1 };

export function formatQuantity(value: number, unit: string): string {
  const digits = DECIMALS[unit] ?? 2;
  const text = Math.abs(value).toLocaleString('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits });
  return pdfText(`${value < 0 ? '−' : ''}${text} ${unit}`);
}

export function isPhysical(check: Pick<CheckResult, 'measured'>) {
  return check.measured !== null && PHYSICAL_UNITS.has(check.measured.unit);
}

/** The measured value as a buyer reads it: a figure with its unit, or the inspector's word. */
export function measuredText(check: CheckResult): { main: string; note: string | null } {
  if (!check.measured) return { main: '—', note: null };
  if (isPhysical(check)) return { main: formatQuantity(check.measured.value, check.measured.unit), note: check.measured.text ? pdfText(check.measured.text) : null };
  // Accessories are listed by their survey ids ("three-jaw-chuck"); printed as words.
  if (check.measured.unit === 'items') return { main: pdfText((check.measured.text ?? '').replaceAll('-', ' ')), note: `${check.measured.value} items` };
  const rating = check.measured.unit.startsWith('rating') ? `${check.measured.unit.replace(/ 0–3$/, '')} ${check.measured.value} of 3` : null;
  return { main: pdfText(check.measured.text ?? `${check.measured.value} ${check.measured.unit}`), note: rating };
}

/** "rating 1 or better is within limit" reads as "rating 1 or better" in a narrow column. */
const SHORT_RULES: ReadonlyArray<readonly [RegExp, string]> = [[/^rating (\d) or better is within limit$/, 'rating $1 or better']];

function shortRule(basis: string) {
  return SHORT_RULES.reduce((text, [pattern, replacement]) => text.replace(pattern, replacement), basis);
}

/** The permissible value with its unit, or the rule for a rating; `basis` says how the value was found. */
export function permissibleText(check: CheckResult): { main: string; basis: string | null; isFigure: boolean } {
  const p = check.permissible;
  if (!p) return { main: '—', basis: null, isFigure: false };
  // A basis that only repeats the value ("0.01 mm") adds nothing beside the figure.
  const repeatsValue = p.basis === `${p.value} ${p.unit}`;
  if (isPhysical(check)) return { main: formatQuantity(p.value, p.unit), basis: repeatsValue ? null : pdfText(p.basis), isFigure: true };
  return { main: pdfText(shortRule(p.basis)), basis: null, isFigure: false };
}

/** q = measured deviation / permissible, two decimals. */
export function ratioText(check: CheckResult) {
  return check.q === null ? '—' : check.q.toFixed(2);
}
