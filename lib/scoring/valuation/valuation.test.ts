import { median as referenceMedian } from 'simple-statistics';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CONDITION_GRADES, gradeRank, type ConditionGrade } from '../grading/condition-scale';
import { money } from '../money';
import type { RepairEstimate } from '../repair/repair-estimate';
import { effectiveAge, percentGoodByAgeLife, percentGoodLevelled } from './age-life';
import { costApproach, type CostApproachInput } from './cost-approach';
import { median } from './median';
import { salesComparison, type GridSubject } from './sales-comparison';
import { defaultValuationTables, SALE_KINDS, type ValuationTables } from './valuation-tables';
import type { ComparableSale } from './valuation-types';
import { valueMachine, type ValueMachineInput } from './value-machine';

const eur = (minor: number) => money(minor, 'EUR');
const repairs = (minor: number, lines: RepairEstimate['lines'] = []): RepairEstimate => {
  const setUp = lines.filter((l) => l.kind === 'set-up-and-service').reduce((sum, l) => sum + l.cost.amountMinor, 0);
  return { catalogueId: 'test', lines, total: eur(minor), setUpAndServiceTotal: eur(setUp), repairTotal: eur(minor - setUp), explanation: '' };
};

describe('age-life percent good', () => {
  it('gives 40 % good and 16 000 for RCN 40 000, life 20, effective age 12', () => {
    // [src: machinery & equipment appraisal, age-life method; worked example] 1 − 12/20 = 0.40; 40 000 × 0.40 = 16 000
    const pg = percentGoodByAgeLife(12, 20);
    expect(pg).toBeCloseTo(0.4, 12);
    expect(40_000 * pg).toBeCloseTo(16_000, 6);
  });

  it('levels off at the residual instead of reaching zero', () => {
    // worked example: residual 0.15, life 50, age 25 → 0.15 + 0.85 × (1 − 25/50) = 0.575; age 60 → 0.15
    expect(percentGoodLevelled(25, 50, 0.15)).toBeCloseTo(0.575, 12);
    expect(percentGoodLevelled(60, 50, 0.15)).toBeCloseTo(0.15, 12);
    // residual 0 is the straight line: the same worked example again
    expect(percentGoodLevelled(12, 20, 0)).toBeCloseTo(0.4, 12);
  });

  it('takes the actual age as the effective age, and the condition only without a year', () => {
    // Breakdown method: condition must not move the age, the cure already pays for the wear.
    expect(effectiveAge(46, 0.4, 50)).toBe(46);
    // worked example: life 50 × (1 − 0.40 for Fair) = 30 years
    expect(effectiveAge(null, 0.4, 50)).toBeCloseTo(30, 12);
    expect(effectiveAge(null, null, 50)).toBeNull();
  });
});

const lathe330 = { latheType: 'general-purpose', swingMm: 330, distanceBetweenCentresMm: 1000 } as const;

describe('cost approach by the breakdown method', () => {
  it('values the domain example at 16 000 when the tables are RCN 40 000 and life 20', () => {
    // worked example [src: age-life method]: RCN 40 000, life 20, effective age 12,
    // nothing to cure, no residual → 40 000 × (1 − 12/20) = 16 000.00 (1 600 000 cents)
    const tables: ValuationTables = {
      ...defaultValuationTables,
      replacementCostNew: [{ upToSwingMm: Number.POSITIVE_INFINITY, generalPurposeMinor: 4_000_000 }],
      normalUsefulLifeYears: 20,
      residualPercentGood: 0,
      partsShareOfReplacementCost: 0,
    };
    const r = costApproach({ ...lathe330, actualAgeYears: 12, condition: 'Good', repairTotal: eur(0), premise: 'as-is-in-use', tables })!;
    expect(r.replacementCostNew.amountMinor).toBe(4_000_000);
    expect(r.percentGood).toBeCloseTo(0.4, 12);
    expect(r.fairMarketValue.amountMinor).toBe(1_600_000);
  });

  it('deducts the cost to cure once, then age-life on what remains', () => {
    // worked example: RCN 28 000.00 (swing 330 ≤ 450, 1 m centres); cure 5 000.00 → 23 000.00;
    // age 25 of 50 → 0.15 + 0.85 × 0.5 = 0.575; 23 000 × 0.575 = 13 225.00; incurable 9 775.00
    const r = costApproach({ ...lathe330, actualAgeYears: 25, condition: 'Fair', repairTotal: eur(500_000), premise: 'as-is-in-use', tables: defaultValuationTables })!;
    expect(r.replacementCostNew.amountMinor).toBe(2_800_000);
    expect(r.repairDeduction.amountMinor).toBe(500_000);
    expect(r.incurableDeterioration.amountMinor).toBe(977_500);
    expect(r.fairMarketValue.amountMinor).toBe(1_322_500);
  });

  it('does not count wear twice: with the year known, the grade does not move the value', () => {
    const at = (condition: ConditionGrade) =>
      costApproach({ ...lathe330, actualAgeYears: 25, condition, repairTotal: eur(500_000), premise: 'as-is-in-use', tables: defaultValuationTables })!.fairMarketValue.amountMinor;
    expect(at('Excellent')).toBe(at('Poor'));
  });

  it('keeps a 40-year-old lathe above the parts value (the life fits manual machine tools)', () => {
    // worked example: 28 000 × (0.15 + 0.85 × (1 − 40/50)) = 28 000 × 0.32 = 8 960.00, parts value 2 240.00
    const r = costApproach({ ...lathe330, actualAgeYears: 40, condition: 'Fair', repairTotal: eur(0), premise: 'as-is-in-use', tables: defaultValuationTables })!;
    expect(r.fairMarketValue.amountMinor).toBe(896_000);
  });

  it('never values below the parts value, and values on it alone for parts or rebuild', () => {
    const base: CostApproachInput = { ...lathe330, actualAgeYears: 50, condition: 'Poor', repairTotal: eur(5_000_000), premise: 'as-is-in-use', tables: defaultValuationTables };
    // cure above RCN: parts value RCN × 0.08 = 2 240.00 [from memory: parts-or-rebuild share]
    expect(costApproach(base)!.fairMarketValue.amountMinor).toBe(224_000);
    const parts = costApproach({ ...base, repairTotal: eur(0), actualAgeYears: 4, condition: 'Excellent', premise: 'parts-or-rebuild' })!;
    expect(parts.fairMarketValue.amountMinor).toBe(224_000);
    expect(parts.working.join('\n')).toMatch(/parts or rebuild/);
  });
});

const subject: GridSubject = {
  latheType: 'general-purpose',
  swingMm: 400,
  distanceBetweenCentresMm: 1500,
  yearBuilt: 1980,
  condition: 'Good',
  toolingIncluded: true,
  effectiveDate: '2025-06-01',
};
const sale = (over: Partial<ComparableSale> & { amount: number }): ComparableSale => ({
  price: eur(over.amount),
  description: over.description ?? `sale ${over.amount}`,
  soldOn: '2025-06-01',
  condition: 'Good',
  swingOverBedMm: 400,
  betweenCentresMm: 1500,
  yearBuilt: 1980,
  saleKind: 'private',
  ...over,
});

describe('sales comparison grid', () => {
  it('needs at least five comparable sales', () => {
    const r = salesComparison([1, 2, 3, 4].map((i) => sale({ amount: i * 100_000 })), subject, defaultValuationTables);
    expect(r.result).toBeNull();
    expect(r.note).toMatch(/at least 5/);
  });

  it('shows each adjustment with its basis and multiplies them', () => {
    // worked example (tables: valuation-tables.ts): a Fair dealer-retail sale of a 1990 lathe with no
    // tooling, sold 12 months before: condition 0.55/0.40 = 1.375; age 1 % × (1980 − 1990) = 0.90;
    // tooling +8 % = 1.08; dealer retail ÷ 1.10; time 1 + 0.0025 × 12 = 1.03 (365 days / 30.4375 = 11.99 months)
    const odd = sale({ amount: 1_000_000, condition: 'Fair', yearBuilt: 1990, saleKind: 'dealer_retail', toolingIncluded: false, soldOn: '2024-06-01' });
    const r = salesComparison([odd, ...[1, 2, 3, 4].map(() => sale({ amount: 1_000_000 }))], subject, defaultValuationTables).result!;
    const row = r.adjustedPrices[0]!;
    const by = Object.fromEntries(row.grid.map((g) => [g.factor, g.multiplier]));
    expect(by).toMatchObject({ size: 1, age: 0.9, condition: 1.375, tooling: 1.08 });
    expect(by['sale-kind']).toBeCloseTo(1 / 1.1, 4);
    expect(by.time).toBeCloseTo(1 + 0.0025 * (365 / 30.4375), 4);
    const expected = 1_000_000 * 0.9 * 1.375 * 1.08 * (1 / 1.1) * (1 + 0.0025 * (365 / 30.4375));
    expect(row.adjusted.amountMinor).toBe(Math.round(expected));
    for (const g of row.grid) expect(g.basis.length).toBeGreaterThan(10);
  });

  it('scales size by the replacement cost of the two sizes', () => {
    // 460 swing falls in the "up to 600" row (48 000) and 400 in "up to 450" (28 000): 28/48
    const r = salesComparison([sale({ amount: 1_200_000, swingOverBedMm: 460 }), ...[1, 2, 3, 4].map(() => sale({ amount: 700_000 }))], subject, defaultValuationTables).result!;
    expect(r.adjustedPrices[0]!.grid[0]!.multiplier).toBeCloseTo(28 / 48, 4);
  });

  it('shows an outlier and leaves it out of the weighted value', () => {
    const prices = [600_000, 620_000, 640_000, 660_000, 680_000, 2_000_000];
    const r = salesComparison(prices.map((amount) => sale({ amount })), subject, defaultValuationTables).result!;
    expect(r.adjustedPrices).toHaveLength(6);
    expect(r.adjustedPrices[5]!.outlier).toBe(true);
    expect(r.adjustedPrices[5]!.weight).toBe(0);
    expect(r.comparablesUsed).toBe(5);
    // identical grids → equal weights → the plain mean of the five kept: 640 000
    expect(r.indicatedValue.amountMinor).toBe(640_000);
  });

  it('weighs the closer sale more', () => {
    const r = salesComparison(
      [sale({ amount: 500_000 }), sale({ amount: 500_000, yearBuilt: 2000 }), ...[1, 2, 3].map(() => sale({ amount: 500_000 }))],
      subject,
      defaultValuationTables,
    ).result!;
    expect(r.adjustedPrices[0]!.weight).toBeGreaterThan(r.adjustedPrices[1]!.weight);
  });

  it('takes the orderly liquidation value from auction sales only', () => {
    const sales = [...[1, 2, 3, 4, 5].map(() => sale({ amount: 1_000_000 })), ...[1, 2, 3].map(() => sale({ amount: 600_000, saleKind: 'auction' }))];
    const r = salesComparison(sales, subject, defaultValuationTables, 'orderly-liquidation').result!;
    expect(r.comparablesUsed).toBe(3);
    expect(r.indicatedValue.amountMinor).toBe(600_000);
  });
});

const baseInput = (over: Partial<ValueMachineInput> = {}): ValueMachineInput => ({
  latheType: 'general-purpose',
  swingMm: 400,
  distanceBetweenCentresMm: 1500,
  yearBuilt: 1980,
  actualAgeYears: 45,
  effectiveDate: '2025-06-01',
  condition: 'Good',
  repairs: repairs(0),
  safetyCheckIds: [],
  dealBreakers: [],
  confidence: 1,
  worstCase: null,
  comparableSales: [],
  tables: defaultValuationTables,
  ...over,
});

describe('valuation', () => {
  it('falls back to the fixed liquidation ratios, labelled, when too few such sales are known', () => {
    const v = valueMachine(baseInput());
    expect(v.orderlyLiquidation!.basis).toBe('fallback-ratio');
    expect(v.reconciliation!.working.join('\n')).toMatch(/fallback ratio/);
    // RCN 28 000 × 1.06 (0.5 m beyond 1 m) = 29 680; × (0.15 + 0.85 × (1 − 45/50)) = 0.235 → 6 974.80
    expect(v.reconciliation!.fairMarketValue.amountMinor).toBe(697_480);
    expect(v.reconciliation!.orderlyLiquidationValue.amountMinor).toBe(Math.round(697_480 * 0.65));
  });

  it('values a machine with a deal-breaker on the parts-or-rebuild premise and the Salvage grade', () => {
    const v = valueMachine(baseInput({ condition: 'Excellent', dealBreakers: [{ label: 'Cracked casting' }] }));
    expect(v.premise.id).toBe('parts-or-rebuild');
    expect(v.conditionValued).toBe('Salvage');
    // parts value 29 680 × 0.08 = 2 374.40
    expect(v.reconciliation!.fairMarketValue.amountMinor).toBe(237_440);
  });

  it('splits the cost to cure into before use and accuracy, summing to the deduction', () => {
    const lines: RepairEstimate['lines'] = [
      { actionId: 'estop', label: 'E-stop', cost: eur(45_000), triggeredBy: ['emergency-stop'], kind: 'repair' },
      { actionId: 'gib', label: 'Gib', cost: eur(30_000), triggeredBy: ['cross-slide-backlash'], kind: 'repair' },
    ];
    const worst = repairs(275_000, [...lines, { actionId: 'bearings', label: 'Bearings', cost: eur(200_000), triggeredBy: ['spindle-lift'], kind: 'repair' }]);
    const v = valueMachine(baseInput({ repairs: repairs(75_000, lines), safetyCheckIds: ['emergency-stop'], confidence: 0.9, worstCase: { condition: 'Fair', repairs: worst, unmeasured: 1 } }));
    expect(v.costToCure.beforeUse.amountMinor).toBe(45_000);
    expect(v.costToCure.forAccuracy.amountMinor).toBe(30_000);
    expect(v.costToCure.unmeasuredAllowance.amountMinor).toBe(200_000);
    expect(v.costApproach!.repairDeduction.amountMinor).toBe(275_000);
  });

  it('states a range below the confidence a point value needs', () => {
    const worstCase = { condition: 'Poor' as const, repairs: repairs(900_000), unmeasured: 12 };
    const low = valueMachine(baseInput({ confidence: 0.5, worstCase }));
    expect(low.range).not.toBeNull();
    expect(low.range!.low.amountMinor).toBe(low.reconciliation!.fairMarketValue.amountMinor);
    expect(low.range!.high.amountMinor).toBeGreaterThan(low.range!.low.amountMinor);
    expect(valueMachine(baseInput({ confidence: 0.9, worstCase })).range).toBeNull();
  });
});

/** Generated families of comparables around a 400 mm lathe. */
const comparableArb: fc.Arbitrary<ComparableSale> = fc.record(
  {
    price: fc.integer({ min: 50_000, max: 5_000_000 }).map(eur),
    condition: fc.constantFrom(...CONDITION_GRADES),
    saleKind: fc.constantFrom(...SALE_KINDS),
    yearBuilt: fc.integer({ min: 1950, max: 2024 }),
    swingOverBedMm: fc.integer({ min: 340, max: 460 }),
    betweenCentresMm: fc.integer({ min: 600, max: 3000 }),
    soldOn: fc.date({ min: new Date('2022-01-01'), max: new Date('2025-05-31'), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10)),
    toolingIncluded: fc.boolean(),
  },
  { requiredKeys: ['price', 'condition'] },
);
const inputArb = fc.record({
  yearBuilt: fc.option(fc.integer({ min: 1940, max: 2025 }), { nil: null }),
  condition: fc.constantFrom(...CONDITION_GRADES),
  repairMinor: fc.integer({ min: 0, max: 5_000_000 }),
  comparables: fc.array(comparableArb, { maxLength: 14 }),
  swingMm: fc.integer({ min: 150, max: 1500 }),
  toolroom: fc.boolean(),
});
type Generated = typeof inputArb extends fc.Arbitrary<infer T> ? T : never;
const inputFrom = (g: Generated): ValueMachineInput =>
  baseInput({
    latheType: g.toolroom ? 'toolroom' : 'general-purpose',
    swingMm: g.swingMm,
    yearBuilt: g.yearBuilt,
    actualAgeYears: g.yearBuilt === null ? null : 2025 - g.yearBuilt,
    condition: g.condition,
    repairs: repairs(g.repairMinor),
    comparableSales: g.comparables,
  });
const fmv = (input: ValueMachineInput) => valueMachine(input).reconciliation!.fairMarketValue.amountMinor;

describe('valuation properties', () => {
  it('keeps FLV ≤ OLV ≤ FMV', () => {
    fc.assert(
      fc.property(inputArb, (g) => {
        const r = valueMachine(inputFrom(g)).reconciliation!;
        expect(r.forcedLiquidationValue.amountMinor).toBeLessThanOrEqual(r.orderlyLiquidationValue.amountMinor);
        expect(r.orderlyLiquidationValue.amountMinor).toBeLessThanOrEqual(r.fairMarketValue.amountMinor);
      }),
    );
  });

  it('never values a worse condition higher', () => {
    fc.assert(
      fc.property(inputArb, fc.constantFrom(...CONDITION_GRADES), (g, other) => {
        const [better, worse] = gradeRank(g.condition) <= gradeRank(other) ? [g.condition, other] : [other, g.condition];
        expect(fmv({ ...inputFrom(g), condition: worse })).toBeLessThanOrEqual(fmv({ ...inputFrom(g), condition: better }));
      }),
    );
  });

  it('never values more repairs higher', () => {
    fc.assert(
      fc.property(inputArb, fc.integer({ min: 0, max: 2_000_000 }), (g, extra) => {
        const input = inputFrom(g);
        expect(fmv({ ...input, repairs: repairs(g.repairMinor + extra) })).toBeLessThanOrEqual(fmv(input));
      }),
    );
  });

  it('lets a deal-breaker reach the value: parts-or-rebuild premise, never above the value without it', () => {
    fc.assert(
      fc.property(inputArb, (g) => {
        const input = inputFrom(g);
        const withDealBreaker = valueMachine({ ...input, dealBreakers: [{ label: 'Broken gear teeth' }] });
        expect(withDealBreaker.premise.id).toBe('parts-or-rebuild');
        expect(withDealBreaker.conditionValued).not.toBe('Excellent');
        expect(withDealBreaker.reconciliation!.fairMarketValue.amountMinor).toBeLessThanOrEqual(fmv(input));
        // the cost approach on that premise is the parts value alone
        const rcn = withDealBreaker.costApproach!.replacementCostNew.amountMinor;
        expect(withDealBreaker.costApproach!.fairMarketValue.amountMinor).toBe(Math.round(rcn * defaultValuationTables.partsShareOfReplacementCost));
      }),
    );
  });
});

describe('median', () => {
  it('matches simple-statistics median', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -1e9, max: 1e9 }), { minLength: 1, maxLength: 50 }), (values) => {
        expect(median(values)).toBeCloseTo(referenceMedian(values), 6);
      }),
    );
  });
});
