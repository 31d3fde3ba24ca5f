import { DecisionInputError } from './decision-input-error';
import type { Money } from '@/lib/scoring/money';

export const INCLUSION_CONDITION_LABELS = { good: 'Good', usable: 'Usable', worn: 'Worn', missing: 'Missing' } as const;
export type InclusionCondition = keyof typeof INCLUSION_CONDITION_LABELS;

/**
 * Share of the replacement cost an item is worth as it stands, by condition. A Waygrade rule
 * (common practice): used tooling sells well below new even when good; a missing item is worth
 * nothing and its replacement becomes a cost.
 */
export const CONDITION_SHARE: Readonly<Record<InclusionCondition, number>> = { good: 0.6, usable: 0.4, worn: 0.2, missing: 0 };

export interface Inclusion {
  description: string;
  condition: InclusionCondition;
  /** null: not given, so the item adds nothing either way. */
  replacementCost: Money | null;
}

export interface InclusionsValue {
  /** What the items that come with the machine are worth as they stand. */
  value: Money;
  /** What it costs to replace the items listed as missing. */
  missingCost: Money;
  /** Items with no replacement cost given. */
  unpriced: string[];
}

function roundMinor(value: number): number {
  return Math.sign(value) * Math.round(Math.abs(value));
}

export function valueInclusions(items: readonly Inclusion[], currency: string): InclusionsValue {
  let value = 0;
  let missing = 0;
  const unpriced: string[] = [];
  for (const item of items) {
    if (!item.replacementCost) {
      unpriced.push(item.description);
      continue;
    }
    if (item.replacementCost.currency !== currency) throw new DecisionInputError('replacementCost', `Replacement costs must be in ${currency}; “${item.description}” is in ${item.replacementCost.currency}`);
    if (!Number.isInteger(item.replacementCost.amountMinor) || item.replacementCost.amountMinor < 0) {
      throw new DecisionInputError('replacementCost', `The replacement cost of “${item.description}” must be a whole amount, zero or more`);
    }
    if (item.condition === 'missing') missing += item.replacementCost.amountMinor;
    else value += roundMinor(item.replacementCost.amountMinor * CONDITION_SHARE[item.condition]);
  }
  return { value: { amountMinor: value, currency }, missingCost: { amountMinor: missing, currency }, unpriced };
}

/** A listed item as stored: its condition and, when given, its replacement cost in minor units. */
export interface StoredInclusion {
  condition: InclusionCondition;
  replacementCostMinor: number | null;
  currency: string;
}

/**
 * What it costs to replace the items listed as missing, in minor units of `currency`; null when
 * nothing is listed, or when a missing item has no replacement cost in that currency, so unknown
 * tooling reads "not known" rather than nothing to pay.
 */
export function missingToolingMinor(items: readonly StoredInclusion[], currency: string): number | null {
  if (items.length === 0) return null;
  let sum = 0;
  for (const item of items) {
    if (item.condition !== 'missing') continue;
    if (item.replacementCostMinor === null || item.currency !== currency) return null;
    sum += item.replacementCostMinor;
  }
  return sum;
}
