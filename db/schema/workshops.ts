import { int, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { createdAt } from './columns';

/** A business taking part in the marketplace: a selling workshop, a dealer, an inspection office. */
export const workshops = mysqlTable('workshops', {
  id: int('id').autoincrement().primaryKey(),
  name: varchar('name', { length: 160 }).notNull(),
  town: varchar('town', { length: 120 }).notNull(),
  region: varchar('region', { length: 120 }).notNull(),
  postcode: varchar('postcode', { length: 20 }),
  createdAt: createdAt(),
});
