import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { surveyJsonSchemaText } from './json-schema';

describe('published survey JSON Schema', () => {
  it('matches what the zod schema generates (run scripts/write-survey-json-schema.ts after a change)', () => {
    const committed = readFileSync(fileURLToPath(new URL('../survey.schema.json', import.meta.url)), 'utf8');
    expect(committed).toBe(surveyJsonSchemaText());
  });
});
