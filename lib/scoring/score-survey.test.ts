import { describe, expect, it } from 'vitest';
import nearNew from './examples/near-new.json';
import worn from './examples/worn.json';
import safetyDefect from './examples/safety-defect.json';
import mostlyUnmeasured from './examples/mostly-unmeasured.json';
import inchUnits from './examples/inch-units.json';
import invalid from './examples/invalid/bad-fields.json';
import sales from './examples/sales/comparable-sales.json';
import { gradeRank } from './grading/condition-scale';
import { LATHE_CHECKS } from './lathe/lathe-checks';
import { defaultRepairCostCatalogue } from './repair/default-repair-cost-catalogue';
import { safeScoreSurvey, scoreSurvey } from './score-survey';
import { SurveyValidationError } from './errors';
import type { ComparableSale } from './valuation/valuation-types';
import { SCORING_VERSION } from './version';

const clone = <T>(v: T): T => structuredClone(v);
const check = (r: ReturnType<typeof scoreSurvey>, id: string) => r.checks.find((c) => c.id === id)!;

describe('scoreSurvey on the example surveys', () => {
  it('grades the near-new lathe Excellent with full confidence and no repairs', () => {
    const r = scoreSurvey(nearNew);
    expect(r.scoringVersion).toBe(SCORING_VERSION);
    expect(r.overall.condition).toBe('Excellent');
    expect(r.confidence.value).toBe(1);
    expect(r.safetyFindings).toEqual([]);
    expect(r.repairEstimate.total.amountMinor).toBe(0);
  });

  it('grades the worn lathe Fair or worse and costs its repairs', () => {
    const r = scoreSurvey(worn);
    expect(gradeRank(r.overall.condition!)).toBeGreaterThanOrEqual(gradeRank('Fair'));
    expect(r.repairEstimate.lines.map((l) => l.actionId)).toContain('regrind-bed');
    expect(r.repairEstimate.total.amountMinor).toBe(r.repairEstimate.lines.reduce((s, l) => s + l.cost.amountMinor, 0));
    // The seed's indicator run: 0.02 mm along the test bar needs correcting (common practice).
    expect(check(r, 'tailstock-alignment').q!).toBeGreaterThan(1);
  });

  it('flags the safety defects "fix before use" whatever the grade', () => {
    const r = scoreSurvey(safetyDefect);
    expect(r.safetyFindings.map((f) => f.checkId).sort()).toEqual(['chuck-guard-interlock', 'emergency-stop', 'insulation-resistance']);
    expect(r.safetyFindings.every((f) => f.action === 'fix before use')).toBe(true);
    expect(r.overall.condition).not.toBeNull();
  });

  it('keeps the mostly unmeasured survey at low confidence and lists what is missing', () => {
    const r = scoreSurvey(mostlyUnmeasured);
    expect(r.confidence.value).toBeLessThan(0.2);
    expect(r.confidence.missing.length).toBe(r.checks.filter((c) => c.status === 'not-measured').length);
    expect(r.checks.filter((c) => c.status === 'not-measured').every((c) => c.q === null && c.band === null)).toBe(true);
  });

  it('rejects levelling done with the stand loaded', () => {
    // common practice: heavy items on the stand twist the bed, so levelling is
    // only valid with the stand in its normal state
    const r = scoreSurvey(mostlyUnmeasured);
    expect(check(r, 'bed-straightness').status).toBe('not-measured');
    expect(check(r, 'bed-straightness').explanation.text).toMatch(/stand/);
    const normal = clone(mostlyUnmeasured);
    normal.bedAndWays.standLoadState = 'normal';
    expect(check(scoreSurvey(normal), 'bed-straightness').status).toBe('measured');
  });

  it('scores the inch survey as its metric equivalent', () => {
    const r = scoreSurvey(inchUnits);
    expect(r.machine.swingOverBedMm).toBeCloseTo(330.2, 6);
    // 1.5 tenths = 0.00381 mm against 0.01 × 0.5 (toolroom) = 0.005 mm
    expect(check(r, 'spindle-nose-runout').measured!.value).toBeCloseTo(0.00381, 6);
    expect(check(r, 'spindle-nose-runout').permissible!.value).toBeCloseTo(0.005, 9);
    // 3 divisions of a 0.001 in diameter dial = 0.0015 in = 0.0381 mm
    expect(check(r, 'cross-slide-backlash').measured!.value).toBeCloseTo(0.0381, 6);
  });

  it('returns plain JSON data', () => {
    for (const s of [nearNew, worn, safetyDefect, mostlyUnmeasured, inchUnits]) {
      const r = scoreSurvey(s);
      expect(JSON.parse(JSON.stringify(r))).toEqual(r);
    }
  });

  it('explains every measured check with inputs, permissible value, formula and source', () => {
    const r = scoreSurvey(worn);
    for (const c of r.checks.filter((c) => c.status === 'measured')) {
      expect(c.explanation.inputs.length).toBeGreaterThan(0);
      expect(c.explanation.formula).toMatch(/q/);
      expect(c.explanation.source.length).toBeGreaterThan(0);
      expect(c.permissible?.basis.length).toBeGreaterThan(0);
    }
  });

  it('adds a sales comparison and reconciliation when five or more sales are given', () => {
    const r = scoreSurvey(worn, { comparableSales: sales as ComparableSale[] });
    // 12 example sales: one without a condition grade is left out, one (sale J, a rebuilt bed) is an
    // outlier shown on the grid; 10 are weighed. Sales comparison is primary: weight 0.75.
    expect(r.valuation.salesComparison?.adjustedPrices).toHaveLength(11);
    expect(r.valuation.salesComparison?.adjustedPrices.filter((p) => p.outlier).map((p) => p.description)).toEqual([expect.stringContaining('demo sale J')]);
    expect(r.valuation.salesComparison?.comparablesUsed).toBe(10);
    expect(r.valuation.reconciliation?.weights.salesComparison).toBeCloseTo(0.75, 9);
    const without = scoreSurvey(worn);
    expect(without.valuation.salesComparison).toBeNull();
    expect(without.valuation.reconciliation?.fairMarketValue).toEqual(without.valuation.costApproach?.fairMarketValue);
  });
});

describe('grading rules', () => {
  it('fails a concave bed even when the deviation is small', () => {
    // [memory: ISO 1708] a bed may be convex but not concave
    const s = clone(nearNew);
    s.bedAndWays.levelling.longitudinalReadings = s.bedAndWays.levelling.longitudinalReadings.map((r) => -r);
    const c = check(scoreSurvey(s), 'bed-straightness');
    expect(c.details.shape).toBe('concave');
    expect(c.q!).toBeGreaterThan(1);
    expect(check(scoreSurvey(nearNew), 'bed-straightness').q!).toBeLessThan(0.5);
  });

  it('fails a tailstock centre lower than the headstock', () => {
    const s = clone(nearNew);
    s.tailstock.centreHeightDifference.value = -0.01;
    expect(check(scoreSurvey(s), 'centre-height').q!).toBeGreaterThan(1);
  });

  it('grades the two-collar cut of 29.630/29.632 mm over 250 mm as sharp', () => {
    // common practice: an excellent tailstock alignment
    expect(check(scoreSurvey(nearNew), 'two-collar-test').band).toBe('sharp');
  });

  it('gives no grade when nothing is measured', () => {
    const r = scoreSurvey({
      surveyFormatVersion: 1,
      machineType: 'centre-lathe',
      machine: { latheType: 'general-purpose', swingOverBed: { value: 300, unit: 'mm' }, distanceBetweenCentres: { value: 800, unit: 'mm' } },
    });
    expect(r.overall.condition).toBeNull();
    expect(r.confidence.value).toBe(0);
    expect(r.valuation.costApproach).toBeNull();
  });
});

describe('survey validation', () => {
  it('throws a SurveyValidationError listing each bad field', () => {
    let error: unknown;
    try {
      scoreSurvey(invalid);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(SurveyValidationError);
    const paths = (error as SurveyValidationError).issues.map((i) => i.path);
    expect(paths).toEqual(
      expect.arrayContaining(['machine.latheType', 'machine.swingOverBed.value', 'machine.distanceBetweenCentres.unit', 'spindle.noseRunout.value']),
    );
  });

  it('returns the issues from safeScoreSurvey instead of throwing', () => {
    const r = safeScoreSurvey({ surveyFormatVersion: 2 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.length).toBeGreaterThan(0);
  });
});

describe('lathe check table and repair catalogue', () => {
  it('gives every check a unique id', () => {
    const ids = LATHE_CHECKS.map((c) => c.id);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('points every catalogue rule at a known check and a known action', () => {
    const ids = new Set(LATHE_CHECKS.map((c) => c.id));
    const actions = new Set(defaultRepairCostCatalogue.actions.map((a) => a.id));
    for (const rule of defaultRepairCostCatalogue.rules) {
      expect(ids.has(rule.checkId), rule.checkId).toBe(true);
      expect(actions.has(rule.actionId), rule.actionId).toBe(true);
    }
    for (const a of defaultRepairCostCatalogue.actions) expect(Number.isInteger(a.costMinor)).toBe(true);
  });

  it('drops a lighter repair when a heavier one supersedes it', () => {
    const r = scoreSurvey(worn);
    const ids = r.repairEstimate.lines.map((l) => l.actionId);
    expect(ids).toContain('replace-spindle-bearings');
    expect(ids).not.toContain('adjust-spindle-bearings');
  });
});
