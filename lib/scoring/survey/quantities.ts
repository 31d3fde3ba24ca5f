import { z } from 'zod';
import { LENGTH_UNITS } from '../units/length';
import { SLOPE_UNITS } from '../units/slope';
import { POWER_UNITS } from '../units/power';

/**
 * Unit-tagged inputs. Every number an inspector types carries its unit so that nothing is guessed;
 * bounds are generous physical limits (they only reject typos and keep the arithmetic finite).
 */
const finite = (max: number) => z.number().min(-max).max(max);

/** A signed length (indicator readings, deviations): sign conventions are stated on each field. */
export const signedLengthSchema = z
  .object({ value: finite(100_000), unit: z.enum(LENGTH_UNITS) })
  .strict();

/** A non-negative length (run-out, play, diameters, distances). */
export const lengthSchema = z
  .object({ value: z.number().min(0).max(100_000), unit: z.enum(LENGTH_UNITS) })
  .strict();

/** A strictly positive length (spacings, distances one divides by). */
export const positiveLengthSchema = z
  .object({ value: z.number().positive().max(100_000), unit: z.enum(LENGTH_UNITS) })
  .strict();

export const levelSensitivitySchema = z
  .object({
    value: z.number().positive().max(1000),
    unit: z.enum(SLOPE_UNITS),
  })
  .strict()
  .describe('Level sensitivity per vial division (mm/m, arc-seconds or in/ft per division)');

export const powerSchema = z
  .object({ value: z.number().positive().max(10_000), unit: z.enum(POWER_UNITS) })
  .strict();

/** Quantities with a single accepted unit: the tag is still required so the record is self-describing. */
export function fixedUnitSchema<U extends string>(unit: U, min: number, max: number) {
  return z.object({ value: z.number().min(min).max(max), unit: z.literal(unit) }).strict();
}

export const soundLevelSchema = fixedUnitSchema('dB(A)', 0, 150).describe('Sound level at 1 m, dB(A)');
export const vibrationVelocitySchema = fixedUnitSchema('mm/s', 0, 1000).describe(
  'Vibration velocity, mm/s RMS (10 Hz–1 kHz), as read on a vibration pen',
);
export const insulationResistanceSchema = fixedUnitSchema('MΩ', 0, 1_000_000).describe(
  'Insulation resistance between power circuits and protective earth, MΩ at 500 V DC',
);
export const earthResistanceSchema = fixedUnitSchema('Ω', 0, 1_000_000).describe(
  'Protective-earth continuity resistance, Ω',
);
export const durationSchema = fixedUnitSchema('s', 0, 3600).describe('Time in seconds');
export const temperatureRiseSchema = fixedUnitSchema('K', -50, 200).describe('Temperature rise, kelvin');
export const kinematicViscositySchema = fixedUnitSchema('mm²/s', 0, 100_000).describe(
  'Kinematic viscosity at 40 °C, mm²/s (cSt)',
);
export const particleCountSchema = fixedUnitSchema('per mL', 0, 1_000_000_000).describe(
  'Particle count per millilitre',
);
