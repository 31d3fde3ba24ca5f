/**
 * Writes lib/scoring/survey.schema.json from the zod survey schema: `npx tsx scripts/write-survey-json-schema.ts`.
 * Kept out of lib/scoring, which stays pure (no file system). The test survey/json-schema.test.ts
 * fails when the committed file and the schema drift apart.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { surveyJsonSchemaText } from '../lib/scoring/survey/json-schema';

const target = fileURLToPath(new URL('../lib/scoring/survey.schema.json', import.meta.url));
writeFileSync(target, surveyJsonSchemaText());
process.stdout.write(`wrote ${target}\n`);
