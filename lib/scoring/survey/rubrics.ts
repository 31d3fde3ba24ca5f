import { z } from 'zod';
import { DEVICE_STATES, OIL_LEVELS, type Rubric } from './rubric-levels';

export * from './rubric-levels';

function describeRubric(rubric: Rubric): string {
  return `${rubric.title} (0–3): ${rubric.levels.map((l) => `${l.rating} = ${l.meaning}`).join('; ')}`;
}

export function rubricRatingSchema(rubric: Rubric) {
  return z.number().int().min(0).max(3).describe(describeRubric(rubric));
}

export const deviceStateSchema = z.enum(DEVICE_STATES);
export const oilLevelSchema = z.enum(OIL_LEVELS);
