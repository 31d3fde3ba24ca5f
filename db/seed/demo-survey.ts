import type { LatheSurvey } from '@/lib/scoring';
import type { Random } from './random';
import { SURVEY_SECTION_IDS, type SurveySectionId } from '@/lib/survey/survey-sections';

type DemoMachine = {
  latheKind: 'general_purpose' | 'toolroom';
  maker: string;
  model: string;
  serialNumber: string | null;
  yearBuilt: number | null;
  swingMm: number;
  betweenCentresMm: number;
  spindleBoreMm: number | null;
  motorKw: string | null;
  supplyVoltage: number | null;
  supplyPhases: number | null;
};

const mm = (value: number) => ({ value: Number(value.toFixed(4)), unit: 'mm' as const });
const clampRating = (value: number) => Math.max(0, Math.min(3, Math.round(value))) as 0 | 1 | 2 | 3;

/**
 * The sections a demo survey fills, in the survey's on-site order (lib/survey/survey-sections.ts):
 * all but the identity screen (the survey's machine and date), the hidden-damage checklist and the
 * power-run log, which demo surveys leave out.
 */
const NOT_IN_DEMO_SURVEYS: ReadonlySet<SurveySectionId> = new Set(['identity', 'hiddenDamage', 'powerRun']);
export const SURVEY_SECTIONS_IN_ORDER = SURVEY_SECTION_IDS.filter((id) => !NOT_IN_DEMO_SURVEYS.has(id));

const POWER_RUN_MINUTES = [20, 25, 35, 45] as const;

/**
 * A plausible survey of a demo machine. `wear` runs from 0 (as new) to 1 (worn out); readings grow
 * with it and with a little scatter. `sectionsDone` cuts the survey short for inspections in progress.
 */
export function demoSurvey(
  machine: DemoMachine,
  options: { wear: number; random: Random; inspectedOn: string; sectionsDone?: number; safetyDefect?: boolean },
): LatheSurvey {
  const { wear, random } = options;
  const jitter = (base: number) => base * random.between(0.75, 1.25);
  const rating = (scale: number) => clampRating(wear * scale + random.between(-0.6, 0.6));
  const stations = Math.max(6, Math.min(16, Math.round(machine.betweenCentresMm / 125)));
  // Worn beds sag near the chuck, where most work is done: readings trend negative toward the middle.
  const longitudinal = Array.from({ length: stations }, (_, i) => {
    const middlePull = Math.sin((Math.PI * i) / (stations - 1)) * wear * 6;
    return Number((random.between(-0.6, 0.6) + (i < stations / 2 ? middlePull : -middlePull)).toFixed(1));
  });
  const transverse = Array.from({ length: stations }, (_, i) => Number(((i / stations - 0.5) * wear * 3 + random.between(-0.4, 0.4)).toFixed(1)));

  const survey: LatheSurvey = {
    surveyFormatVersion: 1,
    machineType: 'centre-lathe',
    inspectedOn: options.inspectedOn,
    machine: {
      latheType: machine.latheKind === 'toolroom' ? 'toolroom' : 'general-purpose',
      maker: machine.maker,
      model: machine.model,
      ...(machine.serialNumber ? { serialNumber: machine.serialNumber } : {}),
      ...(machine.yearBuilt ? { year: machine.yearBuilt } : {}),
      swingOverBed: mm(machine.swingMm),
      distanceBetweenCentres: mm(machine.betweenCentresMm),
      ...(machine.spindleBoreMm ? { spindleBore: mm(machine.spindleBoreMm) } : {}),
      ...(machine.motorKw ? { motorPower: { value: Number(machine.motorKw), unit: 'kW' as const } } : {}),
      ...(machine.supplyVoltage && machine.supplyPhases
        ? { supply: { voltage: machine.supplyVoltage, phases: machine.supplyPhases === 1 ? (1 as const) : (3 as const), frequencyHz: 50 as const } }
        : {}),
      mounting: { kind: 'cabinet-stand' },
    },
    instruments: { levelSensitivity: { value: 0.02, unit: 'mm/m' }, indicatorResolution: mm(0.002) },
    lubrication: {
      headstockOilLevel: wear > 0.6 ? 'low' : 'correct',
      oilCondition: rating(3),
      metalParticles: rating(2.5),
      pumpWorking: 'works',
      filterScreen: rating(2.5),
      leaks: rating(2.5),
    },
    gearboxAndFeeds: {
      sightGlassOilLevel: 'correct',
      drainPlugDebris: rating(2.5),
      noiseBySpeedRange: [
        { range: 'low', rating: rating(2.5), soundLevel: { value: Math.round(68 + wear * 10 + random.between(-2, 2)), unit: 'dB(A)' } },
        { range: 'high', rating: rating(3), soundLevel: { value: Math.round(72 + wear * 12 + random.between(-2, 2)), unit: 'dB(A)' } },
      ],
      feedsEngage: 'works',
      threadRangesEngage: 'works',
      halfNut: rating(3),
      feedClutch: rating(2.5),
    },
    drive: {
      belt: {
        condition: rating(3),
        centreDistance: mm(Math.round(jitter(480))),
        driverPulleyDiameter: mm(100),
        drivenPulleyDiameter: mm(180),
        measuredDeflection: mm(Number((8 + wear * 9 + random.between(-1, 1)).toFixed(1))),
      },
      motorNoise: rating(2.5),
    },
    bedAndWays: {
      standLoadState: 'normal',
      levelling: { stationSpacing: mm(125), longitudinalReadings: longitudinal, transverseReadings: transverse },
      visualWear: rating(3),
      stepNearChuck: mm(Number((wear * 0.05 * random.between(0.6, 1.2)).toFixed(3))),
      carriageWear: rating(3),
    },
    spindle: {
      noseRunout: mm(jitter(0.003 + wear * 0.02)),
      testBarRunoutAtNose: mm(jitter(0.004 + wear * 0.015)),
      testBarRunoutFar: { runout: mm(jitter(0.008 + wear * 0.035)), distanceFromNose: mm(300) },
      axialSlip: mm(jitter(0.003 + wear * 0.015)),
      liftPlay: mm(jitter(0.006 + wear * 0.04)),
      parallelismVertical: { deviation: mm(jitter(0.004 + wear * 0.02) * (wear > 0.7 ? -1 : 1)), over: mm(300) },
      parallelismHorizontal: { deviation: mm(jitter(0.003 + wear * 0.015)), over: mm(300) },
      temperatureRise: { value: Math.round(jitter(12 + wear * 18)), unit: 'K' },
      vibration: { value: Number(jitter(0.5 + wear * 3).toFixed(2)), unit: 'mm/s' },
    },
    slidesAndScrews: {
      crossSlideBacklash: { method: 'length', backlash: mm(jitter(0.04 + wear * 0.3)) },
      topSlideBacklash: { method: 'dial', divisions: Math.round(jitter(2 + wear * 12)), graduation: mm(0.02), readsDiameter: false },
      leadscrewEndPlay: mm(jitter(0.005 + wear * 0.03)),
      slideWear: rating(3),
      dials: rating(2),
    },
    tailstock: {
      alignmentIndicator: { readingNearHeadstock: mm(0), readingNearTailstock: mm(jitter(0.004 + wear * 0.03)), distance: mm(250) },
      centreHeightDifference: mm(jitter(0.01 + wear * 0.03)),
      quillCondition: rating(3),
      quillLock: 'works',
    },
    testCuts: {
      twoCollar: {
        setup: 'between-centres',
        diameterNearHeadstock: mm(30),
        diameterNearTailstock: mm(30 + Number(jitter(0.002 + wear * 0.04).toFixed(3))),
        collarDistance: mm(250),
      },
      facing: { diameter: mm(200), centreDeviation: mm(Number(jitter(0.003 + wear * 0.02).toFixed(3))) },
    },
    electricalAndSafety: {
      emergencyStop: options.safetyDefect ? 'faulty' : 'works',
      chuckGuardInterlock: options.safetyDefect ? 'missing' : 'works',
      brakeWorks: 'works',
      brakeStoppingTime: { value: Number(jitter(3 + wear * 5).toFixed(1)), unit: 's' },
      earthContinuity: { value: Number(jitter(0.05 + wear * 0.1).toFixed(2)), unit: 'Ω' },
      insulationResistance: { value: Math.round(jitter(200 - wear * 180)), unit: 'MΩ' },
      coversInPlace: 'works',
      cables: rating(2.5),
    },
    accessories: [
      { kind: 'three-jaw-chuck', description: '160 mm', condition: rating(3) },
      { kind: 'four-jaw-chuck', description: '200 mm', condition: rating(2) },
      { kind: 'faceplate', condition: rating(1.5) },
      { kind: 'fixed-steady', condition: rating(2) },
      { kind: 'tool-post', description: 'quick-change', condition: rating(2.5) },
    ],
    // Every power-on step comes after the inspector has confirmed the safety gate on site.
    safetyGate: { guardsOn: true, chuckKeyOut: true, workAndChuckSecure: true, emergencyStopAndBrakeTested: true, earthChecked: true },
    // Started cold early in the visit and run before the readings (the power run). The minutes
    // follow the day of the month rather than the seeded random sequence, so the rest of the demo data
    // stays as it was, and demo reports show both cold readings (under 30 min) and warm ones.
    powerRun: {
      startState: 'cold',
      minutesRunBeforeReadings: POWER_RUN_MINUTES[Number(options.inspectedOn.slice(8, 10)) % POWER_RUN_MINUTES.length]!,
    },
  };

  const done = options.sectionsDone ?? SURVEY_SECTIONS_IN_ORDER.length;
  for (const section of SURVEY_SECTIONS_IN_ORDER.slice(done)) delete (survey as Record<string, unknown>)[section];
  return survey;
}
