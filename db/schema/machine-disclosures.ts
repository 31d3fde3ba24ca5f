import { int, mysqlEnum, mysqlTable, smallint, text } from 'drizzle-orm/mysql-core';
import { SALE_TERMS, USAGE_KINDS } from '../../lib/decision/seller-disclosure';
import { createdAt, updatedAt } from './columns';
import { machines } from './machines';

/**
 * The seller's answers to the defined disclosure questions, one row per machine. Empty text means
 * "none known"; the report sets each answer beside the inspection's findings.
 */
export const machineDisclosures = mysqlTable('machine_disclosures', {
  machineId: int('machine_id')
    .primaryKey()
    .references(() => machines.id),
  knownFaults: text('known_faults').notNull(),
  repairsAndRebuilds: text('repairs_and_rebuilds').notNull(),
  crashesOrDrops: text('crashes_or_drops').notNull(),
  usage: mysqlEnum('usage', USAGE_KINDS).notNull(),
  usageNotes: text('usage_notes').notNull(),
  supplyVoltage: smallint('supply_voltage'),
  supplyPhases: smallint('supply_phases'),
  included: text('included').notNull(),
  saleTerm: mysqlEnum('sale_term', SALE_TERMS).notNull(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});
