import { describe, expect, it } from 'vitest';
import type { CheckResult } from '@/lib/scoring/result';
import { differingChecks } from './differing-checks';

const check = (id: string, score: number | null, band: CheckResult['band'] = 'in-limit'): CheckResult =>
  ({
    id,
    subsystem: 'bed-and-ways',
    label: `Check ${id}`,
    status: score === null ? 'not-measured' : 'measured',
    measured: score === null ? null : { value: score / 1000, unit: 'mm' },
    permissible: null,
    q: score === null ? null : 1 - score / 100,
    band: score === null ? null : band,
    bandLabel: '',
    score,
    weight: 1,
    nature: 'condition',
    explanation: { inputs: [], formula: '', source: '', sourceMark: null, text: '' },
    details: {},
  }) as CheckResult;

describe('differingChecks', () => {
  it('orders checks by the spread of their scores, largest first', () => {
    const a = { checks: [check('runout', 90), check('twist', 80), check('backlash', 50)] };
    const b = { checks: [check('runout', 40), check('twist', 75), check('backlash', 50)] };
    const found = differingChecks([a, b]);
    expect(found.map((c) => [c.id, c.spread])).toEqual([
      ['runout', 50],
      ['twist', 5],
    ]);
  });

  it('keeps each machine in its column and shows a missing reading as not measured', () => {
    const a = { checks: [check('runout', 90)] };
    const b = { checks: [check('runout', null)] };
    const c = { checks: [check('runout', 30)] };
    const [runout] = differingChecks([a, b, c]);
    expect(runout!.readings.map((r) => r.score)).toEqual([90, null, 30]);
    expect(runout!.readings[1]!.measuredText).toBeNull();
    expect(runout!.readings[0]!.measuredText).toBe('0.09 mm');
  });

  it('skips checks measured on fewer than two machines and reports without details', () => {
    const found = differingChecks([{ checks: [check('runout', 90)] }, null, { checks: [check('twist', 20)] }]);
    expect(found).toEqual([]);
  });

  it('returns at most the asked number of checks', () => {
    const many = (offset: number) => ({ checks: Array.from({ length: 12 }, (_, i) => check(`c${i}`, 50 + offset * i)) });
    expect(differingChecks([many(0), many(3)], 5)).toHaveLength(5);
  });
});
