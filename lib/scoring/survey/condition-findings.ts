import { z } from 'zod';
import { lengthSchema, positiveLengthSchema, temperatureRiseSchema } from './quantities';
import { NOISE_RUBRIC, rubricRatingSchema } from './rubrics';
import { DEAL_BREAKER_ITEMS, HIDDEN_DAMAGE_ITEMS, NOT_INSPECTED_AREAS, type DealBreakerId, type HiddenDamageId } from './checklist-items';

export * from './checklist-items';

/**
 * Survey members added in format v1.1 (all optional, so a v1 survey stays valid): the power-run
 * log, bed wear by the carriage-lock test and way thickness, the hidden-damage checklist, the
 * deal-breakers, the safety gate before power-on steps and the list of what was not inspected.
 */

/** Whether the machine was cold (not run that day) or warm when a reading was taken. */
export const machineStateSchema = z
  .enum(['cold', 'warm'])
  .describe('Machine cold (not run before the reading) or warm (run long enough for the housings to warm)');

/**
 * The machine's thermal state while a section's readings were taken (format v1.1, optional):
 * when they were taken, and the inspector's own cold/warm where it overrides the state the app
 * derives from the power-run log. Recorded beside the readings; the scorer does not use it.
 */
export const sectionThermalSchema = z
  .object({
    readingsAt: z.iso.datetime().describe('When the last reading of the section was typed (UTC); a record of entry, not used for cold or warm').optional(),
    measuredAt: z.iso
      .datetime()
      .describe("When the section was measured, as the inspector states it (UTC); with the power-run log's start it decides cold or warm")
      .optional(),
    machineState: machineStateSchema.describe('Set by the inspector; overrides the state derived from the power-run log').optional(),
  })
  .strict();

const powerRunRangeSchema = z
  .object({
    range: z.string().min(1).max(60).describe('Speed range as marked on the machine'),
    machineState: machineStateSchema,
    noise: rubricRatingSchema(NOISE_RUBRIC).optional(),
    housingTemperatureRise: temperatureRiseSchema.describe('Headstock housing temperature above the room').optional(),
  })
  .strict();

export const powerRunSchema = z
  .object({
    startState: machineStateSchema.describe('State of the machine when it was first started on the day'),
    minutesRunBeforeReadings: z.number().min(0).max(600).describe('Minutes the spindle ran before the readings were taken'),
    startedAt: z.iso.datetime().describe('When the spindle was first started on the day (UTC)').optional(),
    ranges: z.array(powerRunRangeSchema).max(24).optional(),
  })
  .strict();

export const carriageLockTestSchema = z
  .object({
    bindsAtFromHeadstock: lengthSchema.describe(
      'Distance from the headstock at which the locked (lightly clamped) carriage binds when moved toward the tailstock',
    ),
    travelTested: positiveLengthSchema.describe('Carriage travel tried from the headstock end').optional(),
  })
  .strict();

export const wayThicknessSchema = z
  .object({
    stations: z
      .array(
        z
          .object({
            distanceFromHeadstock: lengthSchema,
            thickness: positiveLengthSchema.describe('Way thickness by micrometer at this station'),
          })
          .strict(),
      )
      .min(2)
      .max(100),
  })
  .strict();

/** One answer of a yes/no checklist; a "yes" names what was seen (a photo is required by the app). */
export const findingSchema = z
  .object({
    present: z.boolean(),
    note: z.string().max(500).optional(),
  })
  .strict();

export const hiddenDamageSchema = z
  .object(Object.fromEntries(HIDDEN_DAMAGE_ITEMS.map((item) => [item.id, findingSchema.describe(item.label).optional()])) as Record<HiddenDamageId, z.ZodOptional<typeof findingSchema>>)
  .strict();

export const dealBreakersSchema = z
  .object(Object.fromEntries(DEAL_BREAKER_ITEMS.map((item) => [item.id, findingSchema.describe(item.label).optional()])) as Record<DealBreakerId, z.ZodOptional<typeof findingSchema>>)
  .strict();

export const safetyGateSchema = z
  .object({
    guardsOn: z.boolean(),
    chuckKeyOut: z.boolean(),
    workAndChuckSecure: z.boolean(),
    emergencyStopAndBrakeTested: z.boolean(),
    earthChecked: z.boolean(),
  })
  .strict()
  .describe('Confirmed by the inspector before any step that powers the machine');

export const notInspectedSchema = z
  .array(
    z
      .object({
        area: z.enum(NOT_INSPECTED_AREAS),
        reason: z.string().min(1).max(300),
      })
      .strict(),
  )
  .max(20);
