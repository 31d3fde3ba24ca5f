// Coordinators' market data against the real database: one sale typed in, a CSV import that keeps
// the good rows and reports the bad ones by line, and a file with no good row that changes nothing.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { count, like } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { comparableSales } from '@/db/schema';
import type { Actor } from '@/lib/auth/operation';
import { createAccount, type TestAccount } from '../support/accounts';

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock('@/lib/auth/current-actor', () => ({ currentActor: async () => session.actor, currentClientIp: async () => '198.51.100.9' }));
vi.mock('next/cache', async (importOriginal) => ({ ...(await importOriginal<typeof import('next/cache')>()), revalidatePath: () => undefined }));

const { importComparableSalesAction, recordComparableSaleAction } = await import('@/app/(backoffice)/admin/market/actions');

// A word only this run's sales carry, so counts ignore the demo data and earlier runs.
const MARK = `Mkt${randomUUID().slice(0, 6)}`;
const HEADER = 'description,swing_mm,between_centres_mm,year_built,condition,sale_kind,price,currency,sold_on,region,source';
const onRecord = async () => (await db.select({ n: count() }).from(comparableSales).where(like(comparableSales.description, `%${MARK}%`)))[0]!.n;

let admin: TestAccount;

describe('market data', () => {
  beforeAll(async () => {
    admin = await createAccount('admin');
  });
  afterAll(closeDatabase);

  it('records one sale typed in, price in whole units stored as minor units', async () => {
    session.actor = admin.actor;
    const result = await recordComparableSaleAction({ description: `${MARK} Corvane CL-330 1999`, swingMm: '330', saleKind: 'auction', price: '7400', soldOn: '2025-06-02', currency: 'eur' });
    expect(result).toMatchObject({ ok: true });
    const [row] = await db.select().from(comparableSales).where(like(comparableSales.description, `${MARK} Corvane%`));
    expect(row).toMatchObject({ swingMm: 330, priceMinor: 740_000, currency: 'EUR', saleKind: 'auction', soldOn: '2025-06-02' });
  });

  it('refuses a sale with bad fields and names each one', async () => {
    session.actor = admin.actor;
    const result = await recordComparableSaleAction({ description: `${MARK} x`, swingMm: '12', saleKind: 'barter', price: '-5', soldOn: '2999-01-01' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.fieldErrors ?? {}).sort()).toEqual(['price', 'saleKind', 'soldOn', 'swingMm']);
  });

  it('imports the good rows of a CSV and reports the rejected ones by line', async () => {
    session.actor = admin.actor;
    const before = await onRecord();
    const csv = [
      HEADER,
      `${MARK} Oldreth T400 1984,400,1000,1984,Fair,private,5200,EUR,2025-02-11,Brenmark,`,
      `${MARK} Vantor Meridian 360,360,,2001,Superb,dealer_retail,9900,EUR,2025-03-01,,`,
      `${MARK} Ambrell Series 5/460,460,1500,1995,Good,liquidation,6100,EUR,2025-04-20,Saltmarch,Closing sale list`,
      `${MARK} no price,330,,,,auction,,EUR,2025-05-01,,`,
    ].join('\n');
    const result = await importComparableSalesAction({ csv });
    if (!result.ok) throw new Error(JSON.stringify(result));
    expect(result.data.imported).toBe(2);
    expect(result.data.rejected.map((r) => r.line)).toEqual([3, 5]);
    expect(result.data.rejected[0]!.errors.join(' ')).toMatch(/^condition:/);
    expect(result.data.rejected[1]!.errors.join(' ')).toMatch(/^price:/);
    expect((await onRecord()) - before).toBe(2);
  });

  it('refuses a file without a single good row, changing nothing', async () => {
    session.actor = admin.actor;
    const before = await onRecord();
    const result = await importComparableSalesAction({ csv: `${HEADER}\n${MARK} bad,abc,,,,auction,1,EUR,2025-01-01,,` });
    expect(result).toMatchObject({ ok: false, code: 'invalid_input' });
    if (!result.ok) expect(result.fieldErrors?.['line 2']?.[0]).toMatch(/swing_mm/);
    expect(await onRecord()).toBe(before);
  });

  it('lets only coordinators change market data', async () => {
    session.actor = (await createAccount('dealer')).actor;
    const result = await importComparableSalesAction({ csv: `${HEADER}\n${MARK} a,330,,,,auction,1000,EUR,2025-01-01,,` });
    expect(result).toMatchObject({ ok: false, code: 'forbidden' });
  });
});
