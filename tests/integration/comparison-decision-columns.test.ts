// The comparison table's decision columns against the real database: landed cost, deal-breakers,
// inclusions value, days listed and report age. The figures the database triggers store and the SQL
// adds per reader are checked against lib/decision computing the same from the facts the report page
// reads (findReportDecisionFacts), so the table and the report page agree for every reader.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq, sql } from 'drizzle-orm';
import { NextRequest } from 'next/server';
import { closeDatabase, db } from '@/db/client';
import { buyerShopProfiles, comparisonEntries, machineInclusions, machineMovingSheets, machines, reportAccessGrants, surveys } from '@/db/schema';
import { findReportDecisionFacts } from '@/db/queries/report-decision';
import { findReportValidityDays } from '@/db/queries/report-settings';
import { insertDraftReport, releaseDraftReport } from '@/db/queries/report-writes';
import { demoSurvey } from '@/db/seed/demo-survey';
import { seededRandom } from '@/db/seed/random';
import type { Actor } from '@/lib/auth/operation';
import type { ComparisonPage, ComparisonRow } from '@/lib/comparison/comparison-row';
import { converterMinorFor, tableLandedCost, TABLE_RIGGING_DISTANCE_KM } from '@/lib/comparison/landed-cost-basis';
import { valueInclusions } from '@/lib/decision/inclusions-value';
import type { SupplySpec } from '@/lib/decision/phase-converter';
import { daysOnMarket, reportCurrency } from '@/lib/decision/report-currency';
import { DEMO_RIGGING_RATES, estimateRigging, SITE_ACCESS, type SiteAccess } from '@/lib/decision/rigging-estimate';
import { scoreSurvey, SURVEY_FORMAT_VERSION } from '@/lib/scoring';
import { createAccount, type TestAccount } from '../support/accounts';
import { createInspection, createMachine } from '../support/workflow-fixtures';

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock('@/lib/auth/current-actor', () => ({ currentActor: async () => session.actor, currentClientIp: async () => '198.51.100.7' }));
vi.mock('next/cache', async (importOriginal) => ({ ...(await importOriginal<typeof import('next/cache')>()), revalidatePath: () => undefined }));

const { GET: listRoute } = await import('@/app/api/compare/route');

const DAY_MS = 86_400_000;
const MAKER = `Dcsn${randomUUID().slice(0, 6)}`;
const isoDaysAgo = (days: number) => new Date(Date.now() - days * DAY_MS).toISOString().slice(0, 10);

type Plan = {
  model: string;
  price: number | null;
  motorKw: string | null;
  voltage: number;
  phases: 1 | 3;
  listedDaysAgo: number;
  inspectedDaysAgo: number;
  dealBreakers: Array<'crackedCasting' | 'growlingSpindleBearings' | 'brokenGearTeeth' | 'motorCannotRunOnSupply'>;
  moving: { weightKg: number; siteAccess: SiteAccess } | null;
  inclusions: Array<{ description: string; condition: 'good' | 'usable' | 'worn' | 'missing'; cost: number | null }>;
};

// Invented machines covering each branch: three-phase small and large motors, single-phase, no price,
// no motor power, no moving sheet, no inclusions, a heavy machine upstairs, and a stale report.
const PLAN: Plan[] = [
  {
    model: 'P1-three-phase',
    price: 640_000,
    motorKw: '2.20',
    voltage: 400,
    phases: 3,
    listedDaysAgo: 40,
    inspectedDaysAgo: 30,
    dealBreakers: [],
    moving: { weightKg: 1_800, siteAccess: 'narrow-door-or-steps' },
    inclusions: [
      { description: 'Three-jaw chuck', condition: 'good', cost: 45_000 },
      { description: 'Digital readout', condition: 'missing', cost: 110_000 },
      { description: 'Manuals', condition: 'worn', cost: 6_000 },
      { description: 'Steady rest', condition: 'usable', cost: null },
    ],
  },
  {
    model: 'P2-single-phase',
    price: 380_000,
    motorKw: '1.10',
    voltage: 230,
    phases: 1,
    listedDaysAgo: 5,
    inspectedDaysAgo: 3,
    dealBreakers: ['crackedCasting', 'brokenGearTeeth'],
    moving: null,
    inclusions: [],
  },
  {
    model: 'P3-heavy-stale',
    price: 990_000,
    motorKw: '7.50',
    voltage: 400,
    phases: 3,
    listedDaysAgo: 250,
    inspectedDaysAgo: 200,
    dealBreakers: ['growlingSpindleBearings'],
    moving: { weightKg: 4_200, siteAccess: 'upper-floor-or-basement' },
    inclusions: [
      { description: 'Four-jaw chuck', condition: 'good', cost: 60_001 },
      { description: 'Faceplate', condition: 'usable', cost: 25_003 },
    ],
  },
  {
    model: 'P4-offers-no-motor',
    price: null,
    motorKw: null,
    voltage: 400,
    phases: 3,
    listedDaysAgo: 12,
    inspectedDaysAgo: 10,
    dealBreakers: [],
    moving: { weightKg: 950, siteAccess: 'ground-level-wide' },
    inclusions: [{ description: 'Collets', condition: 'missing', cost: 70_000 }],
  },
];

let seller: TestAccount;
let dealer: TestAccount;
let adminNoShop: TestAccount;
let adminSinglePhase: TestAccount;
let adminThreePhase: TestAccount;
const made = new Map<string, { reportId: number; machineId: number }>();
const SHOPS: Array<[string, () => TestAccount, SupplySpec | null]> = [
  ['no shop supply', () => adminNoShop, null],
  ['a 230 V single-phase shop', () => adminSinglePhase, { voltage: 230, phases: 1 }],
  ['a 400 V three-phase shop', () => adminThreePhase, { voltage: 400, phases: 3 }],
];

async function list(actor: TestAccount, query: Record<string, string>) {
  session.actor = actor.actor;
  const response = await listRoute(new NextRequest(new URL(`/api/compare?${new URLSearchParams({ q: MAKER, ...query })}`, 'http://localhost:3000')), {
    params: Promise.resolve({}),
  });
  const body = (await response.json()) as { ok: true; data: ComparisonPage } | { ok: false; code: string; fieldErrors?: Record<string, string[]> };
  return { status: response.status, body };
}

async function rows(actor: TestAccount, query: Record<string, string> = {}): Promise<ComparisonRow[]> {
  const { status, body } = await list(actor, query);
  if (!body.ok) throw new Error(`${status} ${JSON.stringify(body)}`);
  return body.data.rows;
}
const models = (list: ComparisonRow[]) => list.map((r) => r.model.replace(/-.*/, ''));

/** A survey with the plan's deal-breakers and inspection day, scored and released through the real path. */
async function releaseFor(plan: Plan, machineId: number, inspectorId: string, reviewerId: string) {
  const inspectionId = await createInspection(machineId, seller.id, 'in_review', inspectorId);
  const [machine] = await db.select().from(machines).where(eq(machines.id, machineId));
  const base = demoSurvey(machine!, { wear: 0.3, random: seededRandom(inspectionId), inspectedOn: isoDaysAgo(plan.inspectedDaysAgo) });
  const survey = plan.dealBreakers.length ? { ...base, dealBreakers: Object.fromEntries(plan.dealBreakers.map((id) => [id, { present: true, note: `${id} seen` }])) } : base;
  await db.insert(surveys).values({ inspectionId, formatVersion: SURVEY_FORMAT_VERSION, version: 5, data: survey, submittedAt: new Date() });
  const result = scoreSurvey(survey);
  const { reportId } = await db.transaction((tx) => insertDraftReport(tx, { inspectionId, machineId, surveyVersion: 5, inspectorId, result }));
  await db.transaction((tx) => releaseDraftReport(tx, { reportId, reviewerId, sellerId: seller.id }));
  return reportId;
}

/** The landed cost the report page starts from for this report and shop, computed by lib/decision. */
async function reportPageLandedCost(reportId: number, shop: SupplySpec | null) {
  const facts = (await findReportDecisionFacts(reportId))!;
  const missing = facts.inclusions.length === 0 ? null : facts.inclusions.filter((i) => i.condition === 'missing' && i.currency === facts.currency).reduce((s, i) => s + (i.replacementCostMinor ?? 0), 0);
  return tableLandedCost(
    {
      currency: facts.currency,
      askingPriceMinor: facts.askingPriceMinor,
      repairsMinor: facts.repairEstimateMinor,
      missingToolingMinor: missing,
      weightKg: facts.movingSheet?.weightKg ?? null,
      siteAccess: facts.movingSheet?.siteAccess ?? 'ground-level-wide',
      nameplate: facts.nameplate ? { ...facts.nameplate, motorKw: facts.result.machine.motorPowerKw ?? facts.motorKw } : null,
    },
    shop,
  );
}

describe('the comparison table’s decision columns', () => {
  beforeAll(async () => {
    [seller, dealer, adminNoShop, adminSinglePhase, adminThreePhase] = await Promise.all([
      createAccount('seller'),
      createAccount('dealer'),
      createAccount('admin'),
      createAccount('admin'),
      createAccount('admin'),
    ]);
    await db.insert(buyerShopProfiles).values([
      { userId: adminSinglePhase.id, supplyVoltage: 230, supplyPhases: 1 },
      { userId: adminThreePhase.id, supplyVoltage: 400, supplyPhases: 3 },
    ]);
    const inspector = await createAccount('inspector');
    for (const plan of PLAN) {
      const machineId = await createMachine(seller.id, {
        maker: MAKER,
        model: plan.model,
        askingPriceMinor: plan.price,
        motorKw: plan.motorKw,
        supplyVoltage: plan.voltage,
        supplyPhases: plan.phases,
        createdAt: new Date(Date.now() - plan.listedDaysAgo * DAY_MS),
      });
      if (plan.moving) await db.insert(machineMovingSheets).values({ machineId, ...plan.moving });
      if (plan.inclusions.length) {
        await db.insert(machineInclusions).values(plan.inclusions.map((i) => ({ machineId, kind: 'other' as const, description: i.description, condition: i.condition, replacementCostMinor: i.cost })));
      }
      made.set(plan.model, { machineId, reportId: await releaseFor(plan, machineId, inspector.id, adminNoShop.id) });
    }
  });
  afterAll(closeDatabase);

  describe('landed cost', () => {
    for (const [who, account, shop] of SHOPS) {
      it(`matches the report page’s landed cost for a reader with ${who}`, async () => {
        const table = await rows(account());
        expect(table).toHaveLength(PLAN.length);
        for (const row of table) {
          const expected = await reportPageLandedCost(row.reportId, shop);
          expect({ model: row.model, total: row.landedCostMinor }).toEqual({ model: row.model, total: expected.total.amountMinor });
          expect(row.landedCostNotKnown.length > 0).toBe(expected.notKnown.length > 0);
        }
      });
    }

    it('adds the converter a three-phase machine needs on a single-phase shop and nothing where the machine runs as is', async () => {
      const single = await rows(adminSinglePhase, { sort: 'swing' });
      const none = await rows(adminNoShop, { sort: 'swing' });
      const three = await rows(adminThreePhase, { sort: 'swing' });
      const by = (list: ComparisonRow[], model: string) => list.find((r) => r.model === model)!;
      // 2.2 kW × 1.5 = 3.3 kW → the 4 kW size, €1,400 (lib/decision/phase-converter.ts demo table).
      expect(by(single, 'P1-three-phase').landedCostMinor! - by(none, 'P1-three-phase').landedCostMinor!).toBe(140_000);
      // 7.5 kW × 1.5 = 11.25 kW → the 15 kW size, €3,800.
      expect(by(single, 'P3-heavy-stale').landedCostMinor! - by(none, 'P3-heavy-stale').landedCostMinor!).toBe(380_000);
      // A single-phase 230 V machine runs on a 400 V three-phase shop (230 V phase to neutral) and on a 230 V single-phase one.
      expect(by(three, 'P2-single-phase').landedCostMinor).toBe(by(none, 'P2-single-phase').landedCostMinor);
      expect(by(three, 'P2-single-phase').landedCostNotKnown).not.toContain('phase converter');
      expect(by(none, 'P2-single-phase').landedCostNotKnown).toContain('phase converter');
      // No motor power: the converter's size is not known, so it is left out and said so.
      expect(by(single, 'P4-offers-no-motor').landedCostNotKnown).toEqual(expect.arrayContaining(['asking price', 'phase converter']));
    });

    it('stores rigging at the stated distance exactly as estimateRigging prices it with the demo rates', async () => {
      for (const siteAccess of SITE_ACCESS) {
        for (const weightKg of [1, 950, 1_234, 3_500, 3_501, 4_200, 12_345]) {
          const [row] = (await db.execute(sql`select comparison_rigging_minor(${weightKg}, ${siteAccess}) as minor`)) as unknown as [Array<{ minor: number }>];
          const expected = estimateRigging({ weightKg, distanceKm: TABLE_RIGGING_DISTANCE_KM, siteAccess }, DEMO_RIGGING_RATES).total.amountMinor;
          expect({ weightKg, siteAccess, minor: Number(row[0]!.minor) }).toEqual({ weightKg, siteAccess, minor: expected });
        }
      }
    });

    it('agrees with the side-by-side page’s converter for every machine and shop', async () => {
      const stored = await db.select().from(comparisonEntries).where(eq(comparisonEntries.maker, MAKER));
      for (const [, account, shop] of SHOPS) {
        const table = await rows(account());
        for (const entry of stored) {
          const row = table.find((r) => r.reportId === entry.reportId)!;
          expect(row.landedCostMinor).toBe(entry.landedBaseMinor + (converterMinorFor(entry, shop) ?? 0));
        }
      }
    });

    it('sorts and filters by landed cost for the reader’s own figure', async () => {
      const asc = await rows(adminSinglePhase, { sort: 'landed', dir: 'asc' });
      const figures = asc.map((r) => r.landedCostMinor!);
      expect(figures).toEqual([...figures].sort((a, b) => a - b));
      const desc = await rows(adminSinglePhase, { sort: 'landed', dir: 'desc' });
      expect(models(desc)).toEqual(models(asc).reverse());
      const [low, high] = [figures[1]! / 100, figures[2]! / 100];
      const ranged = await rows(adminSinglePhase, { landedMin: String(Math.ceil(low)), landedMax: String(Math.floor(high)), sort: 'landed', dir: 'asc' });
      expect(ranged.map((r) => r.reportId)).toEqual(asc.filter((r) => r.landedCostMinor! >= Math.ceil(low) * 100 && r.landedCostMinor! <= Math.floor(high) * 100).map((r) => r.reportId));
    });
  });

  describe('inclusions value', () => {
    it('values each listed item at its condition’s share, as the report page does, and is blank when nothing is listed', async () => {
      const table = await rows(adminNoShop);
      for (const plan of PLAN) {
        const row = table.find((r) => r.model === plan.model)!;
        const expected = plan.inclusions.length
          ? valueInclusions(
              plan.inclusions.map((i) => ({ description: i.description, condition: i.condition, replacementCost: i.cost === null ? null : { amountMinor: i.cost, currency: 'EUR' } })),
              'EUR',
            ).value.amountMinor
          : null;
        expect({ model: plan.model, value: row.inclusionsValueMinor }).toEqual({ model: plan.model, value: expected });
      }
      // 60 % of 450.00 + 20 % of 60.00 (common practice shares in lib/decision/inclusions-value.ts); the missing and unpriced add nothing.
      expect(table.find((r) => r.model === 'P1-three-phase')!.inclusionsValueMinor).toBe(27_000 + 1_200);
    });

    it('sorts with the blanks last and filters a range in whole euros', async () => {
      const desc = await rows(adminNoShop, { sort: 'inclusions', dir: 'desc' });
      expect(desc.map((r) => r.inclusionsValueMinor)).toEqual([46_002, 28_200, 0, null]);
      const ranged = await rows(adminNoShop, { inclusionsMin: '100', inclusionsMax: '300' });
      expect(models(ranged)).toEqual(['P1']);
    });

    it('follows the seller’s edits to inclusions and the moving sheet through the triggers', async () => {
      const { machineId, reportId } = made.get('P4-offers-no-motor')!;
      const before = (await rows(adminNoShop)).find((r) => r.reportId === reportId)!;
      const [item] = await db.insert(machineInclusions).values({ machineId, kind: 'chuck', description: 'Three-jaw chuck', condition: 'good', replacementCostMinor: 10_000 }).$returningId();
      await db.update(machineMovingSheets).set({ weightKg: 1_950 }).where(eq(machineMovingSheets.machineId, machineId));
      const after = (await rows(adminNoShop)).find((r) => r.reportId === reportId)!;
      expect(after.inclusionsValueMinor).toBe(6_000);
      const riggingDelta =
        estimateRigging({ weightKg: 1_950, distanceKm: TABLE_RIGGING_DISTANCE_KM, siteAccess: 'ground-level-wide' }, DEMO_RIGGING_RATES).total.amountMinor -
        estimateRigging({ weightKg: 950, distanceKm: TABLE_RIGGING_DISTANCE_KM, siteAccess: 'ground-level-wide' }, DEMO_RIGGING_RATES).total.amountMinor;
      expect(after.landedCostMinor! - before.landedCostMinor!).toBe(riggingDelta);
      await db.delete(machineInclusions).where(eq(machineInclusions.id, item!.id));
      await db.update(machineMovingSheets).set({ weightKg: 950 }).where(eq(machineMovingSheets.machineId, machineId));
      expect((await rows(adminNoShop)).find((r) => r.reportId === reportId)!.landedCostMinor).toBe(before.landedCostMinor);
    });

    it('follows an asking-price change', async () => {
      const { machineId, reportId } = made.get('P1-three-phase')!;
      const before = (await rows(adminNoShop)).find((r) => r.reportId === reportId)!;
      await db.update(machines).set({ askingPriceMinor: 600_000 }).where(eq(machines.id, machineId));
      const after = (await rows(adminNoShop)).find((r) => r.reportId === reportId)!;
      expect(after.landedCostMinor! - before.landedCostMinor!).toBe(-40_000);
      await db.update(machines).set({ askingPriceMinor: 640_000 }).where(eq(machines.id, machineId));
    });
  });

  describe('deal-breakers', () => {
    it('counts them for everyone and names them only with the report', async () => {
      const summary = await rows(dealer, { sort: 'swing' });
      expect(summary.map((r) => [r.model, r.dealBreakerCount, r.dealBreakers])).toEqual(
        expect.arrayContaining([
          ['P2-single-phase', 2, []],
          ['P3-heavy-stale', 1, []],
          ['P1-three-phase', 0, []],
        ]),
      );
      const full = await rows(adminNoShop);
      expect(full.find((r) => r.model === 'P2-single-phase')!.dealBreakers).toEqual([
        { id: 'crackedCasting', label: 'Cracked casting (bed, headstock, apron or gearbox)' },
        { id: 'brokenGearTeeth', label: 'Broken gear teeth' },
      ]);
      await db.insert(reportAccessGrants).values({ reportId: made.get('P3-heavy-stale')!.reportId, userId: dealer.id, reason: 'purchase' });
      expect((await rows(dealer)).find((r) => r.model === 'P3-heavy-stale')!.dealBreakers.map((d) => d.label)).toEqual(['Growling spindle bearings']);
    });

    it('filters "none" and "any" and sorts by the count', async () => {
      expect(models(await rows(dealer, { dealBreakers: 'none', sort: 'swing' })).sort()).toEqual(['P1', 'P4']);
      expect(models(await rows(dealer, { dealBreakers: 'any', sort: 'dealBreakers', dir: 'desc' }))).toEqual(['P2', 'P3']);
      const asc = await rows(dealer, { sort: 'dealBreakers', dir: 'asc' });
      expect(asc.map((r) => r.dealBreakerCount)).toEqual([0, 0, 1, 2]);
    });
  });

  describe('days listed and report age', () => {
    it('counts whole UTC days as the report page does and marks reports past their current period', async () => {
      const validity = await findReportValidityDays();
      const now = new Date();
      for (const row of await rows(dealer)) {
        const plan = PLAN.find((p) => p.model === row.model)!;
        expect(row.daysListed).toBe(daysOnMarket(new Date(now.getTime() - plan.listedDaysAgo * DAY_MS), now));
        const expected = reportCurrency(new Date(`${isoDaysAgo(plan.inspectedDaysAgo)}T00:00:00Z`), now, validity);
        expect({ model: row.model, age: row.reportAgeDays, until: row.validUntil, stale: row.stale }).toEqual({ model: row.model, age: expected.ageDays, until: expected.validUntil, stale: expected.stale });
      }
      expect((await rows(dealer)).find((r) => r.model === 'P3-heavy-stale')!.stale).toBe(validity < 200);
    });

    it('filters day ranges with both ends included', async () => {
      expect(models(await rows(dealer, { daysListedMin: '12', daysListedMax: '40', sort: 'daysListed', dir: 'asc' }))).toEqual(['P4', 'P1']);
      expect(models(await rows(dealer, { daysListedMax: '4' }))).toEqual([]);
      expect(models(await rows(dealer, { reportAgeMin: '3', reportAgeMax: '10', sort: 'reportAge', dir: 'asc' }))).toEqual(['P2', 'P4']);
      expect(models(await rows(dealer, { reportAgeMin: '31' }))).toEqual(['P3']);
    });

    it('sorts fewest days first in ascending order', async () => {
      expect(models(await rows(dealer, { sort: 'daysListed', dir: 'asc' }))).toEqual(['P2', 'P4', 'P1', 'P3']);
      expect(models(await rows(dealer, { sort: 'daysListed', dir: 'desc' }))).toEqual(['P3', 'P1', 'P4', 'P2']);
      expect(models(await rows(dealer, { sort: 'reportAge', dir: 'asc' }))).toEqual(['P2', 'P4', 'P1', 'P3']);
    });

    it('dates the report from the inspection day in the result, not the booking or the release', async () => {
      expect((await rows(dealer)).find((r) => r.model === 'P3-heavy-stale')!.inspectedOn).toBe(isoDaysAgo(200));
    });
  });

  describe('allow-list', () => {
    const refusals: Array<[string, Record<string, string>, string]> = [
      ['a landed-cost bound that is not a number', { landedMin: '1 OR 1=1' }, 'landedMin'],
      ['a landed-cost range upside down', { landedMin: '9000', landedMax: '100' }, 'landedMax'],
      ['an inclusions bound below zero', { inclusionsMin: '-5' }, 'inclusionsMin'],
      ['a deal-breaker choice off the list', { dealBreakers: 'some' }, 'dealBreakers'],
      ['a deal-breaker choice with SQL after it', { dealBreakers: "none' OR '1'='1" }, 'dealBreakers'],
      ['days listed in fractions', { daysListedMin: '2.5' }, 'daysListedMin'],
      ['a report age range upside down', { reportAgeMin: '100', reportAgeMax: '10' }, 'reportAgeMax'],
      ['a report age beyond a century', { reportAgeMax: '99999' }, 'reportAgeMax'],
      ['the stored column name instead of the sort key', { sort: 'deal_breaker_count' }, 'sort'],
      ['the landed-cost column name', { sort: 'landed_base_minor' }, 'sort'],
    ];
    for (const [what, query, field] of refusals) {
      it(`refuses ${what} with 400 naming the field`, async () => {
        const { status, body } = await list(dealer, query);
        expect(status).toBe(400);
        if (body.ok) throw new Error('accepted');
        expect(body.code).toBe('invalid_input');
        expect(Object.keys(body.fieldErrors ?? {})).toContain(field);
      });
    }
  });
});
