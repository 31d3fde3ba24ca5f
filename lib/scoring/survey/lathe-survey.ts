import { z } from 'zod';
import {
  durationSchema,
  earthResistanceSchema,
  insulationResistanceSchema,
  kinematicViscositySchema,
  lengthSchema,
  levelSensitivitySchema,
  particleCountSchema,
  positiveLengthSchema,
  powerSchema,
  signedLengthSchema,
  soundLevelSchema,
  temperatureRiseSchema,
  vibrationVelocitySchema,
} from './quantities';
import {
  DEBRIS_RUBRIC,
  deviceStateSchema,
  LEAK_RUBRIC,
  NOISE_RUBRIC,
  OIL_CONDITION_RUBRIC,
  oilLevelSchema,
  rubricRatingSchema,
  WEAR_RUBRIC,
  FILTER_SCREEN_RUBRIC,
  BELT_RUBRIC,
  CABLE_RUBRIC,
  DIAL_RUBRIC,
} from './rubrics';
import {
  carriageLockTestSchema,
  dealBreakersSchema,
  hiddenDamageSchema,
  machineStateSchema,
  notInspectedSchema,
  powerRunSchema,
  safetyGateSchema,
  sectionThermalSchema,
  wayThicknessSchema,
} from './condition-findings';

/**
 * Survey format v1 for a manual centre lathe. Sections follow the on-site order of work
 * (common practice); every section and every check inside it is optional, because an inspector may be
 * unable to do a step (no test bar, machine not under power). Unfilled checks are reported as
 * "not measured" and lower the stated confidence — they never pass silently.
 */

const wear = rubricRatingSchema(WEAR_RUBRIC);
const noise = rubricRatingSchema(NOISE_RUBRIC);

const machineSchema = z
  .object({
    latheType: z.enum(['general-purpose', 'toolroom']),
    maker: z.string().max(120).optional(),
    model: z.string().max(120).optional(),
    serialNumber: z.string().max(120).optional(),
    year: z.number().int().min(1850).max(2100).optional(),
    swingOverBed: positiveLengthSchema.describe('Swing over bed (twice the centre height above the bed)'),
    distanceBetweenCentres: positiveLengthSchema,
    spindleBore: lengthSchema.optional(),
    motorPower: powerSchema.optional(),
    supply: z
      .object({
        voltage: z.number().positive().max(100_000).describe('Volts'),
        phases: z.union([z.literal(1), z.literal(3)]),
        frequencyHz: z.union([z.literal(50), z.literal(60)]),
      })
      .strict()
      .optional(),
    runningHours: z.number().min(0).max(1_000_000).optional(),
    usageHistory: z.string().max(2000).optional(),
    mounting: z
      .object({
        kind: z.enum(['cabinet-stand', 'fabricated-stand', 'feet-on-floor', 'bench']),
        notes: z.string().max(1000).optional(),
      })
      .strict()
      .optional(),
  })
  .strict();

const instrumentsSchema = z
  .object({
    levelSensitivity: levelSensitivitySchema.optional(),
    indicatorResolution: positiveLengthSchema
      .describe('Smallest step of the dial or test indicator used')
      .optional(),
  })
  .strict();

const oilSampleSchema = z
  .object({
    particlesPerMl: z
      .object({
        atLeast4um: particleCountSchema.describe('Particles per mL ≥ 4 µm(c)'),
        atLeast6um: particleCountSchema.describe('Particles per mL ≥ 6 µm(c)'),
        atLeast14um: particleCountSchema.describe('Particles per mL ≥ 14 µm(c)'),
      })
      .strict()
      .optional(),
    viscosityAt40C: kinematicViscositySchema.optional(),
    declaredGrade: z
      .number()
      .int()
      .positive()
      .max(10_000)
      .describe('ISO 3448 viscosity grade the oil is sold as (e.g. 32, 68)')
      .optional(),
    waterSeen: z.boolean().describe('Free or emulsified water seen (milky oil, droplets)').optional(),
  })
  .strict();

const lubricationSchema = z
  .object({
    headstockOilLevel: oilLevelSchema.optional(),
    oilCondition: rubricRatingSchema(OIL_CONDITION_RUBRIC).optional(),
    metalParticles: rubricRatingSchema(DEBRIS_RUBRIC).optional(),
    pumpWorking: deviceStateSchema.describe('Oil pump and pressure lines: flow seen at the sight window').optional(),
    filterScreen: rubricRatingSchema(FILTER_SCREEN_RUBRIC).optional(),
    leaks: rubricRatingSchema(LEAK_RUBRIC).optional(),
    oilSample: oilSampleSchema.optional(),
  })
  .strict();

const speedRangeNoiseSchema = z
  .object({
    range: z.string().min(1).max(60).describe('Speed range as marked on the machine, e.g. "low", "high", "back gear"'),
    rating: noise.optional(),
    soundLevel: soundLevelSchema.optional(),
    machineState: machineStateSchema.optional(),
  })
  .strict();

const gearboxSchema = z
  .object({
    sightGlassOilLevel: oilLevelSchema.optional(),
    drainPlugDebris: rubricRatingSchema(DEBRIS_RUBRIC).optional(),
    noiseBySpeedRange: z.array(speedRangeNoiseSchema).max(24).optional(),
    feedsEngage: deviceStateSchema.describe('Every feed range engages and drives').optional(),
    threadRangesEngage: deviceStateSchema.describe('Every thread range engages and drives').optional(),
    halfNut: wear.optional(),
    feedClutch: wear.optional(),
    thermal: sectionThermalSchema.optional(),
  })
  .strict();

const beltSchema = z
  .object({
    condition: rubricRatingSchema(BELT_RUBRIC).optional(),
    centreDistance: positiveLengthSchema.describe('Distance between pulley centres'),
    driverPulleyDiameter: positiveLengthSchema,
    drivenPulleyDiameter: positiveLengthSchema,
    measuredDeflection: lengthSchema
      .describe('Mid-span deflection under a moderate thumb force')
      .optional(),
  })
  .strict();

const driveSchema = z
  .object({
    belt: beltSchema.optional(),
    beltCondition: rubricRatingSchema(BELT_RUBRIC).describe('Belt condition when the drive geometry was not measured').optional(),
    motorNoise: noise.optional(),
    thermal: sectionThermalSchema.optional(),
  })
  .strict();

const levelRunSchema = z
  .object({
    stationSpacing: positiveLengthSchema.describe(
      'Distance between level stations (usually the level base length)',
    ),
    longitudinalReadings: z
      .array(z.number().min(-1000).max(1000))
      .min(2)
      .max(200)
      .describe(
        'Level reading in divisions at each station along the bed, from headstock to tailstock; positive = tailstock end of the level higher',
      )
      .optional(),
    transverseReadings: z
      .array(z.number().min(-1000).max(1000))
      .min(2)
      .max(200)
      .describe('Level reading in divisions across the ways at each station; positive = rear way higher')
      .optional(),
  })
  .strict();

const bedSchema = z
  .object({
    standLoadState: z
      .enum(['normal', 'extra-load-on-stand', 'unknown'])
      .describe(
        'Load on the stand while levelling. Heavy items resting on the stand twist the bed, so levelling is only valid with the stand in its normal state',
      )
      .optional(),
    levelling: levelRunSchema.optional(),
    visualWear: wear.optional(),
    stepNearChuck: lengthSchema.describe('Depth of the worn step in the ways near the chuck').optional(),
    carriageWear: wear.describe('Carriage fit: gibs at end of adjustment, tight toward the tailstock').optional(),
    carriageLockTest: carriageLockTestSchema.optional(),
    wayThickness: wayThicknessSchema.optional(),
    thermal: sectionThermalSchema.optional(),
  })
  .strict();

/** Deviation read by an indicator on a test bar, the carriage moving over a stated length. */
const parallelismSchema = z
  .object({
    deviation: signedLengthSchema,
    over: positiveLengthSchema.describe('Carriage travel over which the deviation was read'),
  })
  .strict();

const spindleSchema = z
  .object({
    noseRunout: lengthSchema.describe('Total indicator reading on the spindle nose centring diameter').optional(),
    testBarRunoutAtNose: lengthSchema.optional(),
    testBarRunoutFar: z
      .object({
        runout: lengthSchema,
        distanceFromNose: positiveLengthSchema.describe('Usually 300 mm'),
      })
      .strict()
      .optional(),
    axialSlip: lengthSchema.describe('Axial play of the spindle (indicator on the nose face, end load applied)').optional(),
    liftPlay: lengthSchema.describe('Radial play in the lift test (bar levered up at the nose)').optional(),
    bearings: z
      .enum(['plain', 'rolling'])
      .describe('Spindle bearings: plain (bronze or white-metal bushes) or rolling (preloaded taper-roller or angular-contact); sets the lift-play limit')
      .optional(),
    parallelismVertical: parallelismSchema
      .describe('Spindle axis to carriage travel, vertical plane; deviation positive = free end of the bar higher')
      .optional(),
    parallelismHorizontal: parallelismSchema
      .describe('Spindle axis to carriage travel, horizontal plane; deviation positive = free end toward the tool')
      .optional(),
    temperatureRise: temperatureRiseSchema.describe('Bearing housing rise after 30 min at mid speed').optional(),
    vibration: vibrationVelocitySchema.optional(),
    machineState: machineStateSchema.optional(),
    thermal: sectionThermalSchema.optional(),
  })
  .strict();

const backlashSchema = z.union([
  z.object({ method: z.literal('length'), backlash: lengthSchema }).strict(),
  z
    .object({
      method: z.literal('dial'),
      divisions: z.number().min(0).max(10_000).describe('Dial divisions turned before the slide moves'),
      graduation: positiveLengthSchema.describe('Value of one dial division as engraved'),
      readsDiameter: z
        .boolean()
        .describe('True when the dial is engraved in diameter (slide moves half the engraved value)'),
    })
    .strict(),
]);

const slidesSchema = z
  .object({
    crossSlideBacklash: backlashSchema.optional(),
    topSlideBacklash: backlashSchema.optional(),
    leadscrewEndPlay: lengthSchema.optional(),
    slideWear: wear.describe('Cross and top slide dovetails and gibs').optional(),
    dials: rubricRatingSchema(DIAL_RUBRIC).optional(),
    thermal: sectionThermalSchema.optional(),
  })
  .strict();

const tailstockSchema = z
  .object({
    alignmentIndicator: z
      .object({
        readingNearHeadstock: signedLengthSchema,
        readingNearTailstock: signedLengthSchema,
        distance: positiveLengthSchema.describe('Carriage travel between the two readings'),
      })
      .strict()
      .describe(
        'Indicator on the carriage at the front (operator side) of a test bar between centres, reading increasing as the bar comes toward the operator',
      )
      .optional(),
    centreHeightDifference: signedLengthSchema
      .describe('Tailstock centre height minus headstock centre height; positive = tailstock higher')
      .optional(),
    quillCondition: wear.optional(),
    quillLock: deviceStateSchema.optional(),
    machineState: machineStateSchema.optional(),
    thermal: sectionThermalSchema.optional(),
  })
  .strict();

const testCutsSchema = z
  .object({
    twoCollar: z
      .object({
        setup: z.enum(['between-centres', 'in-chuck']),
        diameterNearHeadstock: positiveLengthSchema,
        diameterNearTailstock: positiveLengthSchema,
        collarDistance: positiveLengthSchema.describe('Distance between the two collars'),
        centresDistance: positiveLengthSchema
          .describe('Distance between the centres holding the work (between-centres only)')
          .optional(),
      })
      .strict()
      .optional(),
    facing: z
      .object({
        diameter: positiveLengthSchema,
        centreDeviation: signedLengthSchema.describe(
          'Deviation of the face at the centre relative to the rim; positive = centre low (concave)',
        ),
      })
      .strict()
      .optional(),
    machineState: machineStateSchema.optional(),
    thermal: sectionThermalSchema.optional(),
  })
  .strict();

const electricalSchema = z
  .object({
    emergencyStop: deviceStateSchema.optional(),
    chuckGuardInterlock: deviceStateSchema.optional(),
    brakeWorks: deviceStateSchema.optional(),
    brakeStoppingTime: durationSchema.describe('Spindle stopping time from top speed, seconds').optional(),
    earthContinuity: earthResistanceSchema.optional(),
    insulationResistance: insulationResistanceSchema.optional(),
    coversInPlace: deviceStateSchema.describe('Gear, belt and cabinet covers fitted and closed').optional(),
    cables: rubricRatingSchema(CABLE_RUBRIC).optional(),
  })
  .strict();

const accessorySchema = z
  .object({
    kind: z.enum([
      'three-jaw-chuck',
      'four-jaw-chuck',
      'collet-chuck',
      'faceplate',
      'fixed-steady',
      'travelling-steady',
      'tool-post',
      'digital-readout',
      'taper-attachment',
      'manuals',
      'tooling',
      'other',
    ]),
    description: z.string().max(200).optional(),
    condition: wear,
  })
  .strict();

export const latheSurveySchema = z
  .object({
    surveyFormatVersion: z.literal(1),
    machineType: z.literal('centre-lathe'),
    inspectedOn: z.iso.date().optional(),
    machine: machineSchema,
    instruments: instrumentsSchema.optional(),
    lubrication: lubricationSchema.optional(),
    gearboxAndFeeds: gearboxSchema.optional(),
    drive: driveSchema.optional(),
    bedAndWays: bedSchema.optional(),
    spindle: spindleSchema.optional(),
    slidesAndScrews: slidesSchema.optional(),
    tailstock: tailstockSchema.optional(),
    testCuts: testCutsSchema.optional(),
    electricalAndSafety: electricalSchema.optional(),
    accessories: z.array(accessorySchema).max(100).optional(),
    safetyGate: safetyGateSchema.optional(),
    powerRun: powerRunSchema.optional(),
    hiddenDamage: hiddenDamageSchema.optional(),
    dealBreakers: dealBreakersSchema.optional(),
    notInspected: notInspectedSchema.optional(),
    notes: z.string().max(5000).optional(),
  })
  .strict()
  .describe('Waygrade on-site survey of a manual centre lathe, format v1');

/** What the app sends (before parsing). */
export type LatheSurvey = z.input<typeof latheSurveySchema>;
/** What the scorer works on (after parsing). */
export type ParsedLatheSurvey = z.output<typeof latheSurveySchema>;
