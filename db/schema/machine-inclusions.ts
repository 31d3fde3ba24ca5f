import { index, int, mysqlEnum, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { currency, minorUnits } from './columns';
import { machines } from './machines';

export const INCLUSION_KINDS = ['chuck', 'faceplate', 'steady-rest', 'travelling-rest', 'tool-post', 'collets', 'dro', 'manuals', 'other'] as const;
export const INCLUSION_CONDITIONS = ['good', 'usable', 'worn', 'missing'] as const;

/** Each thing that comes with the machine, its condition and what it would cost to replace. */
export const machineInclusions = mysqlTable(
  'machine_inclusions',
  {
    id: int('id').autoincrement().primaryKey(),
    machineId: int('machine_id')
      .notNull()
      .references(() => machines.id),
    kind: mysqlEnum('kind', INCLUSION_KINDS).notNull(),
    description: varchar('description', { length: 200 }).notNull(),
    condition: mysqlEnum('condition', INCLUSION_CONDITIONS).notNull(),
    replacementCostMinor: minorUnits('replacement_cost_minor'),
    currency: currency(),
  },
  (t) => [index('machine_inclusions_machine_idx').on(t.machineId)],
);
