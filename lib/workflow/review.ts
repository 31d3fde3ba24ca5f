import 'server-only';
import { and, eq, isNull, lt } from 'drizzle-orm';
import { z } from 'zod';
import { inspections, machines, reportAccessGrants, reports, surveys, users } from '@/db/schema';
import { releaseDraftReport } from '@/db/queries/report-writes';
import { defineOperation, type Transaction } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { appLink } from '@/lib/mail/links';
import { enqueueEmail } from '@/lib/mail/outbox';
import { deliverReinspectionReport } from '@/lib/reinspection/deliver-reinspection-report';
import { reviewDecisionSchema, sendBackSchema } from '@/lib/validation/inspection';
import { lockInspectionForTransition } from './inspection-access';
import { moveInspection } from './status-events';

/** The coordinator releases the graded draft: it becomes the current, immutable version. */
export const releaseReport = defineOperation({
  name: 'report.release',
  entityType: 'report',
  access: 'report.release',
  input: reviewDecisionSchema,
  async run({ actor, input, tx }) {
    const inspection = await lockInspectionForTransition(tx, input.inspectionId, actor!, 'released');
    const [machine] = await tx
      .select({ id: machines.id, maker: machines.maker, model: machines.model, serialNumber: machines.serialNumber, sellerId: machines.sellerId, sellerEmail: users.email, sellerName: users.name })
      .from(machines)
      .innerJoin(users, eq(users.id, machines.sellerId))
      .where(eq(machines.id, inspection.machineId));
    const released = await releaseDraftReport(tx, { reportId: input.reportId, reviewerId: actor!.id, sellerId: machine!.sellerId });
    if (!released || released.inspectionId !== inspection.id) {
      throw new AppError('conflict', 'This draft is no longer open for release; reload the page.');
    }
    await moveInspection(tx, { inspectionId: inspection.id, from: inspection.status, to: 'released', actorId: actor!.id, note: input.comment || null, changes: { reviewerId: actor!.id } });

    // As sealed with the version, so the e-mail names the machine the report names.
    const { maker, model, serialNumber } = released.machineSnapshot;
    const machineSummary = { maker, model, serialNumber };
    // A provisional grade is named so wherever it is told, e-mails included.
    const releasedResult = (typeof released.result === 'string' ? JSON.parse(released.result) : released.result) as { provisional?: boolean };
    const overallCondition = releasedResult.provisional === true ? `${released.overallCondition}, provisional` : released.overallCondition;
    await enqueueEmail(tx, {
      to: machine!.sellerEmail,
      template: 'report-released',
      data: {
        recipientName: machine!.sellerName,
        audience: 'seller',
        machine: machineSummary,
        reportCode: released.verificationCode,
        version: released.version,
        overallCondition,
        url: appLink(`/machines/${machine!.id}`),
      },
    });
    // Buyers of an earlier version get the correction at no charge and hear that it supersedes theirs.
    const earlierGrants = await tx
      .select({ userId: reportAccessGrants.userId, orderId: reportAccessGrants.orderId, email: users.email, name: users.name })
      .from(reportAccessGrants)
      .innerJoin(reports, eq(reports.id, reportAccessGrants.reportId))
      .innerJoin(users, eq(users.id, reportAccessGrants.userId))
      .where(
        and(
          eq(reports.inspectionId, inspection.id),
          lt(reports.version, released.version),
          eq(reportAccessGrants.reason, 'purchase'),
          isNull(reportAccessGrants.revokedAt),
        ),
      );
    const earlierBuyers = [...new Map(earlierGrants.map((g) => [g.userId, g])).values()];
    // Whoever paid for this visit as a re-inspection gets the new report without paying again.
    await deliverReinspectionReport(tx, {
      inspectionId: inspection.id,
      reportId: released.id,
      reportCode: released.verificationCode,
      overallCondition,
      machine: machineSummary,
    });
    for (const buyer of earlierBuyers) {
      await tx.insert(reportAccessGrants).values({ reportId: released.id, userId: buyer.userId, reason: 'purchase', orderId: buyer.orderId });
      await enqueueEmail(tx, {
        to: buyer.email,
        template: 'report-released',
        data: {
          recipientName: buyer.name,
          audience: 'earlier-buyer',
          machine: machineSummary,
          reportCode: released.verificationCode,
          version: released.version,
          overallCondition,
          url: appLink('/purchases'),
        },
      });
    }
    return { data: { reportId: released.id, version: released.version }, entityId: released.id, detail: { inspectionId: inspection.id, version: released.version, earlierBuyersTold: earlierBuyers.length } };
  },
});

/** Tells the assigned inspector that the survey is open again, and why. */
async function tellInspector(tx: Transaction, inspection: { id: number; machineId: number; inspectorId: string | null }, coordinatorName: string, comment: string, correction: boolean) {
  if (!inspection.inspectorId) return;
  const [row] = await tx
    .select({ email: users.email, name: users.name, maker: machines.maker, model: machines.model, serialNumber: machines.serialNumber })
    .from(users)
    .innerJoin(machines, eq(machines.id, inspection.machineId))
    .where(eq(users.id, inspection.inspectorId));
  if (!row) return;
  await enqueueEmail(tx, {
    to: row.email,
    template: 'survey-returned',
    data: {
      inspectorName: row.name,
      machine: { maker: row.maker, model: row.model, serialNumber: row.serialNumber },
      coordinatorName,
      comment,
      correction,
      url: appLink(`/jobs/${inspection.id}`),
    },
  });
}

/** The coordinator returns the survey to the inspector with comments; the draft stays until resubmitted. */
export const sendSurveyBack = defineOperation({
  name: 'survey.send-back',
  entityType: 'inspection',
  access: 'report.review',
  input: sendBackSchema,
  async run({ actor, input, tx }) {
    const inspection = await lockInspectionForTransition(tx, input.inspectionId, actor!, 'on_site');
    await tx.update(surveys).set({ submittedAt: null }).where(eq(surveys.inspectionId, inspection.id));
    await moveInspection(tx, { inspectionId: inspection.id, from: inspection.status, to: 'on_site', actorId: actor!.id, note: input.comment });
    await tellInspector(tx, inspection, actor!.name ?? 'The coordinator', input.comment, false);
    return { data: { inspectionId: inspection.id }, entityId: inspection.id, detail: { comment: input.comment } };
  },
});

/** Reopens a released inspection so its report can be corrected; the released version stays as it is. */
export const reopenForCorrection = defineOperation({
  name: 'report.reopen-for-correction',
  entityType: 'inspection',
  access: 'report.review',
  input: z.object({ inspectionId: z.coerce.number().int().positive(), comment: z.string().trim().min(5, 'Say what needs correcting').max(2000) }),
  async run({ actor, input, tx }) {
    const inspection = await lockInspectionForTransition(tx, input.inspectionId, actor!, 'on_site');
    const [open] = await tx.select({ id: reports.id }).from(reports).where(and(eq(reports.inspectionId, inspection.id), eq(reports.status, 'draft')));
    if (open) throw new AppError('conflict', 'A corrected draft is already open for this inspection.');
    await tx.update(surveys).set({ submittedAt: null }).where(eq(surveys.inspectionId, inspection.id));
    await moveInspection(tx, { inspectionId: inspection.id, from: inspection.status, to: 'on_site', actorId: actor!.id, note: `Reopened for correction: ${input.comment}` });
    await tx.update(inspections).set({ reviewerId: null }).where(eq(inspections.id, inspection.id));
    await tellInspector(tx, inspection, actor!.name ?? 'The coordinator', input.comment, true);
    return { data: { inspectionId: inspection.id }, entityId: inspection.id, detail: { comment: input.comment } };
  },
});
