import { DecisionInputError } from './decision-input-error';
import type { Money } from '@/lib/scoring/money';

export type LandedCostLineId = 'asking-price' | 'buyers-premium' | 'tax' | 'rigging' | 'converter' | 'missing-tooling' | 'repairs';

export interface LandedCostInput {
  currency: string;
  askingPrice: Money | null;
  /** Percent of the asking price, where the sale carries one (auctions). */
  buyersPremiumPercent: number | null;
  /** Percent on price plus premium, where the buyer cannot reclaim it. */
  taxPercent: number | null;
  rigging: Money | null;
  converter: Money | null;
  missingTooling: Money | null;
  repairs: Money | null;
}

export interface LandedCostLine {
  id: LandedCostLineId;
  label: string;
  /** null: not known, so the total leaves it out and says so. */
  amount: Money | null;
  note: string | null;
}

export interface LandedCost {
  lines: LandedCostLine[];
  total: Money;
  /** Labels of lines left out of the total because they are not known. */
  notKnown: string[];
}

function roundMinor(value: number): number {
  return Math.sign(value) * Math.round(Math.abs(value));
}

function checkMoney(field: string, m: Money | null, currency: string) {
  if (m === null) return;
  if (m.currency !== currency) throw new DecisionInputError(field, `Every amount must be in ${currency}; ${field} is in ${m.currency}`);
  if (!Number.isInteger(m.amountMinor) || m.amountMinor < 0) throw new DecisionInputError(field, `${field} must be a whole number of minor units, zero or more`);
}

function checkPercent(field: string, p: number | null) {
  if (p === null) return;
  if (!Number.isFinite(p) || p < 0 || p > 100) throw new DecisionInputError(field, `${field} must be a percentage from 0 to 100`);
}

/**
 * What the machine costs standing in the buyer's shop: price, premium on the price, tax on price
 * plus premium, then rigging, converter, missing tooling and repairs. Percentages round half away
 * from zero to a whole minor unit.
 */
export function landedCost(input: LandedCostInput): LandedCost {
  const c = input.currency;
  checkMoney('askingPrice', input.askingPrice, c);
  checkMoney('rigging', input.rigging, c);
  checkMoney('converter', input.converter, c);
  checkMoney('missingTooling', input.missingTooling, c);
  checkMoney('repairs', input.repairs, c);
  checkPercent('buyersPremiumPercent', input.buyersPremiumPercent);
  checkPercent('taxPercent', input.taxPercent);

  const price = input.askingPrice?.amountMinor ?? null;
  const premium = price !== null && input.buyersPremiumPercent !== null ? roundMinor((price * input.buyersPremiumPercent) / 100) : null;
  const tax = price !== null && input.taxPercent !== null ? roundMinor(((price + (premium ?? 0)) * input.taxPercent) / 100) : null;
  const m = (amountMinor: number | null): Money | null => (amountMinor === null ? null : { amountMinor, currency: c });

  const lines: LandedCostLine[] = [
    { id: 'asking-price', label: 'Asking price', amount: input.askingPrice, note: input.askingPrice ? null : 'Offers invited; no price listed' },
    ...(input.buyersPremiumPercent !== null
      ? [{ id: 'buyers-premium' as const, label: `Buyer’s premium (${input.buyersPremiumPercent} %)`, amount: m(premium), note: null }]
      : []),
    ...(input.taxPercent !== null ? [{ id: 'tax' as const, label: `Tax (${input.taxPercent} % on price and premium)`, amount: m(tax), note: null }] : []),
    { id: 'rigging', label: 'Rigging and transport', amount: input.rigging, note: null },
    { id: 'converter', label: 'Phase converter', amount: input.converter, note: null },
    { id: 'missing-tooling', label: 'Missing tooling', amount: input.missingTooling, note: null },
    { id: 'repairs', label: 'Repairs the findings call for', amount: input.repairs, note: null },
  ];
  const known = lines.filter((l) => l.amount !== null);
  return {
    lines,
    total: { amountMinor: known.reduce((s, l) => s + l.amount!.amountMinor, 0), currency: c },
    notKnown: lines.filter((l) => l.amount === null).map((l) => l.label),
  };
}
