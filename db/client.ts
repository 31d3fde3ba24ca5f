import { drizzle, type MySql2Database } from 'drizzle-orm/mysql2';
import { withReplicas } from 'drizzle-orm/mysql-core';
import mysql from 'mysql2/promise';
import { env } from '@/lib/env';
import * as schema from './schema';

export type Database = MySql2Database<typeof schema>;

function createPool(url: string) {
  return mysql.createPool({
    uri: url,
    connectionLimit: env().DATABASE_POOL_SIZE,
    // Datetimes are UTC on the wire; the server and the app both run in UTC.
    timezone: 'Z',
    dateStrings: false,
    supportBigNumbers: true,
    connectTimeout: 5_000,
    enableKeepAlive: true,
  });
}

/**
 * With DATABASE_REPLICA_URLS set, Drizzle's `withReplicas` sends select() to a replica and
 * insert/update/delete/execute and every transaction to the primary. `primary` is kept apart for
 * reads that must see a write made a moment ago (see `primaryOf`).
 */
function createDatabase() {
  const primaryPool = createPool(env().DATABASE_URL);
  const primary = drizzle(primaryPool, { schema, mode: 'default' });
  const replicaUrls = (env().DATABASE_REPLICA_URLS ?? '')
    .split(',')
    .map((url) => url.trim())
    .filter(Boolean);
  const pools = [primaryPool, ...replicaUrls.map(createPool)];
  if (replicaUrls.length === 0) return { db: primary, primary, pools };
  const [first, ...rest] = replicaUrls.map((url, i) => drizzle(pools[i + 1]!, { schema, mode: 'default' }));
  return { db: withReplicas(primary, [first!, ...rest]) as unknown as Database, primary, pools };
}

// One pool per process, kept across hot reloads in development.
const globalForDb = globalThis as unknown as { waygradeDb?: ReturnType<typeof createDatabase> };

function instance() {
  globalForDb.waygradeDb ??= createDatabase();
  return globalForDb.waygradeDb;
}

/** The database, created on first use so that building the app needs no server. */
export const db: Database = new Proxy({} as Database, {
  get(_target, property) {
    const target = instance().db as unknown as Record<string | symbol, unknown>;
    const value = target[property];
    return typeof value === 'function' ? (value as (...a: unknown[]) => unknown).bind(target) : value;
  },
});

/**
 * Where a read must see the latest committed write, whatever a replica has applied so far: the
 * shared `db` becomes the primary; a transaction (already on the primary) is returned as it is.
 * For decisions taken right after a write elsewhere: who may touch an inspection or download a
 * paid report.
 */
export function primaryOf<T>(reader: T): T {
  return (reader === (db as unknown) ? instance().primary : reader) as T;
}

/**
 * A value kept for each database a reader stands for (the shared `db` counts as the pools behind it,
 * which closeDatabase replaces; a transaction counts as itself), such as statements prepared on it:
 * a prepared statement keeps its SQL text and the pool it runs on, and is only given new values.
 */
export function perDatabase<R extends object, V>(create: (reader: R) => V): (reader: R) => V {
  const values = new WeakMap<object, V>();
  return (reader) => {
    const key = reader === (db as unknown) ? instance().db : reader;
    let value = values.get(key);
    if (value === undefined) values.set(key, (value = create(reader)));
    return value;
  };
}

export async function closeDatabase() {
  const existing = globalForDb.waygradeDb;
  globalForDb.waygradeDb = undefined;
  if (existing) await Promise.all(existing.pools.map((pool) => pool.end()));
}
