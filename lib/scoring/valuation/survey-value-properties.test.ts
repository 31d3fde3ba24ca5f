import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import dealBreaker from '../examples/deal-breaker.json';
import inchUnits from '../examples/inch-units.json';
import nearNew from '../examples/near-new.json';
import safetyDefect from '../examples/safety-defect.json';
import worn from '../examples/worn.json';
import sales from '../examples/sales/comparable-sales.json';
import { scoreSurvey } from '../score-survey';
import { CONDITION_GRADES, gradeRank } from '../grading/condition-scale';
import { HIDDEN_DAMAGE_ITEMS } from '../survey/checklist-items';
import { money } from '../money';
import { SALE_KINDS } from './valuation-tables';
import type { ComparableSale } from './valuation-types';

/** Property tests over whole surveys: the value as the report states it. */
const SURVEYS = { worn, nearNew, safetyDefect, inchUnits } as Record<string, Record<string, unknown>>;
const SECTIONS = ['lubrication', 'gearboxAndFeeds', 'drive', 'bedAndWays', 'spindle', 'slidesAndScrews', 'tailstock', 'testCuts', 'electricalAndSafety'];

const comparableArb: fc.Arbitrary<ComparableSale> = fc.record(
  {
    price: fc.integer({ min: 50_000, max: 3_000_000 }).map((m) => money(m, 'EUR')),
    condition: fc.constantFrom(...CONDITION_GRADES),
    saleKind: fc.constantFrom(...SALE_KINDS),
    yearBuilt: fc.integer({ min: 1960, max: 2024 }),
    swingOverBedMm: fc.integer({ min: 300, max: 480 }),
    soldOn: fc.constantFrom('2023-03-01', '2024-07-15', '2025-01-20'),
  },
  { requiredKeys: ['price'] },
);
const salesArb = fc.oneof(fc.constant(sales as ComparableSale[]), fc.array(comparableArb, { maxLength: 12 }));
const fmv = (survey: unknown, comparableSales: readonly ComparableSale[]) =>
  scoreSurvey(survey, { comparableSales, asOfYear: 2025 }).valuation.reconciliation!.fairMarketValue.amountMinor;

describe('value of a scored survey', () => {
  it('never rises when sections are left out', () => {
    fc.assert(
      fc.property(fc.constantFrom(...Object.keys(SURVEYS)), fc.subarray(SECTIONS, { minLength: 1 }), salesArb, (name, dropped, comparableSales) => {
        const full = SURVEYS[name]!;
        const partial = { ...full };
        for (const s of dropped) delete partial[s];
        expect(fmv(partial, comparableSales)).toBeLessThanOrEqual(fmv(full, comparableSales));
      }),
      { numRuns: 150 },
    );
  });

  it('never values a better grade than the report states, with damage holding the grade and sections left out', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...Object.keys(SURVEYS)),
        fc.subarray(HIDDEN_DAMAGE_ITEMS.map((i) => i.id)),
        fc.subarray(SECTIONS),
        (name, damage, dropped) => {
          const survey: Record<string, unknown> = { ...SURVEYS[name]!, hiddenDamage: Object.fromEntries(damage.map((id) => [id, { present: true }])) };
          for (const s of dropped) delete survey[s];
          const result = scoreSurvey(survey, { comparableSales: sales as ComparableSale[], asOfYear: 2025 });
          if (result.overall.condition === null) return;
          expect(gradeRank(result.valuation.conditionValued!)).toBeGreaterThanOrEqual(gradeRank(result.overall.condition));
        },
      ),
      { numRuns: 120 },
    );
  });

  it('lets recorded deal-breakers reach the value: never above the same survey without them', () => {
    fc.assert(
      fc.property(fc.constantFrom(...Object.keys(SURVEYS)), salesArb, (name, comparableSales) => {
        const withOne = { ...SURVEYS[name]!, dealBreakers: dealBreaker.dealBreakers };
        const result = scoreSurvey(withOne, { comparableSales, asOfYear: 2025 });
        expect(result.valuation.premise.id).toBe('parts-or-rebuild');
        expect(result.valuation.conditionValued).toBe('Salvage');
        expect(result.valuation.reconciliation!.fairMarketValue.amountMinor).toBeLessThanOrEqual(fmv(SURVEYS[name], comparableSales));
      }),
      { numRuns: 60 },
    );
  });

  it('values the deal-breaker example far below the same machine without them', () => {
    const without: Record<string, unknown> = { ...dealBreaker };
    delete without.dealBreakers;
    const withValue = fmv(dealBreaker, sales as ComparableSale[]);
    expect(withValue).toBeLessThan(fmv(without, sales as ComparableSale[]) / 2);
  });
});
