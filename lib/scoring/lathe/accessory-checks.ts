import { fmt } from '../format-number';
import { bandWordsFor } from '../grading/bands';
import { ratioForRating } from '../grading/rubric-ratios';
import { practice } from '../source-marks';
import { WEAR_RUBRIC } from '../survey/rubrics';
import { notMeasured, type LatheCheck } from './lathe-check';

/**
 * Accessories: the mean q of the items supplied, by the wear rubric. An empty list means the
 * inspector looked and found nothing supplied, which grades as worn (a lathe without chucks or
 * tool post needs buying them before use) — common practice.
 */
const NOTHING_SUPPLIED_Q = 3;

export const ACCESSORY_CHECKS: readonly LatheCheck[] = [
  {
    id: 'accessories',
    subsystem: 'accessories',
    label: 'Accessories supplied',
    weight: 1,
    evaluate(s) {
      const items = s.accessories;
      if (!items) return notMeasured('accessories not listed');
      const q = items.length
        ? items.reduce((sum, i) => sum + ratioForRating(i.condition), 0) / items.length
        : NOTHING_SUPPLIED_Q;
      const levels = WEAR_RUBRIC.levels;
      return {
        measured: { value: items.length, unit: 'items', text: items.map((i) => i.kind).join(', ') || 'none' },
        permissible: {
          value: 1,
          unit: 'mean q',
          direction: 'both',
          basis: 'mean rating ratio of the items supplied',
          source: practice('Waygrade rating rubric'),
        },
        q,
        inputs: items.length
          ? items.map((i) => `${i.kind}${i.description ? ` (${i.description})` : ''}: ${levels[i.condition]?.label ?? i.condition}`)
          : ['no accessories supplied'],
        formula: items.length ? `q = mean of item ratios = ${fmt(q, 3)}` : `nothing supplied → q = ${NOTHING_SUPPLIED_Q}`,
        summary: `${items.length} accessories: ${bandWordsFor(q)}.`,
      };
    },
  },
];
