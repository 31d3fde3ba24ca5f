import 'server-only';
import { eq } from 'drizzle-orm';
import { inspections, inspectionStatusEvents } from '@/db/schema';
import type { InspectionStatus } from '@/db/schema/inspections';
import type { Transaction } from '@/lib/auth/operation';

/** Moves an inspection to a new status and records the step on its timeline. */
export async function moveInspection(
  tx: Transaction,
  input: { inspectionId: number; from: InspectionStatus | null; to: InspectionStatus; actorId: string | null; note?: string | null; changes?: Partial<typeof inspections.$inferInsert> },
) {
  await tx
    .update(inspections)
    .set({ ...input.changes, status: input.to })
    .where(eq(inspections.id, input.inspectionId));
  await tx.insert(inspectionStatusEvents).values({
    inspectionId: input.inspectionId,
    fromStatus: input.from,
    toStatus: input.to,
    actorId: input.actorId,
    note: input.note ?? null,
  });
}
