import 'server-only';
import { and, eq } from 'drizzle-orm';
import { reinspectionRequests, reportAccessGrants, users } from '@/db/schema';
import type { Transaction } from '@/lib/auth/operation';
import { appLink } from '@/lib/mail/links';
import type { MachineSummary } from '@/lib/mail/mail-format';
import { enqueueEmail } from '@/lib/mail/outbox';

/**
 * When the report of a re-inspection is released, everyone who paid for that visit gets it: a grant
 * tied to their re-inspection order (so a later correction reaches them and a refund would revoke
 * it) and an e-mail. Runs in the release's transaction; a request already delivered is skipped.
 */
export async function deliverReinspectionReport(
  tx: Transaction,
  input: { inspectionId: number; reportId: number; reportCode: string; overallCondition: string | null; machine: MachineSummary; at?: Date },
) {
  const at = input.at ?? new Date();
  const paid = await tx
    .select({ id: reinspectionRequests.id, orderId: reinspectionRequests.orderId, requesterId: reinspectionRequests.requesterId, email: users.email, name: users.name })
    .from(reinspectionRequests)
    .innerJoin(users, eq(users.id, reinspectionRequests.requesterId))
    .where(and(eq(reinspectionRequests.inspectionId, input.inspectionId), eq(reinspectionRequests.status, 'paid')))
    .for('update');
  for (const request of paid) {
    await tx.insert(reportAccessGrants).values({ reportId: input.reportId, userId: request.requesterId, reason: 'purchase', orderId: request.orderId, grantedAt: at });
    await tx.update(reinspectionRequests).set({ status: 'delivered', deliveredAt: at }).where(eq(reinspectionRequests.id, request.id));
    await enqueueEmail(tx, {
      to: request.email,
      template: 'reinspection-report-ready',
      data: { recipientName: request.name, machine: input.machine, reportCode: input.reportCode, overallCondition: input.overallCondition, url: appLink('/purchases') },
    });
  }
  return paid.length;
}
