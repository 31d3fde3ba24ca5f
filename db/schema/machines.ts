import { index, int, mysqlEnum, mysqlTable, smallint, text, varchar, decimal } from 'drizzle-orm/mysql-core';
import { createdAt, currency, minorUnits, updatedAt, userId } from './columns';
import { users } from './users';
import { workshops } from './workshops';

export const MACHINE_TYPES = ['centre_lathe'] as const;
export const LATHE_KINDS = ['general_purpose', 'toolroom'] as const;
export const SIZE_CLASSES = ['small', 'medium', 'large'] as const;
export const LISTING_STATUSES = ['draft', 'listed', 'sold', 'withdrawn'] as const;

/** A used machine offered for sale. Sizes in mm, power in kW, money in minor units. */
export const machines = mysqlTable(
  'machines',
  {
    id: int('id').autoincrement().primaryKey(),
    sellerId: userId('seller_id')
      .notNull()
      .references(() => users.id),
    workshopId: int('workshop_id').references(() => workshops.id),
    machineType: mysqlEnum('machine_type', MACHINE_TYPES).notNull().default('centre_lathe'),
    latheKind: mysqlEnum('lathe_kind', LATHE_KINDS).notNull().default('general_purpose'),
    maker: varchar('maker', { length: 120 }).notNull(),
    model: varchar('model', { length: 120 }).notNull(),
    serialNumber: varchar('serial_number', { length: 80 }),
    yearBuilt: smallint('year_built'),
    swingMm: smallint('swing_mm').notNull(),
    betweenCentresMm: smallint('between_centres_mm').notNull(),
    spindleBoreMm: smallint('spindle_bore_mm'),
    motorKw: decimal('motor_kw', { precision: 5, scale: 2 }),
    supplyVoltage: smallint('supply_voltage'),
    supplyPhases: smallint('supply_phases'),
    sizeClass: mysqlEnum('size_class', SIZE_CLASSES).notNull(),
    town: varchar('town', { length: 120 }).notNull(),
    region: varchar('region', { length: 120 }).notNull(),
    askingPriceMinor: minorUnits('asking_price_minor'),
    currency: currency(),
    accessories: text('accessories'),
    description: text('description'),
    listingStatus: mysqlEnum('listing_status', LISTING_STATUSES).notNull().default('draft'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('machines_seller_idx').on(t.sellerId),
    index('machines_status_idx').on(t.listingStatus),
    index('machines_swing_idx').on(t.swingMm),
    index('machines_region_idx').on(t.region),
  ],
);
