import type { Money } from '@/lib/scoring/money';

export interface SupplySpec {
  voltage: number;
  phases: 1 | 3;
}

export interface NameplateSupply extends SupplySpec {
  motorKw: number | null;
}

export type SupplyVerdict = 'runs' | 'converter-needed' | 'voltage-differs' | 'unknown';

export interface ConverterSize {
  upToKw: number;
  cost: Money;
}

/**
 * Rotary phase converters by rating, with a typical installed cost. Invented demo figures, not
 * prices from any firm.
 */
export const DEMO_CONVERTER_COSTS: readonly ConverterSize[] = [
  { upToKw: 2.2, cost: { amountMinor: 95_000, currency: 'EUR' } },
  { upToKw: 4, cost: { amountMinor: 140_000, currency: 'EUR' } },
  { upToKw: 7.5, cost: { amountMinor: 210_000, currency: 'EUR' } },
  { upToKw: 11, cost: { amountMinor: 290_000, currency: 'EUR' } },
  { upToKw: 15, cost: { amountMinor: 380_000, currency: 'EUR' } },
];

/** A converter rated at 1.5 × the motor covers a lathe's starting load (common practice). */
export const CONVERTER_SIZING_FACTOR = 1.5;

/** Nominal voltages within 10 % of each other are the same supply (IEC 60038 supply tolerance, from memory). */
export const VOLTAGE_TOLERANCE = 0.1;

export interface SupplyAssessment {
  verdict: SupplyVerdict;
  converterKw: number | null;
  converterCost: Money | null;
  explanation: string;
}

function sameVoltage(a: number, b: number): boolean {
  return Math.abs(a - b) <= VOLTAGE_TOLERANCE * Math.max(a, b);
}

/**
 * Will the machine run on the buyer's supply? A three-phase machine on a single-phase shop needs a
 * converter sized from the motor; a single-phase machine runs from one phase of a three-phase shop
 * at the same phase-to-neutral voltage (common practice).
 */
export function assessSupply(
  machine: NameplateSupply | null,
  shop: SupplySpec | null,
  converters: readonly ConverterSize[] = DEMO_CONVERTER_COSTS,
): SupplyAssessment {
  if (!machine) return { verdict: 'unknown', converterKw: null, converterCost: null, explanation: 'The nameplate supply was not recorded.' };
  if (!shop) return { verdict: 'unknown', converterKw: null, converterCost: null, explanation: 'Add your shop’s supply to your profile to see whether the machine runs on it.' };

  if (machine.phases === 3 && shop.phases === 1) {
    if (machine.motorKw === null) {
      return { verdict: 'converter-needed', converterKw: null, converterCost: null, explanation: 'A three-phase machine on a single-phase supply needs a phase converter; the motor power was not recorded, so no size or cost is given.' };
    }
    const kw = machine.motorKw * CONVERTER_SIZING_FACTOR;
    const size = [...converters].sort((a, b) => a.upToKw - b.upToKw).find((c) => c.upToKw >= kw) ?? null;
    return {
      verdict: 'converter-needed',
      converterKw: size?.upToKw ?? null,
      converterCost: size?.cost ?? null,
      explanation: size
        ? `A three-phase ${machine.motorKw} kW motor on a single-phase supply needs a phase converter of at least ${CONVERTER_SIZING_FACTOR} × ${machine.motorKw} = ${Math.round(kw * 100) / 100} kW; the ${size.upToKw} kW size is the first that covers it.`
        : `A three-phase ${machine.motorKw} kW motor needs a converter above ${Math.round(kw * 100) / 100} kW, beyond the sizes listed; ask a supplier.`,
    };
  }
  // A three-phase shop serves single-phase machines at phase-to-neutral voltage: 400 V lines give 230 V.
  const shopVoltageForMachine = machine.phases === 1 && shop.phases === 3 ? Math.round(shop.voltage / Math.sqrt(3)) : shop.voltage;
  if (!sameVoltage(machine.voltage, shopVoltageForMachine)) {
    return {
      verdict: 'voltage-differs',
      converterKw: null,
      converterCost: null,
      explanation: `The machine is rated ${machine.voltage} V and the shop gives ${shopVoltageForMachine} V: a transformer, or reconnecting the motor where its plate allows, is needed.`,
    };
  }
  return { verdict: 'runs', converterKw: null, converterCost: null, explanation: `The machine’s ${machine.voltage} V ${machine.phases === 1 ? 'single' : 'three'}-phase supply matches the shop.` };
}
