import { DEAL_BREAKER_ITEMS, HIDDEN_DAMAGE_ITEMS } from '@/lib/scoring/survey/checklist-items';
import type { DraftSurvey } from './draft-survey-schema';

/** The labels of every hidden-damage item and deal-breaker answered "yes", in checklist order. */
export function findingsNeedingPhotos(survey: DraftSurvey): string[] {
  const damage = (survey.hiddenDamage ?? {}) as Record<string, { present?: boolean } | undefined>;
  const breakers = (survey.dealBreakers ?? {}) as Record<string, { present?: boolean } | undefined>;
  return [
    ...HIDDEN_DAMAGE_ITEMS.filter((item) => damage[item.id]?.present === true).map((item) => item.label),
    ...DEAL_BREAKER_ITEMS.filter((item) => breakers[item.id]?.present === true).map((item) => item.label),
  ];
}
