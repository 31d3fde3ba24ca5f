import { index, int, mysqlTable } from 'drizzle-orm/mysql-core';
import { createdAt, currency, minorUnits } from './columns';
import { machines } from './machines';

/** Every asking price a machine has been listed at, so buyers see its price history. */
export const machinePriceChanges = mysqlTable(
  'machine_price_changes',
  {
    id: int('id').autoincrement().primaryKey(),
    machineId: int('machine_id')
      .notNull()
      .references(() => machines.id),
    askingPriceMinor: minorUnits('asking_price_minor'),
    currency: currency(),
    createdAt: createdAt(),
  },
  (t) => [index('machine_price_changes_machine_idx').on(t.machineId, t.createdAt)],
);
