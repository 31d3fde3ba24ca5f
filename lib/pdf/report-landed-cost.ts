import { formatMoney } from '@/lib/format';
import type { ScoringResult } from '@/lib/scoring';
import { landedCost, type LandedCost } from '@/lib/decision/landed-cost';
import { repairSplitFrom } from '@/lib/decision/repair-split';
import { assessSupply } from '@/lib/decision/phase-converter';
import type { ReleaseFacts } from '@/lib/decision/release-facts';
import { DEMO_RIGGING_RATES, estimateRigging, SITE_ACCESS_LABELS, STARTING_RIGGING_DISTANCE_KM, type RiggingEstimate } from '@/lib/decision/rigging-estimate';

/**
 * The landed cost as the signed PDF prints it. A released version's PDF is one file for every
 * buyer, so it cannot use any buyer's shop: it works from the listing's facts kept at release and
 * a stated basis of its own, and says so. The report page redoes the sum for the buyer's own shop.
 */
export const REPORT_LANDED_COST_BASIS = {
  /** A round distance for the example move; the buyer's own is on the report page. */
  distanceKm: STARTING_RIGGING_DISTANCE_KM,
  rates: DEMO_RIGGING_RATES,
  /** A private sale: no premium, and any tax reclaimable by a business buyer. */
  buyersPremiumPercent: null,
  taxPercent: null,
  /** The single-phase supply the converter line is priced against, for the note (a typical European single-phase supply). */
  singlePhaseShop: { voltage: 230, phases: 1 as const },
} as const;

export interface ReportLandedCost {
  cost: LandedCost;
  rigging: RiggingEstimate | null;
  /** The basis in words, printed under the sum. */
  assumptions: string[];
}

const phaseWord = (phases: 1 | 3) => (phases === 1 ? 'single' : 'three');

export function reportLandedCost(basis: ReleaseFacts['landedCostBasis'], result: ScoringResult, releasedAt: Date | null): ReportLandedCost {
  const c = basis.currency;
  const b = REPORT_LANDED_COST_BASIS;
  const money = (minor: number) => formatMoney(minor, c);
  const cents = (minor: number) => new Intl.NumberFormat('en-GB', { style: 'currency', currency: c, minimumFractionDigits: 2 }).format(minor / 100);
  const assumptions: string[] = [
    `Every copy of this report version prints the same figures: the listing as it stood when the version was released${releasedAt ? ` (${releasedAt.toISOString().slice(0, 10)})` : ''}, ${
      basis.askingPriceMinor === null ? 'with no asking price (offers invited), ' : 'its asking price included, '
    }and the basis below, not any one buyer's shop. The report page redoes the sum with your own supply, distance and rates.`,
  ];

  const ratesUsable = b.rates.currency === c;
  let rigging: RiggingEstimate | null = null;
  if (basis.weightKg === null) {
    assumptions.push('Rigging and transport not known: the seller gave no machine weight on the moving sheet.');
  } else if (!ratesUsable) {
    assumptions.push(`Rigging and transport not known: the example rates are set in ${b.rates.currency} and the listing is in ${c}.`);
  } else {
    const siteAccess = basis.siteAccess ?? 'ground-level-wide';
    rigging = estimateRigging({ weightKg: basis.weightKg, distanceKm: b.distanceKm, siteAccess }, b.rates);
    assumptions.push(
      `Rigging and transport: ${basis.weightKg.toLocaleString('en-GB')} kg, ${SITE_ACCESS_LABELS[siteAccess].toLowerCase()}${basis.siteAccess ? '' : ' (access not stated, so assumed)'}, moved ${b.distanceKm} km at invented example rates (call-out ${money(b.rates.callOutMinor)}, handling ${money(b.rates.handlingPerTonneMinor)} a tonne, transport ${cents(rigging.heavyVehicle ? b.rates.heavyPerKmMinor : b.rates.perKmMinor)} a km${rigging.heavyVehicle ? ` with the heavy vehicle above ${b.rates.heavyVehicleAboveKg.toLocaleString('en-GB')} kg` : ''}): an example, not a quotation.`,
    );
  }

  let converter: { amountMinor: number; currency: string } | null = null;
  if (!basis.nameplate) {
    assumptions.push('Phase converter not known: the nameplate supply was not recorded.');
  } else {
    converter = { amountMinor: 0, currency: c };
    const plate = `${basis.nameplate.voltage} V ${phaseWord(basis.nameplate.phases)}-phase`;
    if (basis.nameplate.phases === 3) {
      const single = assessSupply(basis.nameplate, b.singlePhaseShop);
      const price = single.converterCost && single.converterCost.currency === c ? `, about ${money(single.converterCost.amountMinor)} at invented example prices` : '';
      assumptions.push(`Supply: a shop with the nameplate's ${plate} supply, so no converter. ${single.explanation.replace(/\.$/, '')}${price}.`);
    } else {
      assumptions.push(`Supply: a shop with the nameplate's ${plate} supply (or a three-phase supply with that voltage phase to neutral), so no converter.`);
    }
  }

  assumptions.push('No buyer’s premium and no tax: a private sale, any tax reclaimable. At an auction add the premium and any tax you cannot reclaim.');
  assumptions.push(basis.missingToolingMinor === null ? 'Missing tooling not known: the seller listed nothing that comes with the machine.' : 'Missing tooling: the replacement cost of what the seller listed as missing at release.');

  const repairs = result.repairEstimate.total.currency === c ? result.repairEstimate.total : null;
  const repairSplit = repairSplitFrom(result, c);
  assumptions.push(
    !repairs
      ? `Repairs not in the total: the repair estimate is in ${result.repairEstimate.total.currency} and the listing in ${c}.`
      : repairSplit
        ? 'Repairs: the repair estimate in this report, those the safety findings call for kept apart, with the allowance for unmeasured checks the valuation also deducts.'
        : 'Repairs: the repair estimate in this report.',
  );

  const cost = landedCost({
    currency: c,
    askingPrice: basis.askingPriceMinor === null ? null : { amountMinor: basis.askingPriceMinor, currency: c },
    buyersPremiumPercent: b.buyersPremiumPercent,
    taxPercent: b.taxPercent,
    rigging: rigging?.total ?? null,
    converter,
    missingTooling: basis.missingToolingMinor === null ? null : { amountMinor: basis.missingToolingMinor, currency: c },
    repairs,
    repairSplit,
  });
  return { cost, rigging, assumptions };
}
