import {
  check,
  decimal,
  index,
  int,
  json,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  smallint,
  uniqueIndex,
  varchar,
} from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';
import { createdAt, currency, minorUnits, timestamp, userId } from './columns';
import { inspections } from './inspections';
import { machines } from './machines';
import { users } from './users';

export const REPORT_STATUSES = ['draft', 'released', 'withdrawn'] as const;
export const CONDITION_GRADES = ['Excellent', 'Very good', 'Good', 'Fair', 'Poor', 'Salvage'] as const;

/**
 * A graded condition report. Each correction is a new version; a released row is never changed
 * except to record that it was withdrawn or superseded (enforced by a trigger in the migrations).
 */
export const reports = mysqlTable(
  'reports',
  {
    id: int('id').autoincrement().primaryKey(),
    inspectionId: int('inspection_id')
      .notNull()
      .references(() => inspections.id),
    machineId: int('machine_id')
      .notNull()
      .references(() => machines.id),
    version: int('version').notNull().default(1),
    status: mysqlEnum('status', REPORT_STATUSES).notNull().default('draft'),
    scoringVersion: varchar('scoring_version', { length: 20 }).notNull(),
    surveyFormatVersion: int('survey_format_version').notNull(),
    surveyVersion: int('survey_version').notNull(),
    result: json('result').notNull(),
    overallCondition: mysqlEnum('overall_condition', CONDITION_GRADES).notNull(),
    overallScore: smallint('overall_score').notNull(),
    confidence: decimal('confidence', { precision: 4, scale: 3 }).notNull(),
    safetyFindings: smallint('safety_findings').notNull().default(0),
    fairMarketValueMinor: minorUnits('fair_market_value_minor'),
    repairEstimateMinor: minorUnits('repair_estimate_minor'),
    currency: currency(),
    verificationCode: varchar('verification_code', { length: 24 }).notNull(),
    inspectorId: userId('inspector_id').references(() => users.id),
    reviewerId: userId('reviewer_id').references(() => users.id),
    releasedAt: timestamp('released_at'),
    withdrawnAt: timestamp('withdrawn_at'),
    supersededById: int('superseded_by_id'),
    /**
     * What the report sets beside the findings, copied at release so the released version never
     * changes when the listing does: the seller's disclosure, the landed-cost basis and the
     * machine's thermal state per section (ReleaseFacts in lib/decision/release-facts.ts). Null on
     * drafts and on versions released before the copy was kept.
     */
    releaseFacts: json('release_facts'),
    /**
     * Everything the report states about the machine (identity, sizes, supply, location, listing
     * facts), copied at release (MachineSnapshot in lib/reports/machine-snapshot.ts): every reader of
     * a released version reads this, never the live listing. Required once a version leaves draft.
     */
    machineSnapshot: json('machine_snapshot'),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('reports_verification_uq').on(t.verificationCode),
    uniqueIndex('reports_inspection_version_uq').on(t.inspectionId, t.version),
    index('reports_machine_idx').on(t.machineId, t.status),
    index('reports_released_idx').on(t.status, t.releasedAt),
    index('reports_condition_idx').on(t.status, t.overallScore),
    check('reports_released_sealed', sql.raw("status = 'draft' or machine_snapshot is not null")),
  ],
);

/** Subsystem scores of a report, one row each, so the comparison table can filter and sort them. */
export const reportSubsystemScores = mysqlTable(
  'report_subsystem_scores',
  {
    reportId: int('report_id')
      .notNull()
      .references(() => reports.id),
    subsystem: varchar('subsystem', { length: 40 }).notNull(),
    score: smallint('score'),
    grade: varchar('grade', { length: 20 }),
  },
  (t) => [primaryKey({ columns: [t.reportId, t.subsystem] }), index('report_subsystem_scores_idx').on(t.subsystem, t.score)],
);
