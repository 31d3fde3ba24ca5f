// A provisional grade (too little measured for a firm one) is shown so wherever the grade is shown:
// the comparison table and its CSV, the catalogue, the public verify page and the buyer's overview.
// Two reports are released through the real path, one from a complete survey and one from a survey
// with two sections done, and every reader is checked for both.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq, inArray } from 'drizzle-orm';
import { NextRequest } from 'next/server';
import { closeDatabase, db } from '@/db/client';
import { comparisonEntries, machines, reports, surveys } from '@/db/schema';
import { listCatalogueReports } from '@/db/queries/reports-catalogue';
import { listRecentReleasedReports } from '@/db/queries/dashboard';
import { insertDraftReport, releaseDraftReport } from '@/db/queries/report-writes';
import { findReportByVerificationCode } from '@/db/queries/verification';
import { demoSurvey } from '@/db/seed/demo-survey';
import { seededRandom } from '@/db/seed/random';
import type { Actor } from '@/lib/auth/operation';
import type { ComparisonPage } from '@/lib/comparison/comparison-row';
import { scoreSurvey, SURVEY_FORMAT_VERSION } from '@/lib/scoring';
import { createAccount, type TestAccount } from '../support/accounts';
import { createInspection, createMachine } from '../support/workflow-fixtures';

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock('@/lib/auth/current-actor', () => ({ currentActor: async () => session.actor, currentClientIp: async () => '198.51.100.9' }));
vi.mock('next/cache', async (importOriginal) => ({ ...(await importOriginal<typeof import('next/cache')>()), revalidatePath: () => undefined }));

const { GET: listRoute } = await import('@/app/api/compare/route');
const { GET: csvRoute } = await import('@/app/api/compare/export/route');

const MAKER = `Prov${randomUUID().slice(0, 6)}`;
let seller: TestAccount;
let dealer: TestAccount;
const made: Record<'firm' | 'provisional', { reportId: number; code: string }> = {} as never;

async function release(model: string, sectionsDone: number | undefined) {
  const inspector = await createAccount('inspector');
  const machineId = await createMachine(seller.id, { maker: MAKER, model });
  const inspectionId = await createInspection(machineId, seller.id, 'in_review', inspector.id);
  const [machine] = await db.select().from(machines).where(eq(machines.id, machineId));
  const survey = demoSurvey(machine!, { wear: 0.2, random: seededRandom(inspectionId), inspectedOn: new Date().toISOString().slice(0, 10), sectionsDone });
  await db.insert(surveys).values({ inspectionId, formatVersion: SURVEY_FORMAT_VERSION, version: 3, data: survey, submittedAt: new Date() });
  const result = scoreSurvey(survey);
  const { reportId } = await db.transaction((tx) => insertDraftReport(tx, { inspectionId, machineId, surveyVersion: 3, inspectorId: inspector.id, result }));
  await db.transaction((tx) => releaseDraftReport(tx, { reportId, reviewerId: dealer.id, sellerId: seller.id }));
  const [row] = await db.select({ code: reports.verificationCode }).from(reports).where(eq(reports.id, reportId));
  return { reportId, code: row!.code, provisional: result.provisional };
}

describe('a provisional grade', () => {
  beforeAll(async () => {
    [seller, dealer] = await Promise.all([createAccount('seller'), createAccount('dealer')]);
    const firm = await release('Firm-1', undefined);
    const provisional = await release('Thin-2', 2);
    // The two surveys are what the test needs: one firm, one provisional.
    expect([firm.provisional, provisional.provisional]).toEqual([false, true]);
    made.firm = firm;
    made.provisional = provisional;
  });
  afterAll(closeDatabase);

  it('is stored as such in the comparison table, which the database triggers keep', async () => {
    const entries = await db
      .select({ reportId: comparisonEntries.reportId, provisional: comparisonEntries.overallProvisional })
      .from(comparisonEntries)
      .where(inArray(comparisonEntries.reportId, [made.firm.reportId, made.provisional.reportId]));
    expect(Object.fromEntries(entries.map((e) => [e.reportId, e.provisional]))).toEqual({ [made.firm.reportId]: false, [made.provisional.reportId]: true });
  });

  it('reaches the table’s rows and its CSV', async () => {
    session.actor = dealer.actor;
    const url = (path: string) => new NextRequest(new URL(`${path}?${new URLSearchParams({ q: MAKER })}`, 'http://localhost:3000'));
    const response = await listRoute(url('/api/compare'), { params: Promise.resolve({}) });
    const body = (await response.json()) as { ok: true; data: ComparisonPage };
    expect(Object.fromEntries(body.data.rows.map((r) => [r.model, r.overallProvisional]))).toEqual({ 'Firm-1': false, 'Thin-2': true });
    const csv = await (await csvRoute(url('/api/compare/export'))).text();
    const lines = csv.split(/\r?\n/);
    expect(lines[0]).toContain('Grade firm or provisional');
    expect(lines.find((l) => l.includes('Thin-2'))).toContain(',provisional,');
    expect(lines.find((l) => l.includes('Firm-1'))).toContain(',firm,');
  });

  it('says so on the public verify page’s record, in the catalogue and in the recent reports', async () => {
    expect((await findReportByVerificationCode(made.provisional.code))!.overallProvisional).toBe(true);
    expect((await findReportByVerificationCode(made.firm.code))!.overallProvisional).toBe(false);
    const catalogue = await listCatalogueReports(dealer.id, { q: MAKER, page: 1 });
    const byId = (list: Array<{ id: number; overallProvisional: boolean }>) => Object.fromEntries(list.map((r) => [r.id, r.overallProvisional]));
    expect(byId(catalogue.rows)).toMatchObject({ [made.firm.reportId]: false, [made.provisional.reportId]: true });
    const recent = await listRecentReleasedReports(50);
    expect(byId(recent)).toMatchObject({ [made.firm.reportId]: false, [made.provisional.reportId]: true });
  });
});
