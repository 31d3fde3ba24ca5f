// Applies the committed drizzle-kit migrations to DATABASE_URL.
import { drizzle } from 'drizzle-orm/mysql2';
import { migrate } from 'drizzle-orm/mysql2/migrator';
import mysql from 'mysql2/promise';
import { env } from '../lib/env';

const connection = await mysql.createConnection({ uri: env().DATABASE_URL, timezone: 'Z' });
try {
  await migrate(drizzle(connection), { migrationsFolder: 'db/migrations' });
  console.log('Database migrated');
} catch (error) {
  console.error('Migration failed:', error instanceof Error ? error.message : error);
  process.exitCode = 1;
} finally {
  await connection.end();
}
