// The comparison table prepares its page statement once per shape and runs it with each request's
// values (db/queries/comparison.ts). A shape key that left out something the statement's text
// depends on would hand one request another request's statement: a wrong order, a missing filter or
// the wrong reports' details. Here random queries from random readers run through the shared,
// long-lived statement cache and through a reader of their own that prepares afresh; the two must
// give the same page. fast-check shrinks any difference to the smallest query that shows it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { count, gte } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { comparisonEntries } from '@/db/schema';
import { listComparisonRows, type ComparisonViewer } from '@/db/queries/comparison';
import { LATHE_KINDS } from '@/db/schema/machines';
import { CONDITION_GRADES } from '@/db/schema/reports';
import { comparisonQuerySchema, DEAL_BREAKER_FILTERS, PAGE_SIZES, SORT_COLUMNS, SUBSYSTEM_KEY_LIST } from '@/lib/validation/comparison-query';

const NOW = new Date('2026-12-02T12:00:00Z');

let regions: string[] = [];
let makers: string[] = [];
let inspectionIds: number[] = [];

/** A reader of its own: a new key in the statement cache, so its statement is prepared afresh. */
const freshReader = () => ({ select: db.select.bind(db), selectDistinct: db.selectDistinct.bind(db) }) as unknown as typeof db;

beforeAll(async () => {
  const rows = await db
    .select({ region: comparisonEntries.region, maker: comparisonEntries.maker, inspectionId: comparisonEntries.inspectionId })
    .from(comparisonEntries);
  regions = [...new Set(rows.map((r) => r.region))];
  makers = [...new Set(rows.map((r) => r.maker))];
  inspectionIds = rows.map((r) => r.inspectionId);
});
afterAll(closeDatabase);

// Each filter is left out most of the time, so that most pages have rows to tell orders and figures apart.
const optional = <T,>(arbitrary: fc.Arbitrary<T>) => fc.oneof({ arbitrary: fc.constant(undefined), weight: 20 }, { arbitrary, weight: 1 });
const choices = <T extends string>(values: readonly T[]) => optional(fc.subarray([...values], { minLength: 1 }).map((picked) => picked.join(',')));
const range = (low: number, high: number) => optional(fc.integer({ min: low, max: high }).map(String));

function queryArbitrary() {
  return fc
    .record({
      q: optional(fc.constantFrom(...makers.map((m) => m.slice(0, 3)), 'zz')),
      kind: choices(LATHE_KINDS),
      region: choices(regions),
      condition: choices(CONDITION_GRADES),
      [`grade.${SUBSYSTEM_KEY_LIST[0]}`]: choices(CONDITION_GRADES),
      [`grade.${SUBSYSTEM_KEY_LIST[3]}`]: choices(CONDITION_GRADES),
      swingMin: range(0, 400),
      swingMax: range(300, 900),
      yearMin: range(1900, 1990),
      confidenceMin: range(0, 90),
      priceMin: range(0, 20_000),
      valueMin: range(0, 20_000),
      ratioMax: optional(fc.constantFrom('0.8', '1', '1.5', '3')),
      repairMax: range(0, 30_000),
      landedMin: range(0, 30_000),
      inclusionsMin: range(0, 5_000),
      dealBreakers: optional(fc.constantFrom(...DEAL_BREAKER_FILTERS)),
      daysListedMax: range(0, 800),
      reportAgeMin: range(0, 400),
      reportAgeMax: range(0, 2_000),
      releasedFrom: optional(fc.constantFrom('2024-01-01', '2025-06-30', '2026-11-01')),
      sort: fc.constantFrom(...SORT_COLUMNS),
      dir: fc.constantFrom('asc', 'desc'),
      page: fc.constantFrom('1', '2'),
      pageSize: fc.constantFrom(...PAGE_SIZES.map(String)),
    })
    .map((raw) => comparisonQuerySchema.safeParse(Object.fromEntries(Object.entries(raw).filter(([, v]) => v !== undefined))))
    .filter((parsed) => parsed.success)
    .map((parsed) => parsed.data!);
}

function viewerArbitrary(): fc.Arbitrary<ComparisonViewer> {
  const visibility = fc.oneof(
    fc.constant({ all: true as const }),
    fc.subarray(inspectionIds, { maxLength: 12 }).map((ids) => ({ all: false as const, inspectionIds: ids })),
  );
  const shop = fc.constantFrom(null, { voltage: 230, phases: 1 as const }, { voltage: 400, phases: 3 as const }, { voltage: 415, phases: 3 as const });
  return fc.record({ visibility, shop }).map(({ visibility, shop }) => ({ id: 'prepared-shapes-reader', visibility, shop, validityDays: 90, now: NOW }));
}

type Query = ReturnType<typeof comparisonQuerySchema.parse>;
type Change = (query: Query, viewer: ComparisonViewer) => [Query, ComparisonViewer];

/**
 * One change to a query or its reader that a statement's text may depend on, each alone: a shape key
 * that missed it would run the changed request with the first request's statement.
 */
const CHANGES: Record<string, Change> = {
  direction: (q, v) => [{ ...q, dir: q.dir === 'asc' ? 'desc' : 'asc' }, v],
  sort: (q, v) => [{ ...q, sort: SORT_COLUMNS[(SORT_COLUMNS.indexOf(q.sort) + 1) % SORT_COLUMNS.length]! }, v],
  'deal-breakers': (q, v) => [{ ...q, dealBreakers: q.dealBreakers === 'none' ? 'any' : 'none' }, v],
  'no deal-breaker filter': (q, v) => [{ ...q, dealBreakers: undefined }, v],
  'sees every report': (q, v) => [q, { ...v, visibility: v.visibility.all ? { all: false, inspectionIds: [] } : { all: true } }],
  'shop supply': (q, v) => [q, { ...v, shop: v.shop ? null : { voltage: 230, phases: 1 } }],
  'other values': (q, v) => [{ ...q, swingMin: q.swingMin === undefined ? undefined : q.swingMin + 50, page: q.page === 1 ? 2 : 1 }, v],
};

describe('the comparison table’s prepared statements', () => {
  it('give a query the page a freshly prepared statement gives, after another of nearly the same shape', async () => {
    expect(inspectionIds.length).toBeGreaterThan(5);
    let withRows = 0;
    let runs = 0;
    await fc.assert(
      fc.asyncProperty(queryArbitrary(), viewerArbitrary(), fc.constantFrom(...Object.keys(CHANGES)), async (query, viewer, change) => {
        // The first request prepares its shape in the shared cache; the changed one must not reuse it wrongly.
        expect(await listComparisonRows(db, query, viewer)).toEqual(await listComparisonRows(freshReader(), query, viewer));
        const [changedQuery, changedViewer] = CHANGES[change]!(query, viewer);
        const changed = await listComparisonRows(db, changedQuery, changedViewer);
        expect(changed).toEqual(await listComparisonRows(freshReader(), changedQuery, changedViewer));
        runs += 1;
        if (changed.rows.length > 1) withRows += 1;
      }),
      { numRuns: 300 },
    );
    // Empty pages agree whatever the statement: the check is worth something only if most pages have rows.
    expect(withRows / runs).toBeGreaterThan(0.3);
  });
  it('runs one shape with another request’s values, not the first one’s', async () => {
    const viewer: ComparisonViewer = { id: 'prepared-shapes-reader', visibility: { all: true }, shop: null, validityDays: 90, now: NOW };
    const wide = comparisonQuerySchema.parse({ swingMin: '0', sort: 'swing', dir: 'asc', pageSize: '100' });
    const narrow = comparisonQuerySchema.parse({ swingMin: '400', sort: 'swing', dir: 'asc', pageSize: '100' });
    const [stored] = await db.select({ n: count() }).from(comparisonEntries).where(gte(comparisonEntries.swingMm, 400));
    const all = await listComparisonRows(db, wide, viewer);
    const some = await listComparisonRows(db, narrow, viewer);
    expect(all.rows.some((r) => r.swingMm < 400)).toBe(true);
    expect(some.rows.every((r) => r.swingMm >= 400)).toBe(true);
    expect(some.total).toBe(stored!.n);
  });
});
