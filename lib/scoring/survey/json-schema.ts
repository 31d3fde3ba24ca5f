import { z } from 'zod';
import { latheSurveySchema } from './lathe-survey';

/** JSON Schema (draft 2020-12) of the survey as the app sends it, generated from the zod schema. */
export function surveyJsonSchema(): Record<string, unknown> {
  return {
    ...z.toJSONSchema(latheSurveySchema, { io: 'input', target: 'draft-2020-12' }),
    $id: 'https://waygrade.example/schemas/lathe-survey-v1.json',
    title: 'Waygrade centre-lathe survey, format v1',
  };
}

export function surveyJsonSchemaText(): string {
  return `${JSON.stringify(surveyJsonSchema(), null, 2)}\n`;
}
