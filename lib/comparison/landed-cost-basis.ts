import { landedCost, type LandedCost } from '@/lib/decision/landed-cost';
import { assessSupply, DEMO_CONVERTER_COSTS, CONVERTER_SIZING_FACTOR, type NameplateSupply, type SupplySpec } from '@/lib/decision/phase-converter';
import { DEMO_RIGGING_RATES, estimateRigging, STARTING_RIGGING_DISTANCE_KM, type SiteAccess } from '@/lib/decision/rigging-estimate';

/**
 * How the comparison table prices a machine standing in the reader's shop. The table cannot ask each
 * reader for a distance, rates, premium and tax row by row, so it takes the report page's starting
 * values: the machine's own moving sheet, 100 km of transport at the demo rigging rates, no buyer's
 * premium or tax (no listing carries them), and the phase converter the reader's shop supply calls
 * for (their profile; left out while they have not given it). The report page lets the reader change
 * each of these for one machine.
 */
export const TABLE_RIGGING_DISTANCE_KM = STARTING_RIGGING_DISTANCE_KM;

/** The text by shop supply: it is sent with every page, and formatting its money is not free. */
const assumptionsBySupply = new Map<string, string>();

/** What the table's landed-cost figure is made of, for the column's tooltip and the legend under the table. */
export function landedCostAssumptions(shop: SupplySpec | null): string {
  const key = shop ? `${shop.voltage}/${shop.phases}` : 'none';
  let text = assumptionsBySupply.get(key);
  if (text === undefined) {
    text = describeLandedCost(shop);
    // Supplies are few in practice; the bound only keeps an odd one from growing the map.
    if (assumptionsBySupply.size < 1_000) assumptionsBySupply.set(key, text);
  }
  return text;
}

function describeLandedCost(shop: SupplySpec | null): string {
  const rates = DEMO_RIGGING_RATES;
  const money = (minor: number) => `€${(minor / 100).toLocaleString('en-GB', { maximumFractionDigits: 2 })}`;
  const converter = shop
    ? `a phase converter where a three-phase machine meets your ${shop.voltage} V ${shop.phases === 1 ? 'single' : 'three'}-phase supply (${CONVERTER_SIZING_FACTOR} × motor power, demo installed costs)`
    : 'no phase converter, because your shop supply is not in your profile';
  return (
    `Asking price + rigging from the seller's moving sheet at ${TABLE_RIGGING_DISTANCE_KM} km ` +
    `(demo rates: call-out ${money(rates.callOutMinor)}, ${money(rates.handlingPerTonneMinor)} per tonne, ${money(rates.perKmMinor)} per km) + ` +
    `${converter} + missing tooling + the repairs the findings call for. No buyer's premium or tax. ` +
    'Parts not known are left out and the figure reads “at least”. Change distance, rates, premium and tax on the report page.'
  );
}

/** The listing and report facts the table's figure starts from; money in minor units of `currency`. */
export interface TableLandedCostFacts {
  currency: string;
  askingPriceMinor: number | null;
  repairsMinor: number | null;
  /** null when no inclusions are listed. */
  missingToolingMinor: number | null;
  weightKg: number | null;
  siteAccess: SiteAccess;
  nameplate: NameplateSupply | null;
}

/**
 * The same landed cost computed with lib/decision, as the report page computes it at its starting
 * values: the reference the table's SQL is tested against.
 */
export function tableLandedCost(facts: TableLandedCostFacts, shop: SupplySpec | null): LandedCost {
  const c = facts.currency;
  const rigging =
    facts.weightKg === null ? null : estimateRigging({ weightKg: facts.weightKg, distanceKm: TABLE_RIGGING_DISTANCE_KM, siteAccess: facts.siteAccess }, { ...DEMO_RIGGING_RATES, currency: c });
  const supply = assessSupply(facts.nameplate, shop, DEMO_CONVERTER_COSTS);
  const converter = supply.verdict === 'converter-needed' ? supply.converterCost : supply.verdict === 'runs' ? { amountMinor: 0, currency: c } : null;
  return landedCost({
    currency: c,
    askingPrice: facts.askingPriceMinor === null ? null : { amountMinor: facts.askingPriceMinor, currency: c },
    buyersPremiumPercent: null,
    taxPercent: null,
    rigging: rigging?.total ?? null,
    converter: converter && converter.currency === c ? converter : null,
    missingTooling: facts.missingToolingMinor === null ? null : { amountMinor: facts.missingToolingMinor, currency: c },
    repairs: facts.repairsMinor === null ? null : { amountMinor: facts.repairsMinor, currency: c },
  });
}

/** The converter part for one stored comparison entry and a shop: minor units, 0 when it runs as is, null when not known. */
export function converterMinorFor(
  entry: { supplyVoltage: number | null; supplyPhases: number | null; motorKw: string | number | null; priceCurrency: string },
  shop: SupplySpec | null,
): number | null {
  const phases = entry.supplyPhases === 1 || entry.supplyPhases === 3 ? (entry.supplyPhases as 1 | 3) : null;
  const nameplate = phases && entry.supplyVoltage !== null ? { voltage: entry.supplyVoltage, phases, motorKw: entry.motorKw === null ? null : Number(entry.motorKw) } : null;
  const supply = assessSupply(nameplate, shop, DEMO_CONVERTER_COSTS);
  if (supply.verdict === 'runs') return 0;
  if (supply.verdict !== 'converter-needed' || !supply.converterCost || supply.converterCost.currency !== entry.priceCurrency) return null;
  return supply.converterCost.amountMinor;
}
