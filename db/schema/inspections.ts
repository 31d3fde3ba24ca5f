import { index, int, mysqlEnum, mysqlTable, text, varchar, json, uniqueIndex } from 'drizzle-orm/mysql-core';
import { createdAt, currency, minorUnits, timestamp, updatedAt, userId } from './columns';
import { machines } from './machines';
import { users } from './users';

/** requested → booked → on_site → in_review → released, or cancelled from any open state. */
export const INSPECTION_STATUSES = ['requested', 'booked', 'on_site', 'in_review', 'released', 'cancelled'] as const;
export type InspectionStatus = (typeof INSPECTION_STATUSES)[number];

/** A seller's request for an inspection and, once booked, the inspection itself. */
export const inspections = mysqlTable(
  'inspections',
  {
    id: int('id').autoincrement().primaryKey(),
    machineId: int('machine_id')
      .notNull()
      .references(() => machines.id),
    requestedById: userId('requested_by_id')
      .notNull()
      .references(() => users.id),
    status: mysqlEnum('status', INSPECTION_STATUSES).notNull().default('requested'),
    preferredDates: json('preferred_dates').$type<string[]>(),
    siteAccessNotes: text('site_access_notes'),
    siteContactName: varchar('site_contact_name', { length: 120 }),
    siteContactPhone: varchar('site_contact_phone', { length: 40 }),
    inspectorId: userId('inspector_id').references(() => users.id),
    scheduledAt: timestamp('scheduled_at'),
    feeMinor: minorUnits('fee_minor'),
    currency: currency(),
    reviewerId: userId('reviewer_id').references(() => users.id),
    cancelReason: text('cancel_reason'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('inspections_machine_idx').on(t.machineId),
    index('inspections_status_idx').on(t.status, t.scheduledAt),
    index('inspections_inspector_idx').on(t.inspectorId, t.scheduledAt),
  ],
);

/** Every status change, who made it and why: the inspection's timeline. */
export const inspectionStatusEvents = mysqlTable(
  'inspection_status_events',
  {
    id: int('id').autoincrement().primaryKey(),
    inspectionId: int('inspection_id')
      .notNull()
      .references(() => inspections.id),
    fromStatus: mysqlEnum('from_status', INSPECTION_STATUSES),
    toStatus: mysqlEnum('to_status', INSPECTION_STATUSES).notNull(),
    actorId: userId('actor_id').references(() => users.id),
    note: text('note'),
    createdAt: createdAt(),
  },
  (t) => [index('inspection_status_events_inspection_idx').on(t.inspectionId, t.createdAt)],
);

/** The on-site survey: one per inspection, saved whole with an optimistic version number. */
export const surveys = mysqlTable(
  'surveys',
  {
    id: int('id').autoincrement().primaryKey(),
    inspectionId: int('inspection_id')
      .notNull()
      .references(() => inspections.id),
    formatVersion: int('format_version').notNull(),
    // Incremented by every accepted save; a save must name the version it started from.
    version: int('version').notNull().default(0),
    data: json('data').notNull(),
    updatedById: userId('updated_by_id').references(() => users.id),
    submittedAt: timestamp('submitted_at'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('surveys_inspection_uq').on(t.inspectionId)],
);
