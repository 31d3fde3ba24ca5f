import type { CheckEvaluation } from '../check-definition';
import { bandFor } from '../grading/bands';
import { DEVICE_STATE_RATIOS, OIL_LEVEL_RATIOS, ratioForRating, RATING_RATIOS } from '../grading/rubric-ratios';
import { practice } from '../source-marks';
import type { DeviceState, OilLevel, Rubric } from '../survey/rubrics';

/** Rated items: the inspector's rubric level mapped to q (grading/rubric-ratios.ts). */

const RUBRIC_SOURCE = practice('Waygrade rating rubric');

// Table texts for the formulas, built once.
const RATING_TABLE_TEXT = RATING_RATIOS.map((r, i) => `${i}→${r}`).join(', ');
const DEVICE_TABLE_TEXT = Object.entries(DEVICE_STATE_RATIOS).map(([k, v]) => `${k}→${v}`).join(', ');
const OIL_LEVEL_TABLE_TEXT = Object.entries(OIL_LEVEL_RATIOS).map(([k, v]) => `${k}→${v}`).join(', ');

export function evaluateRating(rating: number, rubric: Rubric, what: string): CheckEvaluation {
  const level = rubric.levels.find((l) => l.rating === rating);
  const q = ratioForRating(rating);
  return {
    measured: { value: rating, unit: 'rating 0–3', text: level?.label ?? String(rating) },
    permissible: {
      value: 1,
      unit: 'rating 0–3',
      direction: 'both',
      basis: 'rating 1 or better is within limit',
      source: RUBRIC_SOURCE,
    },
    q,
    inputs: [`${what}: rated ${rating} (${level?.meaning ?? 'no description'})`],
    formula: `rating → q by table ${RATING_TABLE_TEXT}: q = ${q}`,
    summary: `${what} rated ${rating} (${level?.label ?? ''}): ${bandFor(q).label.toLowerCase()}.`,
  };
}

const DEVICE_WORDS: Readonly<Record<DeviceState, string>> = {
  works: 'seen working',
  faulty: 'present but faulty',
  missing: 'missing',
};

export function evaluateDeviceState(state: DeviceState, what: string, safetyFinding?: string): CheckEvaluation {
  const q = DEVICE_STATE_RATIOS[state];
  return {
    measured: { value: state === 'works' ? 1 : 0, unit: 'works (1) / not (0)', text: DEVICE_WORDS[state] },
    permissible: { value: 1, unit: 'works (1) / not (0)', direction: 'both', basis: 'must work', source: RUBRIC_SOURCE },
    q,
    inputs: [`${what}: ${DEVICE_WORDS[state]}`],
    formula: `state → q by table ${DEVICE_TABLE_TEXT}: q = ${q}`,
    summary: `${what} ${DEVICE_WORDS[state]}: ${bandFor(q).label.toLowerCase()}.`,
    ...(safetyFinding && state !== 'works' ? { safetyFinding: `${what} ${DEVICE_WORDS[state]}: ${safetyFinding}` } : {}),
  };
}

export function evaluateOilLevel(level: OilLevel, what: string): CheckEvaluation {
  const q = OIL_LEVEL_RATIOS[level];
  return {
    measured: { value: level === 'correct' ? 1 : 0, unit: 'correct (1) / not (0)', text: level },
    permissible: { value: 1, unit: 'correct (1) / not (0)', direction: 'both', basis: 'level between the marks', source: RUBRIC_SOURCE },
    q,
    inputs: [`${what}: ${level}`],
    formula: `level → q by table ${OIL_LEVEL_TABLE_TEXT}: q = ${q}`,
    summary: `${what} ${level}: ${bandFor(q).label.toLowerCase()}.`,
  };
}
