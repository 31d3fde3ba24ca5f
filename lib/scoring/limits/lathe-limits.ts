import type { AllowedDirection } from '../measure/deviation-ratio';
import { memory, practice, src, type SourceMark } from '../source-marks';

/**
 * Permissible values for manual centre lathes, swing over bed up to 800 mm, general-purpose type.
 * Larger swings and toolroom lathes apply the class factors below. Each entry names its origin.
 * `overMm` set means the value is stated over that length and is scaled to the measured length by
 * the proportional rule (measure/tolerance-scaling.ts).
 */
export interface LimitEntry {
  value: number;
  unit: string;
  overMm?: number;
  direction: AllowedDirection;
  /** Whether the swing-class and toolroom factors apply (geometric limits of the acceptance code). */
  classFactorApplies: boolean;
  source: SourceMark;
}

const ISO_1708 = 'ISO 1708 / Schlesinger, Testing Machine Tools';

export const LATHE_LIMITS = {
  bedLocalStraightness: {
    value: 0.0075, unit: 'mm', direction: 'both', classFactorApplies: true,
    source: memory('ISO 1708 G1, local tolerance 0.0075 mm over any 250 mm'),
  },
  bedTwist: {
    value: 0.04, unit: 'mm/m', direction: 'both', classFactorApplies: true,
    source: memory('ISO 1708-style record, 0.04 mm/1000 mm'),
  },
  stepNearChuck: {
    value: 0.02, unit: 'mm', direction: 'both', classFactorApplies: false,
    source: practice('a step that catches a fingernail, about 0.02 mm'),
  },
  spindleNoseRunout: { value: 0.01, unit: 'mm', direction: 'both', classFactorApplies: true, source: memory(ISO_1708) },
  testBarRunoutAtNose: { value: 0.01, unit: 'mm', direction: 'both', classFactorApplies: true, source: memory(ISO_1708) },
  testBarRunoutFar: {
    value: 0.02, unit: 'mm', overMm: 300, direction: 'both', classFactorApplies: true, source: memory(ISO_1708),
  },
  spindleAxialSlip: { value: 0.01, unit: 'mm', direction: 'both', classFactorApplies: true, source: memory(ISO_1708) },
  spindleLiftPlay: {
    value: 0.025, unit: 'mm', direction: 'both', classFactorApplies: false,
    source: practice('spindle lift test on a small plain-bearing lathe, about 0.02–0.025 mm'),
  },
  spindleLiftPlayRolling: {
    value: 0.005, unit: 'mm', direction: 'both', classFactorApplies: false,
    source: practice('a preloaded rolling-bearing spindle shows next to none in the lift test; 0.005 mm is about the least a 0.001–0.002 mm indicator tells from none'),
  },
  spindleParallelismVertical: {
    value: 0.02, unit: 'mm', overMm: 300, direction: 'positive-only', classFactorApplies: true,
    source: memory(`${ISO_1708}; free end may only rise`),
  },
  spindleParallelismHorizontal: {
    value: 0.015, unit: 'mm', overMm: 300, direction: 'positive-only', classFactorApplies: true,
    source: memory(`${ISO_1708}; free end may only point toward the tool`),
  },
  spindleTemperatureRise: {
    value: 30, unit: 'K', direction: 'both', classFactorApplies: false,
    source: practice('plain spindle bearings run warm, not hot to the hand'),
  },
  centreHeightDifference: {
    value: 0.04, unit: 'mm', direction: 'positive-only', classFactorApplies: true,
    source: memory(`${ISO_1708}; tailstock centre may only be higher`),
  },
  tailstockAlignment: {
    value: 0.01, unit: 'mm', overMm: 300, direction: 'both', classFactorApplies: true,
    source: practice('a tailstock is set over until a test bar reads within 0.01 mm over 300 mm (radial); a set-up target, not a wear limit'),
  },
  twoCollarConsistency: {
    value: 0.02, unit: 'mm', overMm: 300, direction: 'both', classFactorApplies: true,
    source: memory('ISO 1708 / Schlesinger turning test, consistency of diameters 0.04 mm on diameter over 300 mm, i.e. 0.02 mm radial'),
  },
  facing: {
    value: 0.025, unit: 'mm', overMm: 300, direction: 'positive-only', classFactorApplies: true,
    source: memory(`${ISO_1708}; 0.025 over 300 mm diameter, concave only`),
  },
  slideBacklash: {
    value: 0.1, unit: 'mm', direction: 'both', classFactorApplies: false,
    source: practice('cross/top-slide screw backlash good at 0.05–0.10 mm, worn at 0.25 mm and beyond'),
  },
  leadscrewEndPlay: { value: 0.015, unit: 'mm', direction: 'both', classFactorApplies: true, source: memory(ISO_1708) },
  brakeStoppingTime: {
    value: 10, unit: 's', direction: 'both', classFactorApplies: false,
    source: practice('spindle brought to rest from top speed within about 10 s'),
  },
  insulationResistance: {
    value: 1, unit: 'MΩ', direction: 'both', classFactorApplies: false,
    source: memory('IEC 60204-1 verification tests, at least 1 MΩ at 500 V DC'),
  },
  earthContinuity: {
    value: 0.1, unit: 'Ω', direction: 'both', classFactorApplies: false,
    // IEC 60204-1 gives the continuity test; its limit depends on conductor length and cross-section
    // [memory], so the standard has no single figure. 0.1 Ω is a workshop rule of thumb.
    source: practice('protective-bonding continuity about 0.1 Ω, a workshop rule of thumb, not the IEC 60204-1 figure (which depends on conductor length and cross-section)'),
  },
  oilCleanliness: {
    value: 0, unit: 'ISO 4406', direction: 'both', classFactorApplies: false,
    source: practice('headstock and gearbox oil target 19/17/14'),
  },
  viscosity: {
    value: 0.1, unit: 'relative', direction: 'both', classFactorApplies: false,
    source: src('ISO 3448, grade mid-point ±10 %'),
  },
  beltDeflection: {
    value: 0.3, unit: 'relative', direction: 'both', classFactorApplies: false,
    source: practice('measured deflection within ±30 % of target'),
  },
} as const satisfies Record<string, LimitEntry>;

export type LatheLimitId = keyof typeof LATHE_LIMITS;

/** ISO 4406 target for lathe headstock and gearbox oil (common practice). */
export const LATHE_OIL_TARGET = { atLeast4um: 19, atLeast6um: 17, atLeast14um: 14 } as const;

/**
 * Bed straightness in the vertical plane by distance between centres, convex only
 * [memory: ISO 1708 G1]: up to 500 mm 0.01; up to 1000 mm 0.02; each further 1000 mm adds 0.01.
 */
export const BED_STRAIGHTNESS_BY_LENGTH = {
  steps: [
    { upToMm: 500, valueMm: 0.01 },
    { upToMm: 1000, valueMm: 0.02 },
  ],
  extraPerMetreMm: 0.01,
  source: memory('ISO 1708 G1, bed straightness in the vertical plane, convex only'),
} as const;

export function bedStraightnessLimitMm(distanceBetweenCentresMm: number): number {
  for (const step of BED_STRAIGHTNESS_BY_LENGTH.steps) if (distanceBetweenCentresMm <= step.upToMm) return step.valueMm;
  const extraMetres = Math.ceil((distanceBetweenCentresMm - 1000) / 1000);
  return 0.02 + extraMetres * BED_STRAIGHTNESS_BY_LENGTH.extraPerMetreMm;
}

/**
 * Class factors on the geometric limits: swing above 800 mm roughly 1.5–2× looser, toolroom
 * lathes half [memory: ISO 1708 / Schlesinger].
 */
export const SWING_CLASSES: readonly { upToSwingMm: number; label: string; factor: number }[] = [
  { upToSwingMm: 800, label: 'swing up to 800 mm', factor: 1 },
  { upToSwingMm: 1600, label: 'swing over 800 up to 1600 mm', factor: 1.5 },
  { upToSwingMm: Number.POSITIVE_INFINITY, label: 'swing over 1600 mm', factor: 2 },
];

export const LATHE_TYPE_FACTORS: Readonly<Record<'general-purpose' | 'toolroom', number>> = {
  'general-purpose': 1,
  toolroom: 0.5,
};

export function swingClass(swingMm: number) {
  return SWING_CLASSES.find((c) => swingMm <= c.upToSwingMm) ?? SWING_CLASSES[SWING_CLASSES.length - 1]!;
}

export function classFactor(swingMm: number, latheType: 'general-purpose' | 'toolroom'): number {
  return swingClass(swingMm).factor * LATHE_TYPE_FACTORS[latheType];
}
