import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import nearNew from './examples/near-new.json';
import worn from './examples/worn.json';
import inchUnits from './examples/inch-units.json';
import mostlyUnmeasured from './examples/mostly-unmeasured.json';
import { DEAL_BREAKER_ITEMS, HIDDEN_DAMAGE_ITEMS, NOT_INSPECTED_AREAS } from './survey/checklist-items';
import { latheSurveySchema } from './survey/lathe-survey';
import { scoreSurvey } from './score-survey';
import { gradeRank } from './grading/condition-scale';
import { bandRank } from './grading/bands';
import type { ScoringResult } from './result';

/**
 * The judgement built on the figures, held over families of surveys: units, station edits, damage
 * answers, areas not inspected, sections left out. Each rule is stated in the `it` title; where a
 * rule is Waygrade's own it says so (common practice).
 */

// The surveys are deep JSON; the mutations below reach into them by path.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Survey = any;

const BASES: Survey[] = [nearNew, worn, inchUnits];

const gradeOf = (r: ScoringResult) => (r.overall.condition === null ? 99 : gradeRank(r.overall.condition));

/** Length entries that a limit is scaled to, each with a setter taking a length. */
const SCALED_LENGTHS: [string, string, (s: Survey, len: { value: number; unit: string }) => void][] = [
  ['spindle-parallelism-vertical', 'spindle', (s, len) => s.spindle?.parallelismVertical && (s.spindle.parallelismVertical.over = len)],
  ['spindle-parallelism-horizontal', 'spindle', (s, len) => s.spindle?.parallelismHorizontal && (s.spindle.parallelismHorizontal.over = len)],
  ['test-bar-runout-far', 'spindle', (s, len) => s.spindle?.testBarRunoutFar && (s.spindle.testBarRunoutFar.distanceFromNose = len)],
  ['tailstock-alignment', 'tailstock', (s, len) => s.tailstock?.alignmentIndicator && (s.tailstock.alignmentIndicator.distance = len)],
  ['two-collar-test', 'testCuts', (s, len) => s.testCuts?.twoCollar && (s.testCuts.twoCollar.collarDistance = len)],
  ['facing-test', 'testCuts', (s, len) => s.testCuts?.facing && (s.testCuts.facing.diameter = len)],
];

describe('units never change a verdict', () => {
  it('gives the same bands and grade for a length typed in millimetres or in inches to four decimals', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...BASES),
        fc.constantFrom(...SCALED_LENGTHS),
        // Whole millimetres, whole inches and the stated lengths of the limits: the lengths inspectors mark out.
        fc.oneof(fc.constantFrom(300, 150, 250, 255, 600), fc.integer({ min: 40, max: 1200 }), fc.integer({ min: 2, max: 48 }).map((inch) => inch * 25.4)),
        fc.constantFrom('general-purpose', 'toolroom'),
        (base, [checkId, , set], lengthMm, latheType) => {
          const inMm = structuredClone(base);
          inMm.machine.latheType = latheType;
          set(inMm, { value: lengthMm, unit: 'mm' });
          const inInches = structuredClone(inMm);
          // 1 in = 25.4 mm exactly (1959 international yard and pound agreement); typed to 0.0001 in.
          set(inInches, { value: Math.round((lengthMm / 25.4) * 10_000) / 10_000, unit: 'in' });
          const a = scoreSurvey(inMm);
          const b = scoreSurvey(inInches);
          const ca = a.checks.find((c) => c.id === checkId)!;
          const cb = b.checks.find((c) => c.id === checkId)!;
          expect(cb.band).toBe(ca.band);
          expect(cb.permissible?.value).toBe(ca.permissible?.value);
          expect(b.overall.condition).toBe(a.overall.condition);
          expect(b.repairEstimate.total).toEqual(a.repairEstimate.total);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('never turns a reading inside the proportional limit into one outside it by rounding the scaled limit', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...BASES),
        fc.integer({ min: 40, max: 1200 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.constantFrom('general-purpose', 'toolroom'),
        (base, lengthMm, share, latheType) => {
          const s = structuredClone(base);
          s.machine.latheType = latheType;
          s.machine.swingOverBed = { value: 400, unit: 'mm' };
          s.spindle = s.spindle ?? {};
          // 0.02/300, free end may rise [memory: ISO 1708]; toolroom lathes half (class factor 0.5).
          const proportional = ((latheType === 'toolroom' ? 0.01 : 0.02) * lengthMm) / 300;
          s.spindle.parallelismVertical = { deviation: { value: share * proportional, unit: 'mm' }, over: { value: lengthMm, unit: 'mm' } };
          const check = scoreSurvey(s).checks.find((c) => c.id === 'spindle-parallelism-vertical')!;
          expect(check.q!).toBeLessThanOrEqual(1 + 1e-9);
        },
      ),
      { numRuns: 300 },
    );
  });
});

/** Heights (µm) of a level run: z_0 = 0, z_k = Σ r_i · s · L (s mm/m per division, L mm). */
function heights(readings: number[], sensitivity: number, spacingMm: number): number[] {
  const z = [0];
  for (const r of readings) z.push(z[z.length - 1]! + r * sensitivity * spacingMm);
  return z;
}

/** Deepest point below the chord of any stretch i..j, by brute force (worked example of the definition). */
function deepestDipUm(z: number[]): number {
  let deepest = 0;
  for (let i = 0; i < z.length; i++) {
    for (let j = i + 2; j < z.length; j++) {
      for (let k = i + 1; k < j; k++) {
        const chord = z[i]! + ((z[j]! - z[i]!) * (k - i)) / (j - i);
        deepest = Math.max(deepest, chord - z[k]!);
      }
    }
  }
  return deepest;
}

describe('a rule about shape holds for every part of the profile', () => {
  const readings = fc.array(fc.integer({ min: -16, max: 16 }).map((r) => r / 2), { minLength: 3, maxLength: 16 });

  it('fails a bed with any concave stretch, however convex the rest', () => {
    fc.assert(
      fc.property(fc.constantFrom(nearNew, worn), readings, (base, rs) => {
        const s = structuredClone(base);
        s.bedAndWays.levelling.longitudinalReadings = rs;
        const sensitivity = 0.02;
        const spacing = 125;
        s.bedAndWays.levelling.stationSpacing = { value: spacing, unit: 'mm' };
        s.instruments.levelSensitivity = { value: sensitivity, unit: 'mm/m' };
        const dip = deepestDipUm(heights(rs, sensitivity, spacing));
        // Half a division over one base is the smallest step the level resolves.
        fc.pre(dip > 0.5 * sensitivity * spacing + 1e-6);
        const check = scoreSurvey(s).checks.find((c) => c.id === 'bed-straightness')!;
        expect(check.details.shape).not.toBe('convex');
        expect(bandRank(check.band!)).toBeGreaterThanOrEqual(bandRank('serviceable'));
        // q is kept to four decimals in the result.
        expect(check.q!).toBeGreaterThanOrEqual(1 + dip / 1000 / check.permissible!.value - 1e-4);
      }),
      { numRuns: 400 },
    );
  });

  it('never lets a raised spot elsewhere make up for a concave stretch', () => {
    fc.assert(
      fc.property(fc.constantFrom(nearNew, worn), readings, fc.nat(), fc.integer({ min: 1, max: 12 }), (base, rs, at, rise) => {
        const s = structuredClone(base);
        s.bedAndWays.levelling.longitudinalReadings = rs;
        const before = scoreSurvey(s).checks.find((c) => c.id === 'bed-straightness')!;
        fc.pre(before.q! > 1 && before.details.shape !== 'convex' && before.details.shape !== 'straight');
        // Raise one station: the reading into it rises, the reading out of it falls back.
        const raised = [...rs];
        const k = at % (raised.length - 1);
        raised[k] = raised[k]! + rise / 2;
        raised[k + 1] = raised[k + 1]! - rise / 2;
        const z = heights(raised, 0.02, 125);
        fc.pre(deepestDipUm(z) >= deepestDipUm(heights(rs, 0.02, 125)));
        const t = structuredClone(s);
        t.bedAndWays.levelling.longitudinalReadings = raised;
        const after = scoreSurvey(t).checks.find((c) => c.id === 'bed-straightness')!;
        expect(bandRank(after.band!)).toBeGreaterThanOrEqual(bandRank('serviceable'));
      }),
      { numRuns: 300 },
    );
  });
});

describe('what the inspector found reaches the grade', () => {
  it('lists every hidden-damage answer as a finding and never grades the machine better for it', () => {
    fc.assert(
      fc.property(fc.constantFrom(...BASES), fc.subarray(HIDDEN_DAMAGE_ITEMS.map((i) => i.id), { minLength: 1 }), (base, ids) => {
        const s = structuredClone(base);
        s.hiddenDamage = Object.fromEntries(ids.map((id) => [id, { present: true, note: 'seen on site' }]));
        const a = scoreSurvey(base);
        const b = scoreSurvey(s);
        for (const id of ids) expect(b.damageFindings.map((f) => f.id)).toContain(id);
        expect(b.overall.score!).toBeLessThanOrEqual(a.overall.score!);
        expect(gradeOf(b)).toBeGreaterThanOrEqual(gradeOf(a));
        if (ids.includes('crackedChuck')) expect(b.safetyFindings.map((f) => f.checkId)).toContain('hidden-damage:crackedChuck');
      }),
      { numRuns: 100 },
    );
  });

  it('takes an "Excellent" machine below Excellent for welds, filler, chipped castings or crash marks', () => {
    // Waygrade rule (common practice): a repaired or damaged casting is not "like new".
    const base = scoreSurvey(nearNew);
    expect(base.overall.condition).toBe('Excellent');
    for (const id of ['welds', 'freshPaintOverFiller', 'chippedCastings', 'crashMarks']) {
      const s: Survey = structuredClone(nearNew);
      s.hiddenDamage = { [id]: { present: true } };
      expect(scoreSurvey(s).overall.condition, id).not.toBe('Excellent');
    }
  });

  it('heads the report with a cracked casting as a deal-breaker', () => {
    const s: Survey = structuredClone(nearNew);
    s.dealBreakers = { crackedCasting: { present: true, note: 'crack across the front bed wall' } };
    const r = scoreSurvey(s);
    expect(r.dealBreakers.map((d) => d.id)).toEqual(['crackedCasting']);
    expect(r.damageFindings.find((f) => f.id === 'crackedCasting')?.consequence).toBe('deal-breaker');
  });

  it('never grades a machine with any deal-breaker better than Poor, nor better than without it', () => {
    // Waygrade rule (common practice): a deal-breaker usually costs more to put right than the machine
    // is worth, so "major repairs needed before productive use" is the best it can read.
    fc.assert(
      fc.property(fc.constantFrom(...BASES), fc.subarray(DEAL_BREAKER_ITEMS.map((i) => i.id), { minLength: 1 }), (base, ids) => {
        const s: Survey = structuredClone(base);
        s.dealBreakers = Object.fromEntries(ids.map((id) => [id, { present: true }]));
        const r = scoreSurvey(s);
        expect(r.dealBreakers.map((d) => d.id).sort()).toEqual([...ids].sort());
        expect(gradeOf(r)).toBeGreaterThanOrEqual(gradeRank('Poor'));
        expect(gradeOf(r)).toBeGreaterThanOrEqual(gradeOf(scoreSurvey(base)));
      }),
      { numRuns: 40 },
    );
  });
});

/** Survey sections that hold readings and the area name the inspector marks them by. */
const AREAS_WITH_READINGS = NOT_INSPECTED_AREAS.filter((a) => a !== 'powerRun');

describe('"not inspected" means not graded', () => {
  it('ignores the readings of an area marked not inspected, lists it and lowers confidence', () => {
    fc.assert(
      fc.property(fc.constantFrom(...BASES), fc.constantFrom(...AREAS_WITH_READINGS), (base, area) => {
        fc.pre(base[area] !== undefined);
        const marked = structuredClone(base);
        marked.notInspected = [{ area, reason: 'blocked by stock on the day' }];
        const without = structuredClone(marked);
        delete without[area];
        const a = scoreSurvey(base);
        const m = scoreSurvey(marked);
        const w = scoreSurvey(without);
        expect(m.checks.map((c) => [c.id, c.status, c.q])).toEqual(w.checks.map((c) => [c.id, c.status, c.q]));
        expect(m.overall).toEqual(w.overall);
        expect(m.confidence.value).toBe(w.confidence.value);
        expect(m.confidence.value).toBeLessThanOrEqual(a.confidence.value);
        expect(m.notInspected.map((n) => n.id)).toContain(`area:${area}`);
        for (const c of m.checks) {
          const before = a.checks.find((x) => x.id === c.id)!;
          if (before.status === 'measured' && c.status !== 'measured') expect(c.explanation.text).toContain('not inspected');
        }
      }),
      { numRuns: 120 },
    );
  });
});

describe('missing evidence never helps', () => {
  it('never gives a firmer or better grade for a survey with a section left out', () => {
    fc.assert(
      fc.property(fc.constantFrom(...BASES), fc.constantFrom(...AREAS_WITH_READINGS), (base, area) => {
        fc.pre(base[area] !== undefined);
        const s = structuredClone(base);
        delete s[area];
        const a = scoreSurvey(base);
        const b = scoreSurvey(s);
        expect(b.confidence.value).toBeLessThanOrEqual(a.confidence.value);
        if (!b.provisional) {
          expect(a.provisional).toBe(false);
          expect(gradeOf(b)).toBeGreaterThanOrEqual(gradeOf(a));
        }
        // A grade that only rests on part of the evidence says so.
        if (b.overall.score! > a.overall.score!) expect(b.provisional).toBe(true);
      }),
      { numRuns: 120 },
    );
  });

  it('marks the grade provisional below the confidence threshold, and only a complete enough survey firm', () => {
    expect(scoreSurvey(mostlyUnmeasured).provisional).toBe(true);
    expect(scoreSurvey(nearNew).provisional).toBe(false);
    fc.assert(
      fc.property(fc.constantFrom(...BASES), fc.subarray([...AREAS_WITH_READINGS]), (base, dropped) => {
        const s = structuredClone(base);
        for (const area of dropped) delete s[area];
        fc.pre(latheSurveySchema.safeParse(s).success);
        const r = scoreSurvey(s);
        if (r.confidence.value < 0.75) expect(r.provisional).toBe(true);
        if (r.provisional && r.overall.condition !== null) expect(r.overall.explanation).toContain('provisional');
      }),
      { numRuns: 150 },
    );
  });
});

describe('set-up and service items apart from wear', () => {
  it('does not drag a sound tailstock down for a 0.05 mm set-over, and prices the set-over as set-up', () => {
    // Waygrade rule (common practice): a tailstock set over is an hour's adjustment, not wear.
    const s: Survey = structuredClone(nearNew);
    s.tailstock.alignmentIndicator = { readingNearHeadstock: { value: 0, unit: 'mm' }, readingNearTailstock: { value: 0.05, unit: 'mm' }, distance: { value: 300, unit: 'mm' } };
    const r = scoreSurvey(s);
    const tailstock = r.subsystems.find((x) => x.id === 'tailstock')!;
    expect(gradeRank(tailstock.grade!)).toBeLessThanOrEqual(gradeRank('Very good'));
    expect(r.checks.find((c) => c.id === 'tailstock-alignment')!.bandLabel).toBe('Needs setting up');
    expect(r.repairEstimate.lines.find((l) => l.actionId === 'realign-tailstock')?.kind).toBe('set-up-and-service');
  });

  it('keeps the spindle grade for oil of the wrong grade, and lists the oil change as service', () => {
    const s: Survey = structuredClone(worn);
    const base = scoreSurvey(s).subsystems.find((x) => x.id === 'spindle-and-headstock')!;
    s.lubrication.oilSample.declaredGrade = 32; // 57.5 mm²/s measured: VG 68 oil in a VG 32 headstock
    const r = scoreSurvey(s);
    const spindle = r.subsystems.find((x) => x.id === 'spindle-and-headstock')!;
    expect(spindle.grade).toBe(base.grade);
    expect(r.checks.find((c) => c.id === 'oil-viscosity')!.nature).toBe('service');
  });

  it('never reads "Very good" for a subsystem whose measured condition checks are all outside their limits', () => {
    fc.assert(
      fc.property(fc.double({ min: 1.01, max: 1.2, noNaN: true }), (share) => {
        const s: Survey = structuredClone(nearNew);
        // Centre height 0.04 mm, tailstock higher only [memory: ISO 1708]; quill rated 2 of 3 (q 1.5).
        s.tailstock.centreHeightDifference = { value: 0.04 * share, unit: 'mm' };
        s.tailstock.quillCondition = 2;
        delete s.tailstock.quillLock;
        const tailstock = scoreSurvey(s).subsystems.find((x) => x.id === 'tailstock')!;
        expect(gradeRank(tailstock.grade!)).toBeGreaterThan(gradeRank('Very good'));
      }),
      { numRuns: 50 },
    );
  });
});

describe('rated items', () => {
  it('rates the oil screen, belts, cables and dials in their own words, not on the ways-wear scale', () => {
    // Waygrade's own rubric words (common practice); the wear scale speaks of scraping marks and adjustment.
    const s: Survey = structuredClone(worn);
    s.lubrication.filterScreen = 2;
    s.drive.belt.condition = 2;
    s.electricalAndSafety.cables = 2;
    s.slidesAndScrews.dials = 2;
    const r = scoreSurvey(s);
    const words = (id: string) => r.checks.find((c) => c.id === id)!.measured!.text;
    expect(words('oil-filter-screen')).toBe('partly blocked');
    expect(words('belt-condition')).toBe('cracked');
    expect(words('cables')).toBe('damaged');
    expect(words('dials')).toBe('slipping');
  });
});

describe('the any-250 mm straightness', () => {
  it('says why stations 250 mm apart cannot show it and what step to use', () => {
    // Worked example: stations 250 mm apart put no station inside a 250 mm stretch; 125 mm steps put one in the middle.
    const s: Survey = structuredClone(nearNew);
    s.bedAndWays.levelling.stationSpacing = { value: 250, unit: 'mm' };
    const check = scoreSurvey(s).checks.find((c) => c.id === 'bed-local-straightness')!;
    expect(check.status).toBe('not-measured');
    expect(check.explanation.text).toContain('at most 125 mm apart');
    expect(check.explanation.text).toContain('chord through two stations');
  });
});

describe('spindle lift play', () => {
  it('holds a rolling-bearing spindle to next to no lift, a plain-bearing one to its working clearance', () => {
    // Plain bearings about 0.02–0.025 mm (common practice); preloaded rolling bearings next to none
    // (common practice), taken as 0.005 mm.
    const s: Survey = structuredClone(nearNew);
    s.spindle.liftPlay = { value: 0.015, unit: 'mm' };
    s.spindle.bearings = 'plain';
    const plain = scoreSurvey(s).checks.find((c) => c.id === 'spindle-lift-play')!;
    s.spindle.bearings = 'rolling';
    const rolling = scoreSurvey(s).checks.find((c) => c.id === 'spindle-lift-play')!;
    expect(plain.q).toBeCloseTo(0.6, 9);
    expect(rolling.q).toBeCloseTo(3, 9);
  });
});
