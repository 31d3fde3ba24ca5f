import type { SectionUnit } from '@/lib/survey/section-unit';
import type { DraftSurvey } from '@/lib/survey/draft-survey-schema';
import type { SurveyPath } from '@/lib/survey/survey-paths';

/** What a section screen needs from the survey: read and write a value, and the section's unit. */
export interface SurveyForm {
  data: DraftSurvey;
  get: (path: SurveyPath) => unknown;
  set: (path: SurveyPath, value: unknown) => void;
  unit: SectionUnit;
}
