import type { CheckEvaluation } from '../check-definition';
import { bandWordsFor } from '../grading/bands';
import { DEVICE_STATE_RATIOS, OIL_LEVEL_RATIOS, ratioForRating, RATING_RATIOS } from '../grading/rubric-ratios';
import { practice } from '../source-marks';
import type { DeviceState, OilLevel, Rubric } from '../survey/rubrics';

/** Rated items: the inspector's rubric level mapped to q (grading/rubric-ratios.ts). */

const RUBRIC_SOURCE = practice('Waygrade rating rubric');

// Table texts for the formulas, built once.
const RATING_TABLE_TEXT = RATING_RATIOS.map((r, i) => `${i}→${r}`).join(', ');
const DEVICE_TABLE_TEXT = Object.entries(DEVICE_STATE_RATIOS).map(([k, v]) => `${k}→${v}`).join(', ');
const OIL_LEVEL_TABLE_TEXT = Object.entries(OIL_LEVEL_RATIOS).map(([k, v]) => `${k}→${v}`).join(', ');

/** Each formula text by its q, built once: the tables have only a handful of values. */
function formulasByQ(prefix: string, ratios: readonly number[]): (q: number) => string {
  const texts = new Map(ratios.map((q) => [q, `${prefix}: q = ${q}`]));
  return (q) => texts.get(q) ?? `${prefix}: q = ${q}`;
}
const ratingFormula = formulasByQ(`rating → q by table ${RATING_TABLE_TEXT}`, RATING_RATIOS);
const deviceFormula = formulasByQ(`state → q by table ${DEVICE_TABLE_TEXT}`, Object.values(DEVICE_STATE_RATIOS));
const oilLevelFormula = formulasByQ(`level → q by table ${OIL_LEVEL_TABLE_TEXT}`, Object.values(OIL_LEVEL_RATIOS));

function levelOf(rubric: Rubric, rating: number) {
  for (const l of rubric.levels) if (l.rating === rating) return l;
  return undefined;
}

export function evaluateRating(rating: number, rubric: Rubric, what: string): CheckEvaluation {
  const level = levelOf(rubric, rating);
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
    formula: ratingFormula(q),
    summary: `${what} rated ${rating} (${level?.label ?? ''}): ${bandWordsFor(q)}.`,
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
    formula: deviceFormula(q),
    summary: `${what} ${DEVICE_WORDS[state]}: ${bandWordsFor(q)}.`,
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
    formula: oilLevelFormula(q),
    summary: `${what} ${level}: ${bandWordsFor(q)}.`,
  };
}
