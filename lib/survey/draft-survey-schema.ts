import { z } from 'zod';
import { latheSurveySchema, type LatheSurvey } from '@/lib/scoring';

/**
 * A survey in progress. On site a group of readings is typed one value at a time (the first collar
 * before the second), so a draft may leave out any member; every value that is present must still
 * be of the right kind and within the survey format's bounds, so a typo is refused at once and never
 * reaches the scorer. The complete format is enforced on submit.
 */
function relax(schema: z.ZodType): z.ZodType {
  if (schema instanceof z.ZodOptional) return relax(schema.unwrap() as z.ZodType).optional();
  if (schema instanceof z.ZodObject) {
    const shape = Object.fromEntries(Object.entries(schema.shape).map(([key, member]) => [key, relax(member as z.ZodType).optional()]));
    return z.object(shape).strict();
  }
  if (schema instanceof z.ZodArray) return z.array(relax(schema.element as z.ZodType)).max(200);
  if (schema instanceof z.ZodUnion) {
    const options = (schema.options as z.ZodType[]).map(relax);
    return z.union(options as [z.ZodType, z.ZodType, ...z.ZodType[]]);
  }
  return schema;
}

type DeepPartial<T> = T extends readonly (infer U)[] ? DeepPartial<U>[] : T extends object ? { [K in keyof T]?: DeepPartial<T[K]> } : T;

export type DraftSurvey = DeepPartial<LatheSurvey> & Pick<LatheSurvey, 'surveyFormatVersion' | 'machineType'>;

const relaxedSurvey = relax(latheSurveySchema) as z.ZodObject;

export const draftSurveySchema = relaxedSurvey.extend({
  surveyFormatVersion: z.literal(1),
  machineType: z.literal('centre-lathe'),
}) as unknown as z.ZodType<DraftSurvey, DraftSurvey>;
