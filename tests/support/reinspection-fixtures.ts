import { and, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { inspections, machines, orders, reinspectionRequests, surveys } from '@/db/schema';
import { insertDraftReport, releaseDraftReport } from '@/db/queries/report-writes';
import { demoSurvey } from '@/db/seed/demo-survey';
import { seededRandom } from '@/db/seed/random';
import { scoreSurvey, SURVEY_FORMAT_VERSION } from '@/lib/scoring';
import { createAccount, type TestAccount } from './accounts';
import { createInspection, createMachine } from './workflow-fixtures';

const DAY_MS = 86_400_000;

/** A calendar date this many days before today, as the survey records it (YYYY-MM-DD, UTC). */
export function daysAgo(days: number) {
  return new Date(Date.now() - days * DAY_MS).toISOString().slice(0, 10);
}

/** A scored survey and its draft report for an inspection, inspected on the given day. */
export async function createDraftReport(inspectionId: number, inspectedOn: string) {
  const [inspection] = await db.select().from(inspections).where(eq(inspections.id, inspectionId));
  const [machine] = await db.select().from(machines).where(eq(machines.id, inspection!.machineId));
  const survey = demoSurvey(machine!, { wear: 0.4, random: seededRandom(inspectionId), inspectedOn });
  await db.insert(surveys).values({ inspectionId, formatVersion: SURVEY_FORMAT_VERSION, version: 5, data: survey, submittedAt: new Date() });
  const result = scoreSurvey(survey, { asOfYear: Number(inspectedOn.slice(0, 4)) });
  return db.transaction((tx) => insertDraftReport(tx, { inspectionId, machineId: machine!.id, surveyVersion: 5, inspectorId: inspection!.inspectorId, result }));
}

/**
 * A released report inspected `inspectedDaysAgo` days ago (120 by default: stale under the default
 * 90-day validity) on a listed machine of the given seller, or of a fresh one.
 */
export async function createAgedReleasedReport(options: { seller?: TestAccount; inspectedDaysAgo?: number; machine?: Parameters<typeof createMachine>[1] } = {}) {
  const [seller, coordinator, inspector] = await Promise.all([options.seller ?? createAccount('seller'), createAccount('admin'), createAccount('inspector')]);
  const machineId = await createMachine(seller.id, options.machine ?? {});
  const inspectionId = await createInspection(machineId, seller.id, 'in_review', inspector.id);
  const { reportId } = await createDraftReport(inspectionId, daysAgo(options.inspectedDaysAgo ?? 120));
  await db.transaction((tx) => releaseDraftReport(tx, { reportId, reviewerId: coordinator.id, sellerId: seller.id }));
  await db.update(inspections).set({ status: 'released' }).where(eq(inspections.id, inspectionId));
  return { reportId, inspectionId, machineId, seller, coordinator, inspector };
}

export async function readRequest(requestId: number) {
  const [row] = await db.select().from(reinspectionRequests).where(eq(reinspectionRequests.id, requestId));
  return row!;
}

export async function readInspection(inspectionId: number) {
  const [row] = await db.select().from(inspections).where(eq(inspections.id, inspectionId));
  return row!;
}

/** The machine's inspections waiting in the coordinators' queue. */
export async function queuedInspections(machineId: number) {
  return db.select().from(inspections).where(and(eq(inspections.machineId, machineId), eq(inspections.status, 'requested')));
}

export async function readOrderOf(requestId: number) {
  const request = await readRequest(requestId);
  const [row] = await db.select().from(orders).where(eq(orders.id, request.orderId));
  return row!;
}

/** Polls until the check returns a truthy value (e.g. a webhook has been applied), or fails after the timeout. */
export async function eventually<T>(check: () => Promise<T | null | undefined | false>, timeoutMs = 20_000): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value) return value;
    if (Date.now() > until) throw new Error('Timed out waiting for the condition');
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

/** The payments stand-in the test stack runs (STRIPE_API_URL). */
function paymentsUrl() {
  const url = process.env.STRIPE_API_URL;
  if (!url) throw new Error('STRIPE_API_URL is not set: run with the stack from npm test or npm start');
  return url.replace(/\/$/, '');
}

/** Presses "Pay" on the stand-in's hosted checkout page, as a buyer's browser would. */
export async function payAtCheckout(checkoutUrl: string) {
  const response = await fetch(`${checkoutUrl}/pay`, { method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: '', redirect: 'manual' });
  if (response.status !== 303) throw new Error(`The checkout page answered ${response.status}`);
  return response.headers.get('location');
}

/** The refund events the stand-in has sent for one payment intent, with their delivery record. */
export async function refundEventsAtStandIn(paymentIntentId: string) {
  const response = await fetch(`${paymentsUrl()}/__control/events?type=charge.refunded`);
  const body = (await response.json()) as { data: Array<{ id: string; event: { data: { object: { payment_intent?: string; amount_refunded?: number } } } }> };
  return body.data.filter((e) => e.event.data.object.payment_intent === paymentIntentId);
}
