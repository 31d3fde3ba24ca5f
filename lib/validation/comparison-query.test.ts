import { describe, expect, it } from 'vitest';
import { comparisonQuerySchema, SORT_COLUMNS } from './comparison-query';

describe('comparisonQuerySchema', () => {
  it('fills the defaults for an empty query', () => {
    expect(comparisonQuerySchema.parse({})).toEqual({ sort: 'condition', dir: 'desc', page: 1, pageSize: 50 });
  });

  it('reads multi-selects, ranges and subsystem grades from URL strings', () => {
    expect(comparisonQuerySchema.parse({ condition: 'Good, Fair', swingMin: '250', ratioMax: '0.9', 'grade.bed': 'Excellent', releasedFrom: '2025-01-01' })).toMatchObject({
      condition: ['Good', 'Fair'],
      swingMin: 250,
      ratioMax: 0.9,
      'grade.bed': ['Excellent'],
      releasedFrom: '2025-01-01',
    });
  });

  it('accepts every sort column of the allow-list and nothing else', () => {
    for (const sort of SORT_COLUMNS) expect(comparisonQuerySchema.safeParse({ sort }).success, sort).toBe(true);
    for (const sort of ['maker', 'reports.id', 'swing desc', '1']) expect(comparisonQuerySchema.safeParse({ sort }).success, sort).toBe(false);
  });

  const refused: Array<[string, Record<string, string>, string]> = [
    ['an unknown key', { sellerId: 'x' }, ''],
    ['a quote in a search', { q: "a'b" }, 'q'],
    ['a semicolon in a region', { region: 'Brenmark;' }, 'region'],
    ['a grade off the scale', { condition: 'Mint' }, 'condition'],
    ['a fractional swing', { swingMin: '250.5' }, 'swingMin'],
    ['an upside-down year range', { yearMin: '2000', yearMax: '1990' }, 'yearMax'],
    ['a page size off the list', { pageSize: '30' }, 'pageSize'],
  ];
  for (const [what, query, field] of refused) {
    it(`refuses ${what} and names the field`, () => {
      const result = comparisonQuerySchema.safeParse(query);
      expect(result.success).toBe(false);
      if (!result.success && field) expect(result.error.issues.map((i) => i.path.join('.'))).toContain(field);
    });
  }
});
