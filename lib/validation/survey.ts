import { z } from 'zod';
import { draftSurveySchema } from '@/lib/survey/draft-survey-schema';
import { SURVEY_SECTION_IDS } from '@/lib/survey/survey-sections';

/** Inputs of the survey's operations: the inspection comes from the URL, so it is coerced from text. */
export const inspectionAddressSchema = z.object({
  inspectionId: z.coerce.number().int().positive(),
});

export const saveSurveySchema = inspectionAddressSchema.extend({
  // The server version the edits were made on; a save on an older version is refused.
  baseVersion: z.number().int().min(0),
  data: draftSurveySchema,
});
export type SaveSurveyInput = z.input<typeof saveSurveySchema>;

export const submitSurveySchema = inspectionAddressSchema.extend({
  baseVersion: z.number().int().min(0),
});

/** Sent by the phone with each photo upload (JSON, so the id is a number). */
export const surveyPhotoTargetSchema = z.object({
  inspectionId: z.number().int().positive(),
  section: z.enum(SURVEY_SECTION_IDS),
});
export type SurveyPhotoTarget = z.output<typeof surveyPhotoTargetSchema>;

export const surveyPhotoRecordSchema = surveyPhotoTargetSchema.extend({
  fileKey: z.string().min(1).max(200),
  originalUrl: z.url().max(500),
  displayKey: z.string().min(1).max(200),
  thumbKey: z.string().min(1).max(200),
  widthPx: z.number().int().positive(),
  heightPx: z.number().int().positive(),
  bytes: z.number().int().positive(),
  caption: z.string().trim().max(300).optional(),
});
