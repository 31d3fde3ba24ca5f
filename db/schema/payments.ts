import { index, int, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, currency, minorUnits, timestamp, updatedAt, userId } from './columns';
import { MACHINE_TYPES, SIZE_CLASSES } from './machines';
import { reports } from './reports';
import { users } from './users';

/** The inspection fee by machine type and size class, set by an admin. */
export const inspectionFees = mysqlTable(
  'inspection_fees',
  {
    id: int('id').autoincrement().primaryKey(),
    machineType: mysqlEnum('machine_type', MACHINE_TYPES).notNull(),
    sizeClass: mysqlEnum('size_class', SIZE_CLASSES).notNull(),
    amountMinor: minorUnits('amount_minor').notNull(),
    currency: currency(),
    updatedById: userId('updated_by_id').references(() => users.id),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('inspection_fees_class_uq').on(t.machineType, t.sizeClass)],
);

export const ORDER_STATUSES = ['pending', 'paid', 'refunded', 'expired'] as const;
/** What an order pays for: a released report, or a new visit to a machine whose report is stale. */
export const ORDER_PURPOSES = ['report', 'reinspection'] as const;

/**
 * A buyer's payment, tied to the payment provider's ids: for a report, or for a re-inspection (then
 * report_id is the released report the request was made from, and reinspection_requests holds the rest).
 */
export const orders = mysqlTable(
  'orders',
  {
    id: int('id').autoincrement().primaryKey(),
    reportId: int('report_id')
      .notNull()
      .references(() => reports.id),
    buyerId: userId('buyer_id')
      .notNull()
      .references(() => users.id),
    purpose: mysqlEnum('purpose', ORDER_PURPOSES).notNull().default('report'),
    amountMinor: minorUnits('amount_minor').notNull(),
    currency: currency(),
    status: mysqlEnum('status', ORDER_STATUSES).notNull().default('pending'),
    providerCheckoutSessionId: varchar('provider_checkout_session_id', { length: 255 }),
    providerPaymentIntentId: varchar('provider_payment_intent_id', { length: 255 }),
    providerRefundId: varchar('provider_refund_id', { length: 255 }),
    refundReason: text('refund_reason'),
    paidAt: timestamp('paid_at'),
    refundedAt: timestamp('refunded_at'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('orders_checkout_session_uq').on(t.providerCheckoutSessionId),
    index('orders_buyer_idx').on(t.buyerId, t.status),
    index('orders_report_idx').on(t.reportId),
  ],
);

/** Provider webhook events already handled: the event id makes processing idempotent. */
export const paymentEvents = mysqlTable('payment_events', {
  providerEventId: varchar('provider_event_id', { length: 255 }).primaryKey(),
  type: varchar('type', { length: 100 }).notNull(),
  providerCreatedAt: timestamp('provider_created_at'),
  processedAt: createdAt(),
});

export const ACCESS_REASONS = ['purchase', 'owner', 'staff'] as const;

/** Who may download which report, and why. A refund revokes the grant; rows are kept. */
export const reportAccessGrants = mysqlTable(
  'report_access_grants',
  {
    id: int('id').autoincrement().primaryKey(),
    reportId: int('report_id')
      .notNull()
      .references(() => reports.id),
    userId: userId('user_id')
      .notNull()
      .references(() => users.id),
    reason: mysqlEnum('reason', ACCESS_REASONS).notNull(),
    orderId: int('order_id').references(() => orders.id),
    grantedAt: createdAt(),
    revokedAt: timestamp('revoked_at'),
  },
  (t) => [index('report_access_grants_user_idx').on(t.userId, t.reportId), index('report_access_grants_order_idx').on(t.orderId)],
);
