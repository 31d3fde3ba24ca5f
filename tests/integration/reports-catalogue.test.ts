import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { reportAccessGrants } from '@/db/schema';
import { CATALOGUE_PAGE_SIZE, listCatalogueReports } from '@/db/queries/reports-catalogue';
import { machineSearchSchema } from '@/lib/validation/list-filters';
import { createAccount, type TestAccount } from '../support/accounts';
import { createReleasedReport } from '../support/purchase-fixtures';

// The buyers' catalogue of released reports: one page at a time, newest first, searchable by maker
// or model, with every LIKE wildcard in the search taken literally.
describe('the reports catalogue', () => {
  const maker = `Ctlg${randomUUID().slice(0, 6)}`;
  const made: number[] = [];
  let buyer: TestAccount;

  beforeAll(async () => {
    buyer = await createAccount('buyer');
    // Two models whose names differ only where a LIKE wildcard would match anything, then enough
    // plain ones to need a second page.
    for (const model of ['A_1', 'A%2', ...Array.from({ length: CATALOGUE_PAGE_SIZE }, (_, i) => `Plain ${i}`)]) {
      made.push((await createReleasedReport({ maker, model })).reportId);
    }
    await db.insert(reportAccessGrants).values({ reportId: made[1]!, userId: buyer.id, reason: 'purchase' });
  }, 120_000);
  afterAll(() => closeDatabase());

  const list = (query: Record<string, string>) => listCatalogueReports(buyer.id, machineSearchSchema.parse(query));

  it('gives one page at a time, newest report first, and the number in all', async () => {
    const first = await list({ q: maker });
    expect(first.total).toBe(made.length);
    expect(first.rows).toHaveLength(CATALOGUE_PAGE_SIZE);
    const second = await list({ q: maker, page: '2' });
    expect(second.rows).toHaveLength(made.length - CATALOGUE_PAGE_SIZE);
    const ids = [...first.rows, ...second.rows].map((r) => r.id);
    // Released one after another: newest first is the order they were made in, reversed.
    expect(ids).toEqual([...made].reverse());
    const past = await list({ q: maker, page: '3' });
    expect(past).toEqual({ rows: [], total: made.length });
  });

  it('finds a maker, a model, or both together, and takes % and _ literally', async () => {
    expect((await list({ q: `${maker} A_` })).rows.map((r) => r.model)).toEqual(['A_1']);
    expect((await list({ q: 'A%2' })).rows.filter((r) => r.maker === maker).map((r) => r.model)).toEqual(['A%2']);
    expect((await list({ q: `${maker.toLowerCase()} plain 7` })).rows.map((r) => r.model)).toEqual(['Plain 7']);
    expect(await list({ q: `${maker} nothing like this` })).toEqual({ rows: [], total: 0 });
  });

  it('marks the reports the reader holds', async () => {
    const { rows } = await list({ q: `${maker} A` });
    expect(rows.map((r) => [r.model, r.hasAccess])).toEqual([
      ['A%2', true],
      ['A_1', false],
    ]);
  });

  it('reads an address it cannot use as the first page, whole catalogue', () => {
    expect(machineSearchSchema.parse({ page: 'abc', q: '   ' })).toEqual({ page: 1, q: undefined });
    expect(machineSearchSchema.parse({ page: '0' }).page).toBe(1);
    expect(machineSearchSchema.parse({ page: ['2', '3'] }).page).toBe(1);
    expect(machineSearchSchema.parse({ q: 'x'.repeat(101) }).q).toBeUndefined();
  });
});
