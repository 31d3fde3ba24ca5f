import { isNotMeasured, type CheckDefinition, type CheckEvaluation, type CheckNature } from '../check-definition';
import type { CheckResult } from '../result';
import { describeSource } from '../source-marks';
import { bandFor } from './bands';
import { checkScore } from './check-score';
import { notMeasuredText } from './not-measured-text';
import { roundTo } from '../format-number';

/**
 * The figures shown beside a check, with its safety finding last when it has one. Every check
 * builds its details afresh, so they are taken over as they are; only a finding needs a new object.
 */
function detailsOf(outcome: CheckEvaluation): CheckResult['details'] {
  if (!outcome.safetyFinding) return outcome.details ?? {};
  return { ...outcome.details, safetyFinding: outcome.safetyFinding };
}

/** The band label of a set-up or service item outside its limit: what it needs, not a wear word. */
const NEEDS_WORDS: Readonly<Record<Exclude<CheckNature, 'condition'>, string>> = {
  'set-up': 'Needs setting up',
  service: 'Needs service',
};

/** Run each check module and shape its outcome as a report line with its full working. */
export function runChecks<S, C>(
  checks: readonly CheckDefinition<S, C>[],
  survey: S,
  context: C,
  natureOf: (index: number, details: CheckEvaluation['details']) => CheckNature = () => 'condition',
): CheckResult[] {
  return checks.map((check, index) => {
    const outcome = check.evaluate(survey, context);
    if (isNotMeasured(outcome)) {
      return {
        id: check.id,
        subsystem: check.subsystem,
        label: check.label,
        status: 'not-measured',
        measured: null,
        permissible: null,
        q: null,
        band: null,
        bandLabel: 'Not measured',
        score: null,
        weight: check.weight,
        nature: natureOf(index, undefined),
        explanation: {
          inputs: [],
          formula: '',
          source: '',
          sourceMark: null,
          text: notMeasuredText(outcome.notMeasured),
        },
        details: {},
      } satisfies CheckResult;
    }
    const band = bandFor(outcome.q);
    const source = describeSource(outcome.permissible.source);
    const nature = natureOf(index, outcome.details);
    return {
      id: check.id,
      subsystem: check.subsystem,
      label: check.label,
      status: 'measured',
      measured: outcome.measured,
      permissible: outcome.permissible,
      q: roundTo(outcome.q, 4),
      band: band.band,
      bandLabel: nature !== 'condition' && outcome.q > 1 ? NEEDS_WORDS[nature] : band.label,
      score: roundTo(checkScore(outcome.q), 2),
      weight: check.weight,
      nature,
      explanation: {
        inputs: outcome.inputs,
        formula: outcome.formula,
        source,
        sourceMark: outcome.permissible.source,
        text: `${outcome.summary} Permissible: ${outcome.permissible.basis}. ${source}.`,
      },
      details: detailsOf(outcome),
    } satisfies CheckResult;
  });
}
