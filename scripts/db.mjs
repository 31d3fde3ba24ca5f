// npm run db:start / db:stop — the private MariaDB on its own, for development.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { startMariaDb, stopMariaDb, databaseUrl } from './lib/mariadb.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const command = process.argv[2];

try {
  if (process.env.DATABASE_URL) {
    console.log('DATABASE_URL is set: using that server, the private MariaDB is not touched.');
  } else if (command === 'start') {
    const { paths } = await startMariaDb(root, ['waygrade', 'waygrade_test']);
    console.log(`DATABASE_URL=${databaseUrl(paths, 'waygrade')}`);
  } else if (command === 'stop') {
    await stopMariaDb(root);
  } else {
    console.error('usage: node scripts/db.mjs start|stop');
    process.exit(2);
  }
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
}
