import type { z } from 'zod';

/** One bad field: dotted path into the survey ("spindle.noseRunout.unit") and why. */
export interface SurveyIssue {
  path: string;
  message: string;
}

/** Thrown by scoreSurvey when the input is not a valid survey; carries every bad field. */
export class SurveyValidationError extends Error {
  readonly issues: SurveyIssue[];

  constructor(issues: SurveyIssue[]) {
    super(`Invalid survey: ${issues.map((i) => `${i.path || '(root)'}: ${i.message}`).join('; ')}`);
    this.name = 'SurveyValidationError';
    this.issues = issues;
  }
}

export function issuesFromZod(error: z.ZodError): SurveyIssue[] {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
}
