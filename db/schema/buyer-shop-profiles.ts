import { mysqlTable, smallint } from 'drizzle-orm/mysql-core';
import { updatedAt, userId } from './columns';
import { users } from './users';

/** The buyer's own shop supply, to tell whether a machine runs there or needs a converter. */
export const buyerShopProfiles = mysqlTable('buyer_shop_profiles', {
  userId: userId('user_id')
    .primaryKey()
    .references(() => users.id),
  supplyVoltage: smallint('supply_voltage').notNull(),
  supplyPhases: smallint('supply_phases').notNull(),
  updatedAt: updatedAt(),
});
