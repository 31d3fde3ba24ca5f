import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import sales from './examples/sales/comparable-sales.json';
import invalid from './examples/invalid/bad-fields.json';
import { safeScoreSurvey, scoreSurvey } from './score-survey';
import type { ComparableSale } from './valuation/valuation-types';

/**
 * The full result for every example survey, byte for byte as stored for a report. Any change to
 * what a report says — a figure, a rounding, a word of explanation, the order of keys — shows up
 * here, so refactoring the scorer cannot alter a report unnoticed. When a change is intended,
 * review the diff and update with `npx vitest run lib/scoring -u`.
 */
const EXAMPLES_DIR = fileURLToPath(new URL('./examples/', import.meta.url));
const examples = readdirSync(EXAMPLES_DIR)
  .filter((f) => f.endsWith('.json'))
  .sort()
  .map((f) => ({ name: f.replace(/\.json$/, ''), survey: JSON.parse(readFileSync(join(EXAMPLES_DIR, f), 'utf8')) as unknown }));

describe('scoring results stay byte-identical', () => {
  for (const { name, survey } of examples) {
    it(`${name}: default options`, async () => {
      await expect(JSON.stringify(scoreSurvey(survey))).toMatchFileSnapshot(`./__snapshots__/results/${name}.json`);
    });

    it(`${name}: comparable sales and a fixed valuation year`, async () => {
      const result = scoreSurvey(survey, { comparableSales: sales as ComparableSale[], asOfYear: 2025 });
      await expect(JSON.stringify(result)).toMatchFileSnapshot(`./__snapshots__/results/${name}.with-sales.json`);
    });
  }

  it('invalid survey: the same issues, in the same order', async () => {
    const outcome = safeScoreSurvey(invalid);
    await expect(JSON.stringify(outcome, null, 2)).toMatchFileSnapshot('./__snapshots__/results/invalid-bad-fields.json');
  });
});
