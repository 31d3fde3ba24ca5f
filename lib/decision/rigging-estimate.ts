import { DecisionInputError } from './decision-input-error';
import type { Money } from '@/lib/scoring/money';

/** How the riggers reach the machine: the harder the way out, the more hands and kit. */
export const SITE_ACCESS = ['ground-level-wide', 'narrow-door-or-steps', 'upper-floor-or-basement'] as const;
export type SiteAccess = (typeof SITE_ACCESS)[number];

export const SITE_ACCESS_LABELS: Record<SiteAccess, string> = {
  'ground-level-wide': 'Ground level, wide door',
  'narrow-door-or-steps': 'Narrow door or steps',
  'upper-floor-or-basement': 'Upper floor or basement',
};

/** Rates a buyer can edit. Money in minor units of `currency`. */
export interface RiggingRates {
  currency: string;
  /** Crew and kit to the site and back, whatever the machine. */
  callOutMinor: number;
  /** Skating, lifting and loading, per tonne of machine. */
  handlingPerTonneMinor: number;
  /** Transport per km with the ordinary truck. */
  perKmMinor: number;
  /** Above this weight the load needs the heavier vehicle and its per-km rate. */
  heavyVehicleAboveKg: number;
  heavyPerKmMinor: number;
  /** Multiplier on handling for the site's access. */
  accessFactor: Record<SiteAccess, number>;
}

/**
 * The distance a landed cost starts from where the buyer has not given theirs: the report page's
 * starting value, the comparison table's figure and the signed PDF's example all use it, so the three
 * agree. A round figure of our own (common practice, no source).
 */
export const STARTING_RIGGING_DISTANCE_KM = 100;

/** Invented demo figures, not a quotation from any firm. */
export const DEMO_RIGGING_RATES: RiggingRates = {
  currency: 'EUR',
  callOutMinor: 35_000,
  handlingPerTonneMinor: 12_000,
  perKmMinor: 250,
  heavyVehicleAboveKg: 3_500,
  heavyPerKmMinor: 450,
  accessFactor: { 'ground-level-wide': 1, 'narrow-door-or-steps': 1.25, 'upper-floor-or-basement': 1.6 },
};

export interface RiggingInput {
  weightKg: number;
  distanceKm: number;
  siteAccess: SiteAccess;
}

export interface RiggingEstimate {
  handling: Money;
  transport: Money;
  total: Money;
  heavyVehicle: boolean;
  working: string[];
}

function roundMinor(value: number): number {
  return Math.sign(value) * Math.round(Math.abs(value));
}

function requireNonNegative(field: string, value: number, what: string) {
  if (!Number.isFinite(value) || value < 0) throw new DecisionInputError(field, `${what} must be a number of zero or more`);
}

/**
 * handling = (call-out + per-tonne × tonnes) × access factor; transport = per-km × km with the
 * heavy vehicle's rate above its weight. A moving estimate, not a quotation.
 */
export function estimateRigging(input: RiggingInput, rates: RiggingRates): RiggingEstimate {
  if (!Number.isFinite(input.weightKg) || input.weightKg <= 0) throw new DecisionInputError('weightKg', 'Machine weight must be more than 0 kg');
  requireNonNegative('distanceKm', input.distanceKm, 'Distance');
  for (const field of ['callOutMinor', 'handlingPerTonneMinor', 'perKmMinor', 'heavyPerKmMinor', 'heavyVehicleAboveKg'] as const) {
    requireNonNegative(field, rates[field], 'Each rate');
  }
  const factor = rates.accessFactor[input.siteAccess];
  if (factor === undefined) throw new DecisionInputError('siteAccess', 'Choose how the riggers reach the machine');
  requireNonNegative('accessFactor', factor, 'The access factor');

  const tonnes = input.weightKg / 1000;
  const heavyVehicle = input.weightKg > rates.heavyVehicleAboveKg;
  const perKm = heavyVehicle ? rates.heavyPerKmMinor : rates.perKmMinor;
  const handlingMinor = roundMinor((rates.callOutMinor + rates.handlingPerTonneMinor * tonnes) * factor);
  const transportMinor = roundMinor(perKm * input.distanceKm);
  const c = rates.currency;
  return {
    handling: { amountMinor: handlingMinor, currency: c },
    transport: { amountMinor: transportMinor, currency: c },
    total: { amountMinor: handlingMinor + transportMinor, currency: c },
    heavyVehicle,
    working: [
      `handling = (${rates.callOutMinor} + ${rates.handlingPerTonneMinor} × ${tonnes} t) × ${factor} = ${handlingMinor} ${c} minor units`,
      `transport = ${perKm} × ${input.distanceKm} km${heavyVehicle ? ` (heavy vehicle above ${rates.heavyVehicleAboveKg} kg)` : ''} = ${transportMinor} ${c} minor units`,
    ],
  };
}
