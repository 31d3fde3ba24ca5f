import { afterAll, describe, expect, it } from 'vitest';
import { and, eq, sql } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { emailOutbox, inspections, inspectionStatusEvents, reportAccessGrants, reports } from '@/db/schema';
import { bookInspection, cancelInspection, requestInspection } from '@/lib/workflow/inspections';
import { releaseReport, reopenForCorrection, sendSurveyBack } from '@/lib/workflow/review';
import { createAccount } from '../support/accounts';
import { createInspection, createMachine, createSubmittedSurvey } from '../support/workflow-fixtures';

const inDays = (days: number) => new Date(Date.now() + days * 24 * 60 * 60 * 1000).toISOString().slice(0, 10);

/** The database's own error message when a statement is refused (drizzle wraps it). */
async function databaseRefusal(statement: Promise<unknown>) {
  try {
    await statement;
    return 'statement was accepted';
  } catch (error) {
    return String((error as { cause?: { message?: string } }).cause?.message ?? (error as Error).message);
  }
}

async function statusOf(inspectionId: number) {
  const [row] = await db.select({ status: inspections.status }).from(inspections).where(eq(inspections.id, inspectionId));
  return row?.status;
}

async function mailsTo(email: string, template: string) {
  return db.select().from(emailOutbox).where(and(eq(emailOutbox.toAddress, email), eq(emailOutbox.template, template)));
}

describe('the inspection workflow', () => {
  afterAll(() => closeDatabase());

  it('refuses a second request while an inspection is under way', async () => {
    const seller = await createAccount('seller');
    const machineId = await createMachine(seller.id);
    const request = { machineId, preferredDates: [inDays(5)], siteContactName: 'Gwen', siteContactPhone: '+00 555 0101' };
    const first = await requestInspection.execute(seller.actor, request);
    expect(first).toMatchObject({ ok: true });
    const second = await requestInspection.execute(seller.actor, request);
    expect(second).toMatchObject({ ok: false, code: 'conflict' });
  });

  it('refuses a request for another seller’s machine as not found', async () => {
    const owner = await createAccount('seller');
    const stranger = await createAccount('seller');
    const machineId = await createMachine(owner.id);
    const result = await requestInspection.execute(stranger.actor, { machineId, preferredDates: [inDays(5)], siteContactName: 'X', siteContactPhone: '+00 555 0101' });
    expect(result).toMatchObject({ ok: false, code: 'not_found' });
  });

  it('books a requested inspection, records the step and e-mails seller and inspector', async () => {
    const [seller, coordinator, inspector] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector')]);
    const inspectionId = await createInspection(await createMachine(seller.id), seller.id, 'requested');
    const result = await bookInspection.execute(coordinator.actor, { inspectionId, inspectorId: inspector.id, date: inDays(6), time: '09:30', feeEuros: 390 });
    expect(result).toMatchObject({ ok: true });
    const [row] = await db.select().from(inspections).where(eq(inspections.id, inspectionId));
    expect(row).toMatchObject({ status: 'booked', inspectorId: inspector.id, feeMinor: 39_000 });
    expect(row!.scheduledAt!.toISOString()).toBe(`${inDays(6)}T09:30:00.000Z`);
    const steps = await db.select().from(inspectionStatusEvents).where(eq(inspectionStatusEvents.inspectionId, inspectionId));
    expect(steps.map((s) => s.toStatus)).toEqual(['booked']);
    expect(await mailsTo(seller.email, 'inspection-booked')).toHaveLength(1);
    expect(await mailsTo(inspector.email, 'inspection-booked')).toHaveLength(1);
  });

  it('refuses to assign someone who is not an inspector, changing nothing', async () => {
    const [seller, coordinator, buyer] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('buyer')]);
    const inspectionId = await createInspection(await createMachine(seller.id), seller.id, 'requested');
    const result = await bookInspection.execute(coordinator.actor, { inspectionId, inspectorId: buyer.id, date: inDays(6), time: '09:30', feeEuros: 390 });
    expect(result).toMatchObject({ ok: false, code: 'invalid_input' });
    expect(await statusOf(inspectionId)).toBe('requested');
  });

  it('refuses booking by a seller and a visit in the past', async () => {
    const [seller, coordinator, inspector] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector')]);
    const inspectionId = await createInspection(await createMachine(seller.id), seller.id, 'requested');
    const bySeller = await bookInspection.execute(seller.actor, { inspectionId, inspectorId: inspector.id, date: inDays(6), time: '09:30', feeEuros: 390 });
    expect(bySeller).toMatchObject({ ok: false, code: 'forbidden' });
    const past = await bookInspection.execute(coordinator.actor, { inspectionId, inspectorId: inspector.id, date: inDays(-3), time: '09:30', feeEuros: 390 });
    expect(past).toMatchObject({ ok: false, code: 'invalid_input' });
  });

  it('lets a seller cancel a booked visit but not one the inspector has started', async () => {
    const [seller, inspector] = await Promise.all([createAccount('seller'), createAccount('inspector')]);
    const machineId = await createMachine(seller.id);
    const booked = await createInspection(machineId, seller.id, 'booked', inspector.id);
    expect(await cancelInspection.execute(seller.actor, { inspectionId: booked, reason: 'Sold privately' })).toMatchObject({ ok: true });
    expect(await statusOf(booked)).toBe('cancelled');
    expect(await mailsTo(inspector.email, 'inspection-cancelled')).toHaveLength(1);

    const started = await createInspection(machineId, seller.id, 'on_site', inspector.id);
    expect(await cancelInspection.execute(seller.actor, { inspectionId: started, reason: 'Changed my mind' })).toMatchObject({ ok: false, code: 'conflict' });
    expect(await statusOf(started)).toBe('on_site');
  });

  it('sends a survey back with a comment and tells the inspector', async () => {
    const [seller, coordinator, inspector] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector')]);
    const inspectionId = await createInspection(await createMachine(seller.id), seller.id, 'in_review', inspector.id);
    await createSubmittedSurvey(inspectionId);
    const refused = await sendSurveyBack.execute(coordinator.actor, { inspectionId, reportId: 1, comment: '' });
    expect(refused).toMatchObject({ ok: false, code: 'invalid_input' });
    const result = await sendSurveyBack.execute(coordinator.actor, { inspectionId, reportId: 1, comment: 'Repeat the level run with the stand unloaded' });
    expect(result).toMatchObject({ ok: true });
    expect(await statusOf(inspectionId)).toBe('on_site');
    expect(await mailsTo(inspector.email, 'survey-returned')).toHaveLength(1);
  });

  it('releases a draft: the seller gets free access and an e-mail, and the report can no longer change', async () => {
    const [seller, coordinator, inspector] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector')]);
    const inspectionId = await createInspection(await createMachine(seller.id), seller.id, 'in_review', inspector.id);
    const { reportId } = await createSubmittedSurvey(inspectionId);
    const result = await releaseReport.execute(coordinator.actor, { inspectionId, reportId });
    expect(result).toMatchObject({ ok: true, data: { reportId, version: 1 } });
    expect(await statusOf(inspectionId)).toBe('released');
    const grants = await db.select().from(reportAccessGrants).where(eq(reportAccessGrants.reportId, reportId));
    expect(grants).toMatchObject([{ userId: seller.id, reason: 'owner' }]);
    expect(await mailsTo(seller.email, 'report-released')).toHaveLength(1);
    // The database itself refuses to alter released evidence.
    await expect(databaseRefusal(db.update(reports).set({ overallScore: 99 }).where(eq(reports.id, reportId)))).resolves.toMatch(/cannot be changed/);
    await expect(databaseRefusal(db.execute(sql`DELETE FROM reports WHERE id = ${reportId}`))).resolves.toMatch(/cannot be deleted/);
    const [unchanged] = await db.select().from(reports).where(eq(reports.id, reportId));
    expect(unchanged!.overallScore).not.toBe(99);
  });

  it('releases a correction as version 2, marks version 1 superseded and tells its buyers', async () => {
    const [seller, coordinator, inspector, buyer] = await Promise.all([createAccount('seller'), createAccount('admin'), createAccount('inspector'), createAccount('buyer')]);
    const inspectionId = await createInspection(await createMachine(seller.id), seller.id, 'in_review', inspector.id);
    const first = await createSubmittedSurvey(inspectionId);
    expect(await releaseReport.execute(coordinator.actor, { inspectionId, reportId: first.reportId })).toMatchObject({ ok: true });
    await db.insert(reportAccessGrants).values({ reportId: first.reportId, userId: buyer.id, reason: 'purchase' });

    expect(await reopenForCorrection.execute(coordinator.actor, { inspectionId, comment: 'Serial number was misread' })).toMatchObject({ ok: true });
    expect(await statusOf(inspectionId)).toBe('on_site');
    await db.update(inspections).set({ status: 'in_review' }).where(eq(inspections.id, inspectionId));
    const { reportId: secondId, version } = await db.transaction(async (tx) => {
      const [v1] = await tx.select().from(reports).where(eq(reports.id, first.reportId));
      const { insertDraftReport } = await import('@/db/queries/report-writes');
      return insertDraftReport(tx, { inspectionId, machineId: v1!.machineId, surveyVersion: 6, inspectorId: inspector.id, result: v1!.result as never });
    });
    expect(version).toBe(2);
    expect(await releaseReport.execute(coordinator.actor, { inspectionId, reportId: secondId })).toMatchObject({ ok: true });

    const [v1] = await db.select().from(reports).where(eq(reports.id, first.reportId));
    expect(v1).toMatchObject({ status: 'released', supersededById: secondId });
    const buyerMails = await mailsTo(buyer.email, 'report-released');
    expect(buyerMails).toHaveLength(1);
    expect(buyerMails[0]!.textBody).toContain('new version (2)');
    const buyerGrants = await db.select().from(reportAccessGrants).where(eq(reportAccessGrants.userId, buyer.id));
    expect(buyerGrants.map((g) => g.reportId).sort()).toEqual([first.reportId, secondId].sort());
  });
});
