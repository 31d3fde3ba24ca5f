import { z } from 'zod';
import { latheSurveySchema } from './lathe-survey';

/**
 * The survey schema compiled once, at load, into zod's generated validator (z.compile). It gives
 * the same parsed survey and the same issues as latheSurveySchema — an invalid survey is handed
 * back to zod's runtime parser for its issues — but checks a valid survey several times faster,
 * and every submit is validated before it is scored. latheSurveySchema stays the definition of
 * the format (JSON Schema, forms); this is only the fast way to apply it.
 */
export const compiledLatheSurveySchema = z.compile(latheSurveySchema);
