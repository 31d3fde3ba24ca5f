import type { CheckEvaluation, Permissible } from '../check-definition';
import { deviationRatio } from '../measure/deviation-ratio';
import { fmt, roundTo } from '../format-number';
import { bandFor, bandWords } from '../grading/bands';
import { toMillimetres, type Length } from '../units/length';

/** "0.8 thou = 0.0203 mm" — the entry as typed and as the library uses it. */
export function describeLength(label: string, length: Length): string {
  const mm = toMillimetres(length);
  return length.unit === 'mm' ? `${label}: ${fmt(mm)} mm` : `${label}: ${fmt(length.value)} ${length.unit} = ${fmt(mm)} mm`;
}

const DIRECTION_WORDS = {
  both: '',
  'positive-only': ' (one-sided: only the positive direction is allowed)',
  'negative-only': ' (one-sided: only the negative direction is allowed)',
} as const;

export interface DeviationCheckInput {
  deviation: number;
  unit: string;
  permissible: Permissible;
  inputs: string[];
  what: string;
  /** Deviations no larger than this have no reliable sign (instrument step). */
  resolution?: number;
  details?: CheckEvaluation['details'];
  wrongDirectionText?: string;
  safetyFindingWhenOver?: string;
}

/** Evaluate a deviation against a limit: q, formula and a one-line summary. */
export function evaluateDeviation(input: DeviationCheckInput): CheckEvaluation {
  const { permissible: p } = input;
  const { q, wrongDirection } = deviationRatio(input.deviation, p.value, p.direction, input.resolution ?? 0);
  // The permitted value appears in both sentences; written once.
  const permittedText = fmt(p.value);
  const formula = wrongDirection
    ? `q = 1 + |d|/T = 1 + ${fmt(Math.abs(input.deviation))}/${permittedText} = ${fmt(q, 3)} (deviation in the forbidden direction fails even when small)`
    : `q = |d|/T = ${fmt(Math.abs(input.deviation))}/${permittedText} = ${fmt(q, 3)}${DIRECTION_WORDS[p.direction]}`;
  const band = bandFor(q);
  const summary = wrongDirection
    ? `${input.what} ${fmt(input.deviation)} ${input.unit} is the wrong way${input.wrongDirectionText ? ` (${input.wrongDirectionText})` : ''}: ${bandWords(band)}.`
    : `${input.what} ${fmt(input.deviation)} ${input.unit} against ${permittedText} ${p.unit} permitted: ${bandWords(band)} (${band.meaning}).`;
  const evaluation: CheckEvaluation = {
    measured: { value: roundTo(input.deviation, 6), unit: input.unit },
    permissible: p,
    q,
    inputs: input.inputs,
    formula,
    summary,
  };
  if (input.details) evaluation.details = input.details;
  if (input.safetyFindingWhenOver && q > 1) evaluation.safetyFinding = input.safetyFindingWhenOver;
  return evaluation;
}
