import { LATHE_MODELS } from './scenario';
import type { Random } from './random';

const CONDITIONS = ['Very good', 'Good', 'Good', 'Fair', 'Fair', 'Poor'] as const;
const KINDS = ['dealer_retail', 'private', 'auction', 'liquidation'] as const;
// How sale kinds price relative to a dealer's retail price (invented demo figures).
const KIND_FACTOR = { dealer_retail: 1, private: 0.85, auction: 0.7, liquidation: 0.55 } as const;
const CONDITION_FACTOR = { Excellent: 1.2, 'Very good': 1.05, Good: 0.9, Fair: 0.7, Poor: 0.45, Salvage: 0.2 } as const;

/** Invented sales of lathes like the demo ones over the last two years, six per model. */
export function demoComparableSales(random: Random, now: Date) {
  return LATHE_MODELS.flatMap((model) =>
    Array.from({ length: 6 }, () => {
      const year = random.int(1975, 2015);
      const condition = random.pick(CONDITIONS);
      const saleKind = random.pick(KINDS);
      const age = now.getUTCFullYear() - year;
      const newPrice = model.swingMm * 95 * (model.kind === 'toolroom' ? 1.9 : 1);
      const price = newPrice * Math.max(0.18, 1 - age / 45) * KIND_FACTOR[saleKind] * CONDITION_FACTOR[condition] * random.between(0.85, 1.15);
      const soldOn = new Date(now.getTime() - random.int(20, 720) * 24 * 60 * 60 * 1000).toISOString().slice(0, 10);
      return {
        machineType: 'centre_lathe' as const,
        description: `${model.maker} ${model.model}, ${year}, ${saleKind.replace('_', ' ')}`,
        yearBuilt: year,
        swingMm: model.swingMm,
        betweenCentresMm: random.pick(model.centres),
        condition,
        saleKind,
        priceMinor: Math.round(price / 10) * 1000,
        soldOn,
        region: random.pick(['Brenmark', 'Lower Tessa', 'Saltmarch']),
        source: random.pick(['Dealer price list', 'Auction results sheet', 'Reported by buyer']),
      };
    }),
  );
}
