import { ALL_RUBRICS, type Rubric } from '@/lib/scoring/survey/rubric-levels';

const rubric = (id: string): Rubric => {
  const found = ALL_RUBRICS.find((r) => r.id === id);
  if (!found) throw new Error(`No rubric "${id}" in the scoring library`);
  return found;
};

export const WEAR = rubric('wear');
export const NOISE = rubric('noise');
export const OIL_CONDITION = rubric('oil-condition');
export const DEBRIS = rubric('debris');
export const LEAKS = rubric('leaks');
export const FILTER_SCREEN = rubric('filter-screen');
export const BELT = rubric('belt');
export const CABLES = rubric('cables');
export const DIALS = rubric('dials');
