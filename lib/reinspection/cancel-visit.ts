import 'server-only';
import { eq } from 'drizzle-orm';
import { inspections, machines, users } from '@/db/schema';
import { BEFORE_VISIT_STATUSES } from '@/db/queries/reinspection-requests';
import type { Transaction } from '@/lib/auth/operation';
import { appLink } from '@/lib/mail/links';
import { enqueueEmail } from '@/lib/mail/outbox';
import { moveInspection } from '@/lib/workflow/status-events';

/**
 * Cancels a re-inspection's visit that has not started and tells its inspector, if one was
 * assigned: when the machine leaves the market, and whenever the fee that paid for the visit is
 * refunded (by the refund worker, a coordinator or the payment provider's dashboard). A visit that
 * has started is left alone. `actorId` is null when the provider's event is the cause.
 */
export async function cancelVisitBeforeItStarts(
  tx: Transaction,
  inspectionId: number,
  input: { machineId: number; reason: string; actorId: string | null; cancelledBy: string },
): Promise<boolean> {
  const [inspection] = await tx.select().from(inspections).where(eq(inspections.id, inspectionId)).for('update');
  if (!inspection || !(BEFORE_VISIT_STATUSES as readonly string[]).includes(inspection.status)) return false;
  await moveInspection(tx, { inspectionId, from: inspection.status, to: 'cancelled', actorId: input.actorId, note: input.reason, changes: { cancelReason: input.reason } });
  if (!inspection.inspectorId) return true;
  const [row] = await tx
    .select({ email: users.email, name: users.name, maker: machines.maker, model: machines.model, serialNumber: machines.serialNumber })
    .from(users)
    .innerJoin(machines, eq(machines.id, input.machineId))
    .where(eq(users.id, inspection.inspectorId));
  if (row) {
    await enqueueEmail(tx, {
      to: row.email,
      template: 'inspection-cancelled',
      data: {
        recipientName: row.name,
        audience: 'inspector',
        machine: { maker: row.maker, model: row.model, serialNumber: row.serialNumber },
        scheduledAt: inspection.scheduledAt,
        reason: input.reason,
        cancelledBy: input.cancelledBy,
        url: appLink('/jobs'),
      },
    });
  }
  return true;
}
