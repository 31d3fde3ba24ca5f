/**
 * Writes lib/scoring/survey.schema.json from the zod survey schema: `npx tsx lib/scoring/write-json-schema.ts`.
 * The test survey-json-schema.test.ts fails when the committed file and the schema drift apart.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { surveyJsonSchemaText } from './survey/json-schema';

const target = fileURLToPath(new URL('./survey.schema.json', import.meta.url));
writeFileSync(target, surveyJsonSchemaText());
process.stdout.write(`wrote ${target}\n`);
