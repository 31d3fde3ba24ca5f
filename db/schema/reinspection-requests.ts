import { index, int, mysqlEnum, mysqlTable, smallint, text, uniqueIndex } from 'drizzle-orm/mysql-core';
import { createdAt, timestamp, updatedAt, userId } from './columns';
import { inspections } from './inspections';
import { machines } from './machines';
import { orders } from './payments';
import { reports } from './reports';
import { users } from './users';

/**
 * awaiting_payment → paid (webhook-confirmed; the machine's new inspection is queued) → delivered (the new
 * report is released and granted); paid → refund_due → refunded when the machine sells or is withdrawn
 * before the visit starts; awaiting_payment → expired when the checkout lapses.
 */
export const REINSPECTION_STATUSES = ['awaiting_payment', 'paid', 'delivered', 'refund_due', 'refunded', 'expired'] as const;
export type ReinspectionStatus = (typeof REINSPECTION_STATUSES)[number];

/** A buyer, dealer or the seller asks for a machine to be inspected again, paying the fee before the visit. */
export const reinspectionRequests = mysqlTable(
  'reinspection_requests',
  {
    id: int('id').autoincrement().primaryKey(),
    machineId: int('machine_id')
      .notNull()
      .references(() => machines.id),
    // The released report that was stale (or nearly) when the request was made.
    basedOnReportId: int('based_on_report_id')
      .notNull()
      .references(() => reports.id),
    requesterId: userId('requester_id')
      .notNull()
      .references(() => users.id),
    orderId: int('order_id')
      .notNull()
      .references(() => orders.id),
    // Set once paid: the new inspection in the coordinators' queue.
    inspectionId: int('inspection_id').references(() => inspections.id),
    status: mysqlEnum('status', REINSPECTION_STATUSES).notNull().default('awaiting_payment'),
    cancelReason: text('cancel_reason'),
    refundAttempts: smallint('refund_attempts').notNull().default(0),
    lastRefundError: text('last_refund_error'),
    nextRefundAttemptAt: timestamp('next_refund_attempt_at'),
    paidAt: timestamp('paid_at'),
    deliveredAt: timestamp('delivered_at'),
    refundedAt: timestamp('refunded_at'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('reinspection_requests_order_uq').on(t.orderId),
    index('reinspection_requests_machine_idx').on(t.machineId, t.status),
    index('reinspection_requests_requester_idx').on(t.requesterId, t.createdAt),
    index('reinspection_requests_inspection_idx').on(t.inspectionId),
    index('reinspection_requests_refund_idx').on(t.status, t.nextRefundAttemptAt),
  ],
);
