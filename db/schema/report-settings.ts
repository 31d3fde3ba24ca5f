import { mysqlTable, smallint, tinyint } from 'drizzle-orm/mysql-core';
import { updatedAt } from './columns';

/** Settings the coordinator keeps for all reports; one row (id 1). */
export const reportSettings = mysqlTable('report_settings', {
  id: tinyint('id').primaryKey(),
  validityDays: smallint('validity_days').notNull().default(90),
  updatedAt: updatedAt(),
});
