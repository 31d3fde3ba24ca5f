import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import invalid from '../examples/invalid/bad-fields.json';
import { compiledLatheSurveySchema } from './compiled-survey-schema';
import { latheSurveySchema } from './lathe-survey';

const EXAMPLES_DIR = fileURLToPath(new URL('../examples/', import.meta.url));
const examples = readdirSync(EXAMPLES_DIR)
  .filter((f) => f.endsWith('.json'))
  .sort()
  .map((f) => JSON.parse(readFileSync(join(EXAMPLES_DIR, f), 'utf8')) as Record<string, unknown>);

/** Both parsers must answer alike: the same parsed survey, or the same issues in the same order. */
function expectSameAnswer(input: unknown) {
  const runtime = latheSurveySchema.safeParse(input);
  const compiled = compiledLatheSurveySchema.safeParse(input);
  expect(compiled.success).toBe(runtime.success);
  if (runtime.success) expect(JSON.stringify(compiled.data)).toBe(JSON.stringify(runtime.data));
  else expect(JSON.stringify(compiled.error!.issues)).toBe(JSON.stringify(runtime.error.issues));
}

/** Every object and array inside a value, with the path to it, so a mutation can land anywhere. */
function containers(value: unknown, path: (string | number)[] = []): { path: (string | number)[]; node: object }[] {
  if (value === null || typeof value !== 'object') return [];
  const own = Object.entries(value).flatMap(([k, v]) => containers(v, [...path, Array.isArray(value) ? Number(k) : k]));
  return [{ path, node: value }, ...own];
}

const WRONG_VALUES = [undefined, null, -1, 0, 0.5, 1e9, Number.NaN, Number.POSITIVE_INFINITY, '', '0.01', 'mm', true, [], {}, [1], 'x'.repeat(6000)];

describe('compiled survey schema', () => {
  it('compiles the whole survey format (no part left to the slower runtime parser)', () => {
    expect(() => z.compile(latheSurveySchema, { strict: true })).not.toThrow();
  });

  it('answers like the runtime parser on every example, valid or not', () => {
    for (const example of examples) expectSameAnswer(example);
    expectSameAnswer(invalid);
    expectSameAnswer(null);
    expectSameAnswer('survey');
  });

  it('answers like the runtime parser when any field of an example is changed, removed or added', () => {
    fc.assert(
      fc.property(
        fc.nat(examples.length - 1),
        fc.nat(),
        fc.oneof(fc.constantFrom(...WRONG_VALUES), fc.double(), fc.integer()),
        fc.constantFrom('replace', 'delete', 'add'),
        (exampleIndex, pick, newValue, how) => {
          const survey = structuredClone(examples[exampleIndex]!);
          const targets = containers(survey);
          const { node } = targets[pick % targets.length]!;
          const keys = Object.keys(node);
          const record = node as Record<string, unknown>;
          if (how === 'add' || keys.length === 0) record[Array.isArray(node) ? keys.length : 'unexpectedField'] = newValue;
          else if (how === 'delete') delete record[keys[pick % keys.length]!];
          else record[keys[pick % keys.length]!] = newValue;
          expectSameAnswer(survey);
        },
      ),
      { numRuns: 500 },
    );
  }, 30_000);
});
