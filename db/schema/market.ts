import { date, index, int, mysqlEnum, mysqlTable, smallint, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, currency, minorUnits, updatedAt, userId } from './columns';
import { CONDITION_GRADES } from './reports';
import { MACHINE_TYPES } from './machines';
import { users } from './users';

export const SALE_KINDS = ['dealer_retail', 'private', 'auction', 'liquidation'] as const;

/** A known sale of a comparable machine, for the sales-comparison valuation. */
export const comparableSales = mysqlTable(
  'comparable_sales',
  {
    id: int('id').autoincrement().primaryKey(),
    machineType: mysqlEnum('machine_type', MACHINE_TYPES).notNull(),
    description: varchar('description', { length: 200 }).notNull(),
    yearBuilt: smallint('year_built'),
    swingMm: smallint('swing_mm').notNull(),
    betweenCentresMm: smallint('between_centres_mm'),
    condition: mysqlEnum('condition', CONDITION_GRADES),
    saleKind: mysqlEnum('sale_kind', SALE_KINDS).notNull(),
    priceMinor: minorUnits('price_minor').notNull(),
    currency: currency(),
    soldOn: date('sold_on', { mode: 'string' }).notNull(),
    region: varchar('region', { length: 120 }),
    source: varchar('source', { length: 200 }),
    createdById: userId('created_by_id').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [index('comparable_sales_size_idx').on(t.machineType, t.swingMm)],
);

/** Repair actions and their costs; findings map to these codes. Editable by admins. */
export const repairCostItems = mysqlTable(
  'repair_cost_items',
  {
    id: int('id').autoincrement().primaryKey(),
    code: varchar('code', { length: 60 }).notNull(),
    label: varchar('label', { length: 200 }).notNull(),
    subsystem: varchar('subsystem', { length: 40 }).notNull(),
    costMinor: minorUnits('cost_minor').notNull(),
    currency: currency(),
    notes: text('notes'),
    updatedById: userId('updated_by_id').references(() => users.id),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('repair_cost_items_code_uq').on(t.code)],
);
