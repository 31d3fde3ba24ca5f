import 'server-only';
import { and, asc, desc, eq, inArray, lte } from 'drizzle-orm';
import { db, type Database } from '@/db/client';
import { inspections, machines, orders, reinspectionRequests, reports, users } from '@/db/schema';
import type { InspectionStatus } from '@/db/schema/inspections';

type Reader = Pick<Database, 'select'>;
type Writer = Pick<Database, 'update'>;

/** Inspection states in which the visit has not started: a sale then cancels it and refunds the fee. */
export const BEFORE_VISIT_STATUSES = ['requested', 'booked'] as const satisfies readonly InspectionStatus[];
/** Inspection states of an inspection under way (the same set the seller's own request checks). */
export const OPEN_INSPECTION_STATUSES = ['requested', 'booked', 'on_site', 'in_review'] as const satisfies readonly InspectionStatus[];

/** The released report a request starts from, with its machine, for the checkout. */
export async function findReinspectionBasis(reader: Reader, reportId: number) {
  const [row] = await reader
    .select({
      reportId: reports.id,
      reportStatus: reports.status,
      supersededById: reports.supersededById,
      inspectionId: reports.inspectionId,
      machineId: machines.id,
      sellerId: machines.sellerId,
      maker: machines.maker,
      model: machines.model,
      serialNumber: machines.serialNumber,
      machineType: machines.machineType,
      sizeClass: machines.sizeClass,
      listingStatus: machines.listingStatus,
    })
    .from(reports)
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .where(eq(reports.id, reportId))
    .limit(1);
  return row ?? null;
}

/** The machine's inspection under way, if any, locked so two payments cannot both open one. */
export async function lockOpenInspectionOfMachine(reader: Reader, machineId: number) {
  const [row] = await reader
    .select({ id: inspections.id, status: inspections.status })
    .from(inspections)
    .where(and(eq(inspections.machineId, machineId), inArray(inspections.status, [...OPEN_INSPECTION_STATUSES])))
    .orderBy(desc(inspections.id))
    .limit(1)
    .for('update');
  return row ?? null;
}

/** The request paid for by an order, locked for update. */
export async function lockReinspectionRequestByOrder(reader: Reader, orderId: number) {
  const [row] = await reader.select().from(reinspectionRequests).where(eq(reinspectionRequests.orderId, orderId)).for('update');
  return row ?? null;
}

/** Marks the request behind a refunded order as refunded (a no-op for report orders). */
export async function markReinspectionRequestRefunded(writer: Writer, orderId: number, at: Date) {
  await writer
    .update(reinspectionRequests)
    .set({ status: 'refunded', refundedAt: at, nextRefundAttemptAt: null, lastRefundError: null })
    .where(and(eq(reinspectionRequests.orderId, orderId), inArray(reinspectionRequests.status, ['awaiting_payment', 'paid', 'delivered', 'refund_due'])));
}

/** The person's latest request for this machine, with the order and the new inspection as they stand. */
export async function findLatestReinspectionRequest(requesterId: string, machineId: number) {
  const [row] = await db
    .select({
      id: reinspectionRequests.id,
      status: reinspectionRequests.status,
      cancelReason: reinspectionRequests.cancelReason,
      paidAt: reinspectionRequests.paidAt,
      refundedAt: reinspectionRequests.refundedAt,
      deliveredAt: reinspectionRequests.deliveredAt,
      amountMinor: orders.amountMinor,
      currency: orders.currency,
      orderStatus: orders.status,
      inspectionStatus: inspections.status,
      scheduledAt: inspections.scheduledAt,
    })
    .from(reinspectionRequests)
    .innerJoin(orders, eq(orders.id, reinspectionRequests.orderId))
    .leftJoin(inspections, eq(inspections.id, reinspectionRequests.inspectionId))
    .where(and(eq(reinspectionRequests.requesterId, requesterId), eq(reinspectionRequests.machineId, machineId)))
    .orderBy(desc(reinspectionRequests.createdAt), desc(reinspectionRequests.id))
    .limit(1);
  return row ?? null;
}

/** Whether someone else's paid request already has a new inspection under way for this machine. */
export async function findMachineInspectionUnderWay(machineId: number) {
  const [row] = await db
    .select({ id: inspections.id, status: inspections.status })
    .from(inspections)
    .where(and(eq(inspections.machineId, machineId), inArray(inspections.status, [...OPEN_INSPECTION_STATUSES])))
    .limit(1);
  return row ?? null;
}

/** Refunds owed after a sale that the provider has not confirmed yet, oldest first, for coordinators. */
export async function listOutstandingReinspectionRefunds() {
  return db
    .select({
      id: reinspectionRequests.id,
      orderId: reinspectionRequests.orderId,
      cancelReason: reinspectionRequests.cancelReason,
      refundAttempts: reinspectionRequests.refundAttempts,
      lastRefundError: reinspectionRequests.lastRefundError,
      nextRefundAttemptAt: reinspectionRequests.nextRefundAttemptAt,
      amountMinor: orders.amountMinor,
      currency: orders.currency,
      maker: machines.maker,
      model: machines.model,
      requesterEmail: users.email,
    })
    .from(reinspectionRequests)
    .innerJoin(orders, eq(orders.id, reinspectionRequests.orderId))
    .innerJoin(machines, eq(machines.id, reinspectionRequests.machineId))
    .innerJoin(users, eq(users.id, reinspectionRequests.requesterId))
    .where(eq(reinspectionRequests.status, 'refund_due'))
    .orderBy(asc(reinspectionRequests.updatedAt));
}

/** Requests whose refund is due for another attempt now. */
export async function listRefundsDueForAttempt(reader: Reader, now: Date, limit = 20) {
  return reader
    .select({ id: reinspectionRequests.id })
    .from(reinspectionRequests)
    .where(and(eq(reinspectionRequests.status, 'refund_due'), lte(reinspectionRequests.nextRefundAttemptAt, now)))
    .orderBy(asc(reinspectionRequests.nextRefundAttemptAt))
    .limit(limit);
}
