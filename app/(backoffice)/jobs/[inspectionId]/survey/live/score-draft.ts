import { safeScoreSurvey, type CheckResult } from '@/lib/scoring';
import type { DraftSurvey } from '@/lib/survey/draft-survey-schema';
import { scorableDraft } from '@/lib/survey/scorable-draft';

/**
 * The live grading beside the inputs: the scoring library (and the survey format's validator it
 * brings) on what is typed so far, unfinished groups set aside. Loaded on its own after the survey
 * screen is up (use-live-checks.ts), so the screen does not wait for it.
 */
export function scoreDraft(draft: DraftSurvey): Map<string, CheckResult> | null {
  const scorable = scorableDraft(draft);
  const outcome = scorable ? safeScoreSurvey(scorable) : null;
  return outcome?.ok ? new Map(outcome.result.checks.map((c) => [c.id, c])) : null;
}
