import type { CheckDefinition } from '../check-definition';
import type { ParsedLatheSurvey } from '../survey/lathe-survey';
import type { LatheContext } from './lathe-context';

/** A check module for the centre lathe. */
export type LatheCheck = CheckDefinition<ParsedLatheSurvey, LatheContext>;

export const notMeasured = (reason: string) => ({ notMeasured: reason });
