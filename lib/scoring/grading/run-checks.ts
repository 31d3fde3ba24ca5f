import { isNotMeasured, type CheckDefinition, type CheckEvaluation } from '../check-definition';
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

/** Run each check module and shape its outcome as a report line with its full working. */
export function runChecks<S, C>(checks: readonly CheckDefinition<S, C>[], survey: S, context: C): CheckResult[] {
  return checks.map((check) => {
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
    return {
      id: check.id,
      subsystem: check.subsystem,
      label: check.label,
      status: 'measured',
      measured: outcome.measured,
      permissible: outcome.permissible,
      q: roundTo(outcome.q, 4),
      band: band.band,
      bandLabel: band.label,
      score: roundTo(checkScore(outcome.q), 2),
      weight: check.weight,
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
