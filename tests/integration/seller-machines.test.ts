import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDatabase } from '@/db/client';
import { listSellerMachines, SELLER_MACHINES_PAGE_SIZE } from '@/db/queries/dashboard';
import { machineSearchSchema } from '@/lib/validation/list-filters';
import { createAccount, type TestAccount } from '../support/accounts';
import { createInspection, createMachine } from '../support/workflow-fixtures';

// A seller's own list of machines: a page at a time, last made first, each with the status of its
// latest inspection, searchable by maker or model; other sellers' machines never show.
describe('a seller’s machines', () => {
  let seller: TestAccount;
  let other: TestAccount;
  const made: number[] = [];

  beforeAll(async () => {
    [seller, other] = await Promise.all([createAccount('seller'), createAccount('seller')]);
    for (let i = 0; i < SELLER_MACHINES_PAGE_SIZE + 2; i += 1) {
      made.push(await createMachine(seller.id, { maker: i === 3 ? 'Halvorn' : 'Corvane', model: `SM-${i}` }));
    }
    await createMachine(other.id, { maker: 'Halvorn', model: 'SM-other' });
    // Machine 3 was inspected once, the visit cancelled, and asked for again: the latest counts.
    await createInspection(made[3]!, seller.id, 'cancelled');
    await createInspection(made[3]!, seller.id, 'booked');
    await createInspection(made[4]!, seller.id, 'requested');
  }, 60_000);
  afterAll(() => closeDatabase());

  const list = (query: Record<string, string>, pageSize?: number) => listSellerMachines(seller.id, machineSearchSchema.parse(query), pageSize);

  it('gives a page at a time, newest first, and the number in all', async () => {
    const first = await list({});
    const second = await list({ page: '2' });
    expect(first.total).toBe(made.length);
    expect(first.rows).toHaveLength(SELLER_MACHINES_PAGE_SIZE);
    expect(second.rows).toHaveLength(2);
    expect([...first.rows, ...second.rows].map((m) => m.id)).toEqual([...made].reverse());
    expect((await list({ page: '3' })).rows).toEqual([]);
    expect((await list({}, 8)).rows).toHaveLength(8);
  });

  it('shows each machine with its latest inspection, and none where none was asked for', async () => {
    const { rows } = await list({ q: 'SM-' }, 100);
    const status = new Map(rows.map((m) => [m.id, m.inspectionStatus]));
    expect(status.get(made[3]!)).toBe('booked');
    expect(status.get(made[4]!)).toBe('requested');
    expect(status.get(made[5]!)).toBeNull();
  });

  it('finds the seller’s own machines by maker or model only', async () => {
    const { rows, total } = await list({ q: 'halvorn' });
    expect(total).toBe(1);
    expect(rows.map((m) => m.model)).toEqual(['SM-3']);
    expect((await list({ q: 'Corvane SM-1' })).rows.map((m) => m.model).sort()).toEqual(['SM-1', 'SM-10', 'SM-11', 'SM-12', 'SM-13', 'SM-14', 'SM-15', 'SM-16', 'SM-17', 'SM-18', 'SM-19']);
  });
});
