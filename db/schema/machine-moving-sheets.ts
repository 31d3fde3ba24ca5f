import { date, int, mysqlEnum, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { SITE_ACCESS } from '../../lib/decision/rigging-estimate';
import { updatedAt } from './columns';
import { machines } from './machines';

export const HEAVY_ENDS = ['headstock', 'tailstock', 'even'] as const;

/** What riggers need to know to move the machine out: weight in kg, sizes in mm. */
export const machineMovingSheets = mysqlTable('machine_moving_sheets', {
  machineId: int('machine_id')
    .primaryKey()
    .references(() => machines.id),
  weightKg: int('weight_kg').notNull(),
  lengthMm: int('length_mm'),
  widthMm: int('width_mm'),
  heightMm: int('height_mm'),
  heavyEnd: mysqlEnum('heavy_end', HEAVY_ENDS).notNull().default('headstock'),
  siteAccess: mysqlEnum('site_access', SITE_ACCESS).notNull(),
  accessNotes: varchar('access_notes', { length: 500 }),
  removalBy: date('removal_by', { mode: 'string' }),
  updatedAt: updatedAt(),
});
