import { index, int, mysqlTable, primaryKey, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, updatedAt, userId } from './columns';
import { machines } from './machines';
import { users } from './users';

/** A dealer's named selection of machines from the comparison table, kept between visits. */
export const shortlists = mysqlTable(
  'shortlists',
  {
    id: int('id').autoincrement().primaryKey(),
    ownerId: userId('owner_id')
      .notNull()
      .references(() => users.id),
    name: varchar('name', { length: 80 }).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('shortlists_owner_name_uq').on(t.ownerId, t.name)],
);

/** Machines on a shortlist. Keyed by machine, not report, so a corrected report keeps its place. */
export const shortlistItems = mysqlTable(
  'shortlist_items',
  {
    shortlistId: int('shortlist_id')
      .notNull()
      .references(() => shortlists.id, { onDelete: 'cascade' }),
    machineId: int('machine_id')
      .notNull()
      .references(() => machines.id),
    addedAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.shortlistId, t.machineId] }), index('shortlist_items_machine_idx').on(t.machineId)],
);
