import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CheckResult } from '../result';
import { confidenceFrom } from './confidence';
import { notMeasuredText } from './not-measured-text';

const check = (id: string, weight: number, measured: boolean): CheckResult => ({
  id,
  subsystem: 'drive',
  label: `label ${id}`,
  status: measured ? 'measured' : 'not-measured',
  measured: null,
  permissible: null,
  q: null,
  band: null,
  bandLabel: '',
  score: null,
  weight,
  nature: 'condition',
  explanation: { inputs: [], formula: '', source: '', sourceMark: null, text: notMeasuredText(`reason ${id}`) },
  details: {},
});

describe('confidence', () => {
  // Reference: Array.prototype.sort, which is stable (ECMAScript 2019), with the documented order:
  // heavier checks first, equal weights by id.
  it('lists missing checks in the order a stable sort by weight, then id, gives', () => {
    const ids = ['a', 'b', 'bed-twist', 'bed-straightness', 'oil-leaks', 'oil-pump', 'dials', 'covers'];
    fc.assert(
      fc.property(
        fc.array(fc.record({ id: fc.constantFrom(...ids), weight: fc.constantFrom(0.25, 0.5, 1, 1.5, 2), measured: fc.boolean() }), { maxLength: 60 }),
        (rows) => {
          const checks = rows.map((r) => check(r.id, r.weight, r.measured));
          const expected = checks
            .filter((c) => c.status !== 'measured')
            .sort((a, b) => b.weight - a.weight || a.id.localeCompare(b.id))
            .map((c) => ({ checkId: c.id, label: c.label, reason: `reason ${c.id}` }));
          expect(confidenceFrom(checks).missing).toEqual(expected);
        },
      ),
      { numRuns: 500 },
    );
  });

  it('counts measured weight as the confidence value', () => {
    const result = confidenceFrom([check('a', 3, true), check('b', 1, false)]);
    expect(result.value).toBe(0.75);
    expect(result.explanation).toBe('Measured 1 of 2 checks, 75 % of the check weight. Missing, heaviest first: label b (reason b).');
  });
});
