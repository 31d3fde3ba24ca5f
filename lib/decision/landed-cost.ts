import { DecisionInputError } from './decision-input-error';
import { formatMoney, type Money } from '@/lib/scoring/money';

export type LandedCostLineId =
  | 'asking-price'
  | 'buyers-premium'
  | 'tax'
  | 'rigging'
  | 'converter'
  | 'missing-tooling'
  | 'repairs-before-use'
  | 'repairs';

/**
 * The report's repairs as its valuation deducts them (valuation.costToCure): needed before use
 * (safety findings), to restore accuracy, and the allowance for checks not measured.
 */
export interface RepairSplit {
  beforeUse: Money;
  forAccuracy: Money;
  unmeasuredAllowance: Money;
  /** Deal-breakers found: not priced, the machine being valued for parts or rebuild. */
  dealBreakers: readonly string[];
}

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
  /** When given, the repairs are shown split; before use plus accuracy must equal `repairs`. */
  repairSplit?: RepairSplit | null;
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

function repairLines(split: RepairSplit, known: boolean): LandedCostLine[] {
  const allowance = split.unmeasuredAllowance.amountMinor;
  return [
    {
      id: 'repairs-before-use',
      label: 'Repairs needed before use',
      amount: known ? split.beforeUse : null,
      note: split.dealBreakers.length
        ? `Safety findings. Deal-breakers not priced (${split.dealBreakers.join('; ')}): the report values the machine for parts or rebuild.`
        : 'Safety findings: fix before the machine is used.',
    },
    {
      id: 'repairs',
      label: 'Repairs to restore accuracy',
      amount: known ? split.forAccuracy : null,
      // Not in the total: no finding calls for it, but the valuation deducts it, so it is named here.
      note: allowance > 0 ? `The valuation also deducts ${formatMoney(split.unmeasuredAllowance)} for checks not measured, taken at their worst; measuring them can only lower it.` : null,
    },
  ];
}

/**
 * What the machine costs standing in the buyer's shop: price, premium on the price, tax on price
 * plus premium, then rigging, converter, missing tooling and repairs (split, when the report's
 * valuation gives the split, into before use and to restore accuracy, the figures the valuation
 * deducts; its allowance for unmeasured checks is named beside them, not added, since no finding calls for it). Percentages round half away
 * from zero to a whole minor unit.
 */
export function landedCost(input: LandedCostInput): LandedCost {
  const c = input.currency;
  checkMoney('askingPrice', input.askingPrice, c);
  checkMoney('rigging', input.rigging, c);
  checkMoney('converter', input.converter, c);
  checkMoney('missingTooling', input.missingTooling, c);
  checkMoney('repairs', input.repairs, c);
  const split = input.repairSplit ?? null;
  if (split) {
    checkMoney('repairSplit.beforeUse', split.beforeUse, c);
    checkMoney('repairSplit.forAccuracy', split.forAccuracy, c);
    checkMoney('repairSplit.unmeasuredAllowance', split.unmeasuredAllowance, c);
    if (input.repairs !== null && split.beforeUse.amountMinor + split.forAccuracy.amountMinor !== input.repairs.amountMinor) {
      throw new DecisionInputError('repairSplit', 'Repairs before use and to restore accuracy must add up to the repair estimate');
    }
  }
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
    ...(split ? repairLines(split, input.repairs !== null) : [{ id: 'repairs' as const, label: 'Repairs the findings call for', amount: input.repairs, note: null }]),
  ];
  const known = lines.filter((l) => l.amount !== null);
  return {
    lines,
    total: { amountMinor: known.reduce((s, l) => s + l.amount!.amountMinor, 0), currency: c },
    notKnown: lines.filter((l) => l.amount === null).map((l) => l.label),
  };
}
