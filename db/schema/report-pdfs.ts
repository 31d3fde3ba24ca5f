import { char, customType, int, mysqlTable, smallint, text } from 'drizzle-orm/mysql-core';
import { createdAt, timestamp } from './columns';
import { reports } from './reports';

/** MariaDB's LONGBLOB handed to and from mysql2 as a Buffer. */
const longBlob = customType<{ data: Buffer; driverData: Buffer }>({
  dataType: () => 'longblob',
});

/**
 * The PDF of a released report version, rendered once at release and served as stored: every app
 * server hands out the same bytes, and their SHA-256 is what the public check compares a file with.
 * A trigger (migration 0015) refuses a file for a draft and any change or removal of a stored one.
 */
export const reportPdfs = mysqlTable('report_pdfs', {
  reportId: int('report_id')
    .primaryKey()
    .references(() => reports.id),
  /** Lower-case hex SHA-256 of `pdf`. */
  sha256: char('sha256', { length: 64 }).notNull(),
  byteLength: int('byte_length').notNull(),
  pdf: longBlob('pdf').notNull(),
  /** REPORT_PDF_LAYOUT of the renderer that printed it (lib/pdf/pdf-layout.ts). */
  layout: smallint('layout').notNull(),
  createdAt: createdAt(),
});

/**
 * Released versions whose PDF is still to be rendered: written with the release, taken by the
 * background worker (lib/pdf/pdf-worker.ts), retried with back-off when the photos cannot be fetched.
 */
export const reportPdfJobs = mysqlTable('report_pdf_jobs', {
  reportId: int('report_id')
    .primaryKey()
    .references(() => reports.id),
  attempts: int('attempts').notNull().default(0),
  nextAttemptAt: timestamp('next_attempt_at').notNull(),
  lastError: text('last_error'),
  doneAt: timestamp('done_at'),
  createdAt: createdAt(),
});
