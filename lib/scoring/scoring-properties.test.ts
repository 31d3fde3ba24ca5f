import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import nearNew from './examples/near-new.json';
import worn from './examples/worn.json';
import safetyDefect from './examples/safety-defect.json';
import inchUnits from './examples/inch-units.json';
import { latheSurveySchema } from './survey/lathe-survey';
import { scoreSurvey } from './score-survey';

/** Arbitrary surveys: every section optional, values across and beyond everyday ranges. */
const unit = fc.constantFrom('mm', 'µm', 'in', 'thou', 'tenths');
const len = (max = 50) => fc.record({ value: fc.double({ min: 0, max, noNaN: true }), unit });
const posLen = (max = 5000) => fc.record({ value: fc.double({ min: 0.001, max, noNaN: true }), unit });
const signedLen = (max = 5) => fc.record({ value: fc.double({ min: -max, max, noNaN: true }), unit });
const rating = fc.integer({ min: 0, max: 3 });
const device = fc.constantFrom('works', 'faulty', 'missing');
const oilLevel = fc.constantFrom('correct', 'low', 'empty', 'overfull');
const fixed = (u: string, min: number, max: number) => fc.record({ value: fc.double({ min, max, noNaN: true }), unit: fc.constant(u) });
const readings = fc.array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 2, maxLength: 40 });
const partial = <T extends Record<string, fc.Arbitrary<unknown>>>(model: T) => fc.record(model, { requiredKeys: [] });
const backlash = fc.oneof(
  fc.record({ method: fc.constant('length'), backlash: len(5) }),
  fc.record({ method: fc.constant('dial'), divisions: fc.double({ min: 0, max: 100, noNaN: true }), graduation: posLen(1), readsDiameter: fc.boolean() }),
);

const surveyArbitrary = fc.record(
  {
    surveyFormatVersion: fc.constant(1),
    machineType: fc.constant('centre-lathe'),
    inspectedOn: fc.constantFrom('2025-01-31', '1999-12-01', '2040-06-15'),
    machine: fc.record(
      {
        latheType: fc.constantFrom('general-purpose', 'toolroom'),
        year: fc.integer({ min: 1850, max: 2100 }),
        swingOverBed: posLen(3000),
        distanceBetweenCentres: posLen(20_000),
        motorPower: fc.record({ value: fc.double({ min: 0.01, max: 500, noNaN: true }), unit: fc.constantFrom('kW', 'hp') }),
      },
      { requiredKeys: ['latheType', 'swingOverBed', 'distanceBetweenCentres'] },
    ),
    instruments: partial({
      levelSensitivity: fc.record({ value: fc.double({ min: 0.0001, max: 100, noNaN: true }), unit: fc.constantFrom('mm/m', 'arcsec', 'in/ft') }),
      indicatorResolution: posLen(0.1),
    }),
    lubrication: partial({
      headstockOilLevel: oilLevel,
      oilCondition: rating,
      metalParticles: rating,
      pumpWorking: device,
      leaks: rating,
      oilSample: partial({
        particlesPerMl: fc.record({
          atLeast4um: fixed('per mL', 0, 1e9),
          atLeast6um: fixed('per mL', 0, 1e9),
          atLeast14um: fixed('per mL', 0, 1e9),
        }),
        viscosityAt40C: fixed('mm²/s', 0, 5000),
        declaredGrade: fc.constantFrom(32, 46, 68, 50),
        waterSeen: fc.boolean(),
      }),
    }),
    gearboxAndFeeds: partial({
      drainPlugDebris: rating,
      noiseBySpeedRange: fc.array(partial({ range: fc.constantFrom('low', 'high'), rating, soundLevel: fixed('dB(A)', 0, 150) }).map((r) => ({ range: 'low', ...r })), { maxLength: 4 }),
      feedsEngage: device,
      halfNut: rating,
    }),
    drive: partial({
      belt: fc.record({ centreDistance: posLen(2000), driverPulleyDiameter: posLen(800), drivenPulleyDiameter: posLen(800), measuredDeflection: len(100) }),
      motorNoise: rating,
    }),
    bedAndWays: partial({
      standLoadState: fc.constantFrom('normal', 'extra-load-on-stand', 'unknown'),
      levelling: partial({ stationSpacing: posLen(1000), longitudinalReadings: readings, transverseReadings: readings }).map((l) => ({
        stationSpacing: { value: 125, unit: 'mm' },
        ...l,
      })),
      stepNearChuck: len(2),
      carriageWear: rating,
    }),
    spindle: partial({
      noseRunout: len(2),
      testBarRunoutAtNose: len(2),
      testBarRunoutFar: fc.record({ runout: len(2), distanceFromNose: posLen(1000) }),
      axialSlip: len(2),
      liftPlay: len(2),
      parallelismVertical: fc.record({ deviation: signedLen(2), over: posLen(1000) }),
      parallelismHorizontal: fc.record({ deviation: signedLen(2), over: posLen(1000) }),
      temperatureRise: fixed('K', -50, 200),
      vibration: fixed('mm/s', 0, 1000),
    }),
    slidesAndScrews: partial({ crossSlideBacklash: backlash, topSlideBacklash: backlash, leadscrewEndPlay: len(2), slideWear: rating }),
    tailstock: partial({
      alignmentIndicator: fc.record({ readingNearHeadstock: signedLen(2), readingNearTailstock: signedLen(2), distance: posLen(2000) }),
      centreHeightDifference: signedLen(2),
      quillLock: device,
    }),
    testCuts: partial({
      twoCollar: fc.record({
        setup: fc.constantFrom('between-centres', 'in-chuck'),
        diameterNearHeadstock: posLen(500),
        diameterNearTailstock: posLen(500),
        collarDistance: posLen(2000),
      }),
      facing: fc.record({ diameter: posLen(1000), centreDeviation: signedLen(2) }),
    }),
    electricalAndSafety: partial({
      emergencyStop: device,
      chuckGuardInterlock: device,
      brakeStoppingTime: fixed('s', 0, 3600),
      earthContinuity: fixed('Ω', 0, 1e6),
      insulationResistance: fixed('MΩ', 0, 1e6),
      cables: rating,
    }),
    accessories: fc.array(fc.record({ kind: fc.constantFrom('three-jaw-chuck', 'tool-post', 'other'), condition: rating }), { maxLength: 5 }),
  },
  { requiredKeys: ['surveyFormatVersion', 'machineType', 'machine'] },
);

const EXAMPLES = [nearNew, worn, safetyDefect, inchUnits];

describe('scoring properties', () => {
  it('scores every survey the schema accepts without crashing, into plain JSON', () => {
    fc.assert(
      fc.property(surveyArbitrary, (survey) => {
        const parsed = latheSurveySchema.safeParse(survey);
        fc.pre(parsed.success);
        const r = scoreSurvey(survey);
        expect(JSON.parse(JSON.stringify(r))).toEqual(r);
        expect(r.confidence.value).toBeGreaterThanOrEqual(0);
        expect(r.confidence.value).toBeLessThanOrEqual(1);
        expect(Number.isInteger(r.repairEstimate.total.amountMinor)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  /** Ways to make one reading worse by a factor k ≥ 1: [check id, mutate]. */
  // The mutations reach into nested survey sections by path; the survey type is too deep to spell here.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  type Mutation = [string, (s: any, k: number) => void];
  const scaleLength = (q: { value: number }, k: number) => {
    q.value *= k;
  };
  const WORSEN: Mutation[] = [
    ['spindle-nose-runout', (s, k) => scaleLength(s.spindle.noseRunout, k)],
    ['test-bar-runout-far', (s, k) => scaleLength(s.spindle.testBarRunoutFar.runout, k)],
    ['spindle-lift-play', (s, k) => scaleLength(s.spindle.liftPlay, k)],
    ['spindle-vibration', (s, k) => scaleLength(s.spindle.vibration, k)],
    ['bed-straightness', (s, k) => (s.bedAndWays.levelling.longitudinalReadings = s.bedAndWays.levelling.longitudinalReadings.map((r: number) => r * k))],
    ['bed-twist', (s, k) => (s.bedAndWays.levelling.transverseReadings = s.bedAndWays.levelling.transverseReadings.map((r: number) => r * k))],
    ['leadscrew-end-play', (s, k) => scaleLength(s.slidesAndScrews.leadscrewEndPlay, k)],
    ['two-collar-test', (s, k) => (s.testCuts.twoCollar.diameterNearTailstock.value = s.testCuts.twoCollar.diameterNearHeadstock.value + (s.testCuts.twoCollar.diameterNearTailstock.value - s.testCuts.twoCollar.diameterNearHeadstock.value) * k)],
    ['centre-height', (s, k) => scaleLength(s.tailstock.centreHeightDifference, k)],
    ['facing-test', (s, k) => scaleLength(s.testCuts.facing.centreDeviation, k)],
    ['brake-stopping-time', (s, k) => scaleLength(s.electricalAndSafety.brakeStoppingTime, k)],
    ['earth-continuity', (s, k) => scaleLength(s.electricalAndSafety.earthContinuity, k)],
    // A minimum: less resistance is worse.
    ['insulation-resistance', (s, k) => (s.electricalAndSafety.insulationResistance.value /= k)],
    ['oil-cleanliness', (s, k) => scaleLength(s.lubrication.oilSample.particlesPerMl.atLeast14um, k)],
  ];

  it('never gives a better grade for a larger deviation', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...EXAMPLES.filter((e) => e !== safetyDefect)),
        fc.constantFrom(...WORSEN),
        fc.double({ min: 1, max: 50, noNaN: true }),
        (base, [checkId, worsen], k) => {
          const worse = structuredClone(base);
          try {
            worsen(worse, k);
          } catch {
            fc.pre(false); // this example does not have the reading
          }
          fc.pre(latheSurveySchema.safeParse(worse).success);
          const a = scoreSurvey(base);
          const b = scoreSurvey(worse);
          const qa = a.checks.find((c) => c.id === checkId)!.q!;
          const qb = b.checks.find((c) => c.id === checkId)!.q!;
          expect(qb).toBeGreaterThanOrEqual(qa - 1e-9);
          expect(b.overall.score!).toBeLessThanOrEqual(a.overall.score! + 1e-9);
          for (const s of a.subsystems) {
            const t = b.subsystems.find((x) => x.id === s.id)!;
            if (s.score !== null) expect(t.score!).toBeLessThanOrEqual(s.score + 1e-9);
          }
        },
      ),
      { numRuns: 200 },
    );
  });

  it('never gives a better grade for a worse rating', () => {
    fc.assert(
      fc.property(fc.constantFrom(...EXAMPLES), fc.constantFrom('halfNut', 'drainPlugDebris'), (base, key) => {
        // eslint-disable-next-line @typescript-eslint/no-explicit-any
        const worse: any = structuredClone(base);
        const before = worse.gearboxAndFeeds[key] as number;
        fc.pre(before < 3);
        worse.gearboxAndFeeds[key] = before + 1;
        expect(scoreSurvey(worse).overall.score!).toBeLessThanOrEqual(scoreSurvey(base).overall.score!);
      }),
    );
  });

  it('leaves unrelated checks untouched when one section changes', () => {
    fc.assert(
      fc.property(surveyArbitrary, surveyArbitrary, (a, b) => {
        // Take everything from a, the spindle section from b.
        const mixed: Record<string, unknown> = { ...a };
        if ('spindle' in b) mixed.spindle = b.spindle;
        else delete mixed.spindle;
        fc.pre(latheSurveySchema.safeParse(a).success && latheSurveySchema.safeParse(mixed).success);
        const ra = scoreSurvey(a);
        const rm = scoreSurvey(mixed);
        const spindleSection = new Set([
          'spindle-nose-runout',
          'test-bar-runout-nose',
          'test-bar-runout-far',
          'spindle-axial-slip',
          'spindle-lift-play',
          'spindle-parallelism-vertical',
          'spindle-parallelism-horizontal',
          'spindle-temperature-rise',
          'spindle-vibration',
        ]);
        for (const c of ra.checks.filter((c) => !spindleSection.has(c.id))) {
          expect(rm.checks.find((x) => x.id === c.id)).toEqual(c);
        }
      }),
      { numRuns: 150 },
    );
  });
});
