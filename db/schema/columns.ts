import { datetime, int, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';

// Shared column shapes. Datetimes keep milliseconds (fsp 3) and are stored in UTC.
export const createdAt = () =>
  datetime('created_at', { mode: 'date', fsp: 3 })
    .notNull()
    .default(sql`CURRENT_TIMESTAMP(3)`);

export const updatedAt = () =>
  datetime('updated_at', { mode: 'date', fsp: 3 })
    .notNull()
    .default(sql`CURRENT_TIMESTAMP(3)`)
    .$onUpdate(() => new Date());

export const timestamp = (name: string) => datetime(name, { mode: 'date', fsp: 3 });

/** Money as integer minor units (cents) beside an ISO 4217 currency code. */
export const currency = () => varchar('currency', { length: 3 }).notNull().default('EUR');
export const minorUnits = (name: string) => int(name);

export const userId = (name: string) => varchar(name, { length: 36 });
