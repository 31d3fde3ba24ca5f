import { latheSurveySchema, type LatheSurvey } from '@/lib/scoring';
import type { DraftSurvey } from './draft-survey-schema';
import { setAt } from './survey-paths';

/**
 * For live results while the survey is being filled: the draft with every unfinished group of
 * readings set aside, so the checks that are complete can be graded now. Returns null while the
 * machine's own size is missing, because every limit is scaled by it.
 */
export function scorableDraft(draft: DraftSurvey): LatheSurvey | null {
  let candidate: unknown = draft;
  // Each pass removes the groups the format still complains about; a handful of passes suffices.
  for (let pass = 0; pass < 8; pass += 1) {
    const parsed = latheSurveySchema.safeParse(candidate);
    if (parsed.success) return candidate as LatheSurvey;
    for (const issue of parsed.error.issues) {
      const path = issue.path.filter((part): part is string | number => typeof part !== 'symbol');
      // Drop the group that holds the unfinished value (the value's parent object, or the member itself at the top).
      const keys = path.filter((part) => part !== 'value' && part !== 'unit');
      const group = keys.length > 1 ? keys.slice(0, -1) : keys;
      if (group.length === 0 || group[0] === 'machine' || group[0] === 'surveyFormatVersion' || group[0] === 'machineType') return null;
      candidate = setAt(candidate, group, undefined);
    }
  }
  return null;
}
