import type { AllowedDirection } from './measure/deviation-ratio';
import type { SourceMark } from './source-marks';
import type { SubsystemId } from './subsystems';

/**
 * A check module: reads its inputs from the parsed survey and returns either an evaluation (the
 * measured value, its permissible value, q and the working) or the reason it could not be done.
 * A machine type is a list of these plus a limits table.
 */
export interface ValueWithUnit {
  value: number;
  unit: string;
}

export interface Permissible extends ValueWithUnit {
  direction: AllowedDirection;
  /** How the value was found (e.g. "0.02/300 scaled to 200 mm"). */
  basis: string;
  source: SourceMark;
}

/**
 * What a check's finding is about: condition (wear, damage, safety devices: what the grade is
 * about), or a set-up or service item that an adjustment or an oil change puts right.
 */
export type CheckNature = 'condition' | 'set-up' | 'service';

export interface CheckEvaluation {
  measured: ValueWithUnit & { text?: string };
  permissible: Permissible;
  q: number;
  /** Inputs as entered and as converted, one per line. */
  inputs: string[];
  formula: string;
  /** One sentence a non-expert can read. */
  summary: string;
  /** Extra figures the survey screen shows beside the inputs (zone, code, correction …). */
  details?: Record<string, string | number | boolean | null>;
  /** Set when the result must be fixed before the machine is used, whatever the grade. */
  safetyFinding?: string;
}

export interface NotMeasured {
  notMeasured: string;
}

export interface CheckDefinition<Survey, Context> {
  id: string;
  subsystem: SubsystemId;
  label: string;
  /** Share of the subsystem score and of the confidence figure. */
  weight: number;
  evaluate(survey: Survey, context: Context): CheckEvaluation | NotMeasured;
}

export function isNotMeasured(outcome: CheckEvaluation | NotMeasured): outcome is NotMeasured {
  return 'notMeasured' in outcome;
}
