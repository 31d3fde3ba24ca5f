// The comparison table's API against the real database: its allow-list refuses unknown columns and
// injection strings with 400, and its filters, sorts and detail rules give exactly the right rows.
// The machines here are released through the real release path, so the database triggers that keep
// comparison_entries are exercised too.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { count, eq } from 'drizzle-orm';
import { NextRequest } from 'next/server';
import Papa from 'papaparse';
import { closeDatabase, db } from '@/db/client';
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from '@/db/schema';
import { comparisonEntries, machines, reportAccessGrants, reports } from '@/db/schema';
import { loadComparisonViewer } from '@/db/queries/comparison';
import { releaseDraftReport } from '@/db/queries/report-writes';
import type { Actor } from '@/lib/auth/operation';
import type { ComparisonPage } from '@/lib/comparison/comparison-row';
import { createAccount, type TestAccount } from '../support/accounts';
import { createInspection, createMachine, createSubmittedSurvey } from '../support/workflow-fixtures';

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock('@/lib/auth/current-actor', () => ({ currentActor: async () => session.actor, currentClientIp: async () => '198.51.100.7' }));
vi.mock('next/cache', async (importOriginal) => ({ ...(await importOriginal<typeof import('next/cache')>()), revalidatePath: () => undefined }));

const { GET: listRoute } = await import('@/app/api/compare/route');
const { GET: exportRoute } = await import('@/app/api/compare/export/route');
const { createShortlistAction } = await import('@/app/(backoffice)/compare/actions');

// A maker name no other test or demo machine has, so a search isolates this file's machines.
const MAKER = `Cmpq${randomUUID().slice(0, 6)}`;
const PLAN = [
  { model: 'A-280', swingMm: 280, price: 410_000, wear: 0.1 },
  { model: 'B-330', swingMm: 330, price: 620_000, wear: 0.5 },
  { model: 'C-360', swingMm: 360, price: 380_000, wear: 0.9 },
  { model: 'D-430', swingMm: 430, price: 990_000, wear: 0.3 },
] as const;

let seller: TestAccount;
let dealer: TestAccount;
let otherDealer: TestAccount;
let admin: TestAccount;
let made: Array<{ model: string; swingMm: number; price: number; reportId: number; machineId: number; inspectionId: number }>;

async function call(route: (request: NextRequest) => Promise<Response>, actor: TestAccount | null, query: Record<string, string> | string) {
  session.actor = actor?.actor ?? null;
  const search = typeof query === 'string' ? query : new URLSearchParams(query).toString();
  const response = await route(new NextRequest(new URL(`/api/compare?${search}`, 'http://localhost:3000')));
  return response;
}

async function list(actor: TestAccount | null, query: Record<string, string> | string) {
  const response = await call((r) => listRoute(r, { params: Promise.resolve({}) }), actor, query);
  const body = (await response.json()) as { ok: true; data: ComparisonPage } | { ok: false; code: string; fieldErrors?: Record<string, string[]> };
  return { status: response.status, body };
}

const mine = (extra: Record<string, string> = {}) => ({ q: MAKER, ...extra });
const models = (page: ComparisonPage) => page.rows.map((r) => r.model);

describe('the comparison table API', () => {
  beforeAll(async () => {
    [seller, dealer, otherDealer, admin] = await Promise.all([createAccount('seller'), createAccount('dealer'), createAccount('dealer'), createAccount('admin')]);
    const inspector = await createAccount('inspector');
    made = [];
    for (const plan of PLAN) {
      const machineId = await createMachine(seller.id, { maker: MAKER, model: plan.model, swingMm: plan.swingMm, askingPriceMinor: plan.price, region: 'Saltmarch' });
      const inspectionId = await createInspection(machineId, seller.id, 'in_review', inspector.id);
      const draft = await createSubmittedSurvey(inspectionId, plan.wear);
      await db.transaction((tx) => releaseDraftReport(tx, { reportId: draft.reportId, reviewerId: admin.id, sellerId: seller.id }));
      made.push({ ...plan, reportId: draft.reportId, machineId, inspectionId });
    }
  });
  afterAll(closeDatabase);

  describe('allow-list', () => {
    const refusals: Array<[string, Record<string, string>, string]> = [
      ['an unknown sort column', { sort: 'password_hash' }, 'sort'],
      ['a real column that is not on the allow-list', { sort: 'seller_id' }, 'sort'],
      ['a sort with SQL after it', { sort: 'swing; DROP TABLE machines' }, 'sort'],
      ['a sort direction that is not asc or desc', { dir: 'asc, (select 1)' }, 'dir'],
      ['an unknown filter', { seller_id: 'x' }, '_'],
      ['a quoted search', { q: "x' OR '1'='1" }, 'q'],
      ['a comment marker in a search', { q: 'Corvane -- ' }, 'q'],
      ['a statement in a region', { region: "Brenmark'; DROP TABLE reports; --" }, 'region'],
      ['a grade outside the scale', { condition: "Good' OR 1=1" }, 'condition'],
      ['a subsystem grade outside the scale', { 'grade.bed': 'Good,Mint' }, 'grade.bed'],
      ['a range bound that is not a number', { swingMin: '1 OR 1=1' }, 'swingMin'],
      ['a range upside down', { swingMin: '400', swingMax: '300' }, 'swingMax'],
      ['a page size off the list', { pageSize: '100000' }, 'pageSize'],
      ['a date that is not a date', { releasedFrom: "2025-01-01' --" }, 'releasedFrom'],
    ];
    for (const [what, query, field] of refusals) {
      it(`refuses ${what} with 400 naming the field`, async () => {
        const { status, body } = await list(dealer, query);
        expect(status).toBe(400);
        expect(body.ok).toBe(false);
        if (body.ok) return;
        expect(body.code).toBe('invalid_input');
        const fields = Object.keys(body.fieldErrors ?? {});
        expect(field === '_' ? fields.length : fields).toEqual(field === '_' ? 1 : expect.arrayContaining([field]));
      });
    }

    it('leaves the tables in place after the refused strings', async () => {
      const [row] = await db.select({ n: count() }).from(machines);
      expect(row!.n).toBeGreaterThanOrEqual(PLAN.length);
    });

    it('refuses the same strings on the CSV export', async () => {
      const response = await call(exportRoute, dealer, { sort: 'password_hash' });
      expect(response.status).toBe(400);
    });

    it('asks signed-out visitors to sign in and refuses buyers', async () => {
      expect((await list(null, mine())).status).toBe(401);
      expect((await list(await createAccount('buyer'), mine())).status).toBe(403);
    });
  });

  describe('filters and sorts', () => {
    it('finds exactly the released machines of a search', async () => {
      const { status, body } = await list(dealer, mine({ sort: 'swing', dir: 'asc' }));
      expect(status).toBe(200);
      if (!body.ok) throw new Error(JSON.stringify(body));
      expect(body.data.total).toBe(PLAN.length);
      expect(models(body.data)).toEqual(['A-280', 'B-330', 'C-360', 'D-430']);
    });

    it('filters a swing range, both ends included', async () => {
      const { body } = await list(dealer, mine({ swingMin: '330', swingMax: '360', sort: 'swing', dir: 'asc' }));
      if (!body.ok) throw new Error(JSON.stringify(body));
      expect(models(body.data)).toEqual(['B-330', 'C-360']);
    });

    it('filters an asking-price range given in whole euros', async () => {
      const { body } = await list(dealer, mine({ priceMin: '4000', priceMax: '6200', sort: 'price', dir: 'asc' }));
      if (!body.ok) throw new Error(JSON.stringify(body));
      expect(models(body.data)).toEqual(['A-280', 'B-330']);
    });

    it('sorts by asking price both ways', async () => {
      const asc = await list(dealer, mine({ sort: 'price', dir: 'asc' }));
      const desc = await list(dealer, mine({ sort: 'price', dir: 'desc' }));
      if (!asc.body.ok || !desc.body.ok) throw new Error('refused');
      expect(models(asc.body.data)).toEqual(['C-360', 'A-280', 'B-330', 'D-430']);
      expect(models(desc.body.data)).toEqual(['D-430', 'B-330', 'A-280', 'C-360']);
    });

    it('sorts by a subsystem score and filters by its grades as stored with the report', async () => {
      const { body } = await list(dealer, mine({ sort: 'bed', dir: 'desc' }));
      if (!body.ok) throw new Error('refused');
      const scores = body.data.rows.map((r) => r.subsystems.bed.score ?? -1);
      expect(scores).toEqual([...scores].sort((a, b) => b - a));
      const grade = body.data.rows[0]!.subsystems.bed.grade!;
      const filtered = await list(dealer, mine({ 'grade.bed': grade }));
      if (!filtered.body.ok) throw new Error('refused');
      expect(filtered.body.data.rows.length).toBeGreaterThan(0);
      expect(filtered.body.data.rows.every((r) => r.subsystems.bed.grade === grade)).toBe(true);
    });

    it('filters the overall condition as a multi-select', async () => {
      const all = await list(dealer, mine());
      if (!all.body.ok) throw new Error('refused');
      const grades = [...new Set(all.body.data.rows.map((r) => r.overallCondition))].slice(0, 2);
      const { body } = await list(dealer, mine({ condition: grades.join(',') }));
      if (!body.ok) throw new Error('refused');
      expect(body.data.total).toBe(all.body.data.rows.filter((r) => grades.includes(r.overallCondition)).length);
    });

    it('pages through the matches', async () => {
      const first = await list(dealer, { ...mine({ sort: 'swing', dir: 'asc' }), pageSize: '25' });
      if (!first.body.ok) throw new Error('refused');
      expect(first.body.data).toMatchObject({ page: 1, pageSize: 25, total: PLAN.length });
      const beyond = await list(dealer, { ...mine(), page: '2', pageSize: '25' });
      if (!beyond.body.ok) throw new Error('refused');
      expect(beyond.body.data.rows).toEqual([]);
      // Past the last row the page carries no count of its own: the total is still told.
      expect(beyond.body.data.total).toBe(PLAN.length);
    });
  });

  describe('what a dealer may see', () => {
    it('hides value, ratio and repairs of reports the dealer has not bought, and shows them once bought', async () => {
      const before = await list(otherDealer, mine({ sort: 'swing', dir: 'asc' }));
      if (!before.body.ok) throw new Error('refused');
      expect(before.body.data.rows.every((r) => !r.hasDetails && r.fairMarketValueMinor === null && r.priceToValue === null && r.repairEstimateMinor === null)).toBe(true);
      expect(before.body.data.rows.every((r) => r.subsystems.bed.grade !== undefined && r.overallCondition)).toBe(true);

      await db.insert(reportAccessGrants).values({ reportId: made[1]!.reportId, userId: otherDealer.id, reason: 'purchase' });
      const after = await list(otherDealer, mine({ sort: 'swing', dir: 'asc' }));
      if (!after.body.ok) throw new Error('refused');
      const bought = after.body.data.rows.find((r) => r.model === 'B-330')!;
      const [stored] = await db.select().from(reports).where(eq(reports.id, made[1]!.reportId));
      expect(bought.hasDetails).toBe(true);
      expect(bought.fairMarketValueMinor).toBe(stored!.fairMarketValueMinor);
      expect(bought.priceToValue).toBeCloseTo(620_000 / stored!.fairMarketValueMinor!, 3);
      expect(after.body.data.rows.filter((r) => r.hasDetails).map((r) => r.model)).toEqual(['B-330']);

      // A value filter can only match what the dealer may see.
      const valued = await list(otherDealer, mine({ valueMin: '0' }));
      if (!valued.body.ok) throw new Error('refused');
      expect(valued.body.data.rows.map((r) => r.model)).toEqual(['B-330']);
    });

    it('reads every grant again when the server cuts the grant list short', async () => {
      // GROUP_CONCAT stops at group_concat_max_len; a cut list must never be read as shorter ids.
      const connection = await mysql.createConnection({ uri: process.env.DATABASE_URL!, timezone: 'Z' });
      try {
        await connection.query('SET SESSION group_concat_max_len = 4');
        const tight = drizzle(connection, { schema, mode: 'default' });
        for (const m of made.slice(2)) await db.insert(reportAccessGrants).values({ reportId: m.reportId, userId: otherDealer.id, reason: 'purchase' });
        const viewer = await loadComparisonViewer(tight, { id: otherDealer.id, role: 'dealer' });
        const wanted = [made[1]!, ...made.slice(2)].map((m) => m.inspectionId).sort((a, b) => a - b);
        expect(viewer.visibility).toEqual({ all: false, inspectionIds: expect.arrayContaining(wanted) });
        expect(viewer.visibility.all ? [] : [...viewer.visibility.inspectionIds].sort((a, b) => a - b)).toEqual(wanted);
      } finally {
        await connection.end();
      }
    });

    it('shows coordinators every figure', async () => {
      const { body } = await list(admin, mine());
      if (!body.ok) throw new Error('refused');
      expect(body.data.rows.every((r) => r.hasDetails)).toBe(true);
    });

    it('drops a withdrawn report from the table', async () => {
      const extra = await createMachine(seller.id, { maker: MAKER, model: 'W-250', swingMm: 250 });
      const inspectionId = await createInspection(extra, seller.id, 'in_review', null);
      const draft = await createSubmittedSurvey(inspectionId, 0.2);
      await db.transaction((tx) => releaseDraftReport(tx, { reportId: draft.reportId, reviewerId: admin.id, sellerId: seller.id }));
      expect(await db.select().from(comparisonEntries).where(eq(comparisonEntries.reportId, draft.reportId))).toHaveLength(1);
      await db.update(reports).set({ status: 'withdrawn', withdrawnAt: new Date() }).where(eq(reports.id, draft.reportId));
      const { body } = await list(dealer, mine());
      if (!body.ok) throw new Error('refused');
      expect(models(body.data)).not.toContain('W-250');
    });
  });

  describe('export and shortlists', () => {
    it('exports exactly the filtered machines in the table’s order', async () => {
      const response = await call(exportRoute, dealer, mine({ swingMin: '300', sort: 'swing', dir: 'desc' }));
      expect(response.status).toBe(200);
      expect(response.headers.get('content-type')).toContain('text/csv');
      const csv = Papa.parse<Record<string, string>>((await response.text()).replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: true });
      expect(csv.data.map((r) => r.Model)).toEqual(['D-430', 'C-360', 'B-330']);
      expect(csv.data.every((r) => r['Fair market value'] === '' && r.Details === 'summary only')).toBe(true);
    });

    it('filters by a shortlist only for its owner', async () => {
      session.actor = dealer.actor;
      const created = await createShortlistAction({ name: `Spring ${MAKER}`, machineIds: [made[0]!.machineId, made[3]!.machineId] });
      if (!created.ok) throw new Error(JSON.stringify(created));
      const own = await list(dealer, mine({ shortlist: String(created.data.id), sort: 'swing', dir: 'asc' }));
      if (!own.body.ok) throw new Error('refused');
      expect(models(own.body.data)).toEqual(['A-280', 'D-430']);
      const someoneElses = await list(otherDealer, mine({ shortlist: String(created.data.id) }));
      if (!someoneElses.body.ok) throw new Error('refused');
      expect(someoneElses.body.data.total).toBe(0);
    });

    it('refuses a shortlist of machines without a released report', async () => {
      session.actor = dealer.actor;
      const unreleased = await createMachine(seller.id, { maker: MAKER, model: 'U-300' });
      const result = await createShortlistAction({ name: `Unreleased ${MAKER}`, machineIds: [unreleased] });
      expect(result.ok).toBe(false);
      if (!result.ok) expect(Object.keys(result.fieldErrors ?? {})).toEqual(['machineIds']);
    });
  });
});
