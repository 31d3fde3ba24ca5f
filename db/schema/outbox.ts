import { bigint, index, int, mysqlEnum, mysqlTable, text, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, timestamp } from './columns';

export const OUTBOX_STATUSES = ['pending', 'sending', 'sent', 'failed'] as const;

/**
 * E-mail waiting to be sent. Rows are written in the same transaction as the change that causes
 * them; a worker sends them with retries and back-off, so a mail outage never fails a user action.
 */
export const emailOutbox = mysqlTable(
  'email_outbox',
  {
    id: bigint('id', { mode: 'number' }).autoincrement().primaryKey(),
    toAddress: varchar('to_address', { length: 254 }).notNull(),
    template: varchar('template', { length: 60 }).notNull(),
    subject: varchar('subject', { length: 300 }).notNull(),
    textBody: text('text_body').notNull(),
    htmlBody: text('html_body').notNull(),
    status: mysqlEnum('status', OUTBOX_STATUSES).notNull().default('pending'),
    attempts: int('attempts').notNull().default(0),
    nextAttemptAt: timestamp('next_attempt_at').notNull(),
    lockedUntil: timestamp('locked_until'),
    lastError: text('last_error'),
    sentAt: timestamp('sent_at'),
    createdAt: createdAt(),
  },
  (t) => [index('email_outbox_due_idx').on(t.status, t.nextAttemptAt)],
);
