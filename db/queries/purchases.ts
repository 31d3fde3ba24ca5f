import 'server-only';
import { and, desc, eq, inArray, isNull } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import { db } from '@/db/client';
import { machines, orders, reportAccessGrants, reports, users, ORDER_STATUSES } from '@/db/schema';
import type { Database } from '@/db/client';
import { sealedMachineOf } from './sealed-machine';
import { provisionalOf } from './report-provisional';

type Reader = Pick<Database, 'select'>;

/** A buyer's orders, newest first, whatever their state, so a pending or refunded one is explained. */
export async function listBuyerOrders(buyerId: string) {
  return db
    .select({
      id: orders.id,
      status: orders.status,
      purpose: orders.purpose,
      amountMinor: orders.amountMinor,
      currency: orders.currency,
      createdAt: orders.createdAt,
      paidAt: orders.paidAt,
      refundedAt: orders.refundedAt,
      refundReason: orders.refundReason,
      providerCheckoutSessionId: orders.providerCheckoutSessionId,
      reportId: reports.id,
      version: reports.version,
      maker: sealedMachineOf().maker,
      model: sealedMachineOf().model,
      serialNumber: sealedMachineOf().serialNumber,
    })
    .from(orders)
    .innerJoin(reports, eq(reports.id, orders.reportId))
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .where(eq(orders.buyerId, buyerId))
    .orderBy(desc(orders.createdAt), desc(orders.id));
}

const newest = alias(reports, 'newest');

/**
 * Reports this person may download: every released version of each inspection they hold an
 * unrevoked grant for, so a correction released after the purchase is there too.
 */
export async function listDownloadableReports(userId: string) {
  const granted = await db
    .select({ inspectionId: reports.inspectionId, reason: reportAccessGrants.reason, grantedAt: reportAccessGrants.grantedAt })
    .from(reportAccessGrants)
    .innerJoin(reports, eq(reports.id, reportAccessGrants.reportId))
    .where(and(eq(reportAccessGrants.userId, userId), isNull(reportAccessGrants.revokedAt)));
  if (granted.length === 0) return [];
  const byInspection = new Map(granted.map((g) => [g.inspectionId, g]));
  const rows = await db
    .select({
      reportId: newest.id,
      inspectionId: newest.inspectionId,
      version: newest.version,
      status: newest.status,
      overallCondition: newest.overallCondition,
      overallProvisional: provisionalOf(newest),
      releasedAt: newest.releasedAt,
      supersededById: newest.supersededById,
      maker: sealedMachineOf(newest).maker,
      model: sealedMachineOf(newest).model,
      serialNumber: sealedMachineOf(newest).serialNumber,
      town: sealedMachineOf(newest).town,
    })
    .from(newest)
    .innerJoin(machines, eq(machines.id, newest.machineId))
    .where(and(inArray(newest.inspectionId, [...byInspection.keys()]), inArray(newest.status, ['released', 'withdrawn'])))
    .orderBy(desc(newest.releasedAt), desc(newest.version));
  return rows.map((row) => ({ ...row, reason: byInspection.get(row.inspectionId)!.reason, grantedAt: byInspection.get(row.inspectionId)!.grantedAt }));
}

export type OrderStatus = (typeof ORDER_STATUSES)[number];

/** Orders for the coordinator, newest first, optionally of one status. */
export async function listOrdersForAdmin(filter: { status?: OrderStatus; limit?: number } = {}) {
  return db
    .select({
      id: orders.id,
      status: orders.status,
      purpose: orders.purpose,
      amountMinor: orders.amountMinor,
      currency: orders.currency,
      createdAt: orders.createdAt,
      paidAt: orders.paidAt,
      refundedAt: orders.refundedAt,
      refundReason: orders.refundReason,
      reportId: reports.id,
      version: reports.version,
      reportStatus: reports.status,
      maker: sealedMachineOf().maker,
      model: sealedMachineOf().model,
      buyerName: users.name,
      buyerEmail: users.email,
    })
    .from(orders)
    .innerJoin(reports, eq(reports.id, orders.reportId))
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .innerJoin(users, eq(users.id, orders.buyerId))
    .where(filter.status ? eq(orders.status, filter.status) : undefined)
    .orderBy(desc(orders.createdAt), desc(orders.id))
    .limit(filter.limit ?? 200);
}

/**
 * One order with everything a payment change needs (buyer, report, machine), locked for update
 * when read inside a transaction, so two deliveries of related events cannot interleave.
 */
export async function lockOrderWithContext(tx: Reader, orderId: number) {
  // Only the order row is locked; the joined rows are read as they are. The order itself comes from
  // the locking read, which sees the latest commit: a plain read could return the snapshot taken
  // before the lock wait and miss a refund that committed meanwhile.
  const [locked] = await tx.select().from(orders).where(eq(orders.id, orderId)).for('update');
  if (!locked) return null;
  const [row] = await tx
    .select({
      order: orders,
      buyer: { id: users.id, name: users.name, email: users.email },
      report: { id: reports.id, status: reports.status, version: reports.version, verificationCode: reports.verificationCode, inspectionId: reports.inspectionId },
      machine: { maker: sealedMachineOf().maker, model: sealedMachineOf().model, serialNumber: sealedMachineOf().serialNumber },
    })
    .from(orders)
    .innerJoin(users, eq(users.id, orders.buyerId))
    .innerJoin(reports, eq(reports.id, orders.reportId))
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .where(eq(orders.id, orderId))
    .limit(1);
  return row ? { ...row, order: locked } : null;
}

/**
 * Holds the buyer's account row until commit. Starting a checkout and applying a completed payment
 * take it first (before any order lock), so one buyer's checkouts and payments take turns.
 */
export async function lockBuyer(tx: Reader, buyerId: string) {
  await tx.select({ id: users.id }).from(users).where(eq(users.id, buyerId)).for('update');
}

/** The buyer of an order (never changes), read before the buyer's lock is taken. */
export async function findOrderBuyer(tx: Reader, orderId: number) {
  const [row] = await tx.select({ buyerId: orders.buyerId }).from(orders).where(eq(orders.id, orderId));
  return row?.buyerId ?? null;
}

export type OrderWithContext = NonNullable<Awaited<ReturnType<typeof lockOrderWithContext>>>;

/** The order a provider payment belongs to, when the payment has already been recorded on it. */
export async function findOrderIdByPaymentIntent(tx: Reader, paymentIntentId: string) {
  const [row] = await tx.select({ id: orders.id }).from(orders).where(eq(orders.providerPaymentIntentId, paymentIntentId)).limit(1);
  return row?.id ?? null;
}
