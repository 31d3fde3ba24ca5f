/**
 * `npm run bench:table`: the dealers' comparison table under load. Brings the app up against the
 * benchmark database with the large data set (10,000 lathes), signs in as a dealer, and sends a
 * filtered, sorted page request from 1, 16 and 64 concurrent clients with autocannon. Beside the
 * app's p50/p95/p99 it runs the very same SQL (built by db/queries/comparison.ts) bare through mysql2
 * at the same concurrency, so the app's own overhead shows as a ratio. Target: p95 ≤ 50 ms at 16
 * clients. `npm run bench` runs this as one part of its combined table.
 *
 * Options: --machines N (data set size, default 10000), --duration S (seconds per run, default 20),
 * --connections N[,N…] (default 1,16,64), --no-build (reuse the last build), --json (one last line
 * with every figure as JSON, for npm run bench). Environment: BENCH_DATABASE_URL (default the shared
 * MariaDB's waygrade_bench), WAYGRADE_PORT_OFFSET (ports; default 20).
 * Run with: node --conditions=react-server --import tsx scripts/bench-table.ts.
 */
import { existsSync } from 'node:fs';
import { loadavg, availableParallelism } from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import mysql from 'mysql2/promise';
import { quantileSorted } from 'simple-statistics';

process.env.WAYGRADE_PORT_OFFSET ??= '20';
type MariaDbHelpers = {
  startMariaDb: (root: string, databases: string[], log?: (line: string) => void) => Promise<{ paths: unknown }>;
  databaseUrl: (paths: unknown, database: string) => string;
};
const mariaDbModule: string = './lib/mariadb.mjs';
/** The project's private MariaDB (started if it is not running) with a database of the benchmark's own. */
async function benchDatabaseUrl() {
  if (process.env.BENCH_DATABASE_URL) return process.env.BENCH_DATABASE_URL;
  const { startMariaDb, databaseUrl } = (await import(mariaDbModule)) as MariaDbHelpers;
  const { paths } = await startMariaDb(path.resolve(import.meta.dirname, '..'), ['waygrade_bench']);
  return databaseUrl(paths, 'waygrade_bench');
}
const BENCH_DATABASE_URL = await benchDatabaseUrl();
process.env.DATABASE_URL = BENCH_DATABASE_URL;
process.env.TZ = 'UTC';

const argument = (name: string, fallback: number) => {
  const at = process.argv.indexOf(`--${name}`);
  return at > 0 ? Number(process.argv[at + 1]) : fallback;
};
const MACHINES = argument('machines', 10_000);
const DURATION_S = argument('duration', 20);
const CONNECTIONS = (() => {
  const at = process.argv.indexOf('--connections');
  const list = (at > 0 ? (process.argv[at + 1] ?? '') : '1,16,64').split(',').map(Number);
  if (!list.length || list.some((n) => !Number.isInteger(n) || n < 1)) throw new Error('--connections takes whole numbers, e.g. 1,16,64');
  return list;
})();
// The concurrency the target is stated at.
const TARGET_CONNECTIONS = 16;
const AS_JSON = process.argv.includes('--json');
const BUILD = !process.argv.includes('--no-build');
const TARGET_P95_MS = 50;
const WARM_UP_S = 4;
const DEALER = { email: 'bram@quayside-machinery.example', password: 'demo-lathe-2026' };

/**
 * Pages a dealer asks for. The default page (no filter, best condition first). Then grades, a swing
 * band and a year, page 2: sorted by an indexed column (the index is read in order and stops at the
 * page), then by asking price, a nullable figure whose blanks sort last, so it always filesorts the
 * matches. Last the decision columns: no deal-breakers, a report under a year old, fewest days listed.
 */
const SCENARIOS: ReadonlyArray<{ name: string; query: Record<string, string> }> = [
  // What every dealer sees first: no filter, best condition first, page 1.
  { name: 'default page', query: {} },
  {
    name: 'sorted by swing',
    query: { condition: 'Very good,Good,Fair', swingMin: '300', swingMax: '460', yearMin: '1975', sort: 'swing', dir: 'asc', page: '2', pageSize: '50' },
  },
  {
    name: 'sorted by asking price',
    query: { condition: 'Very good,Good,Fair', swingMin: '300', swingMax: '460', yearMin: '1975', sort: 'price', dir: 'asc', page: '2', pageSize: '50' },
  },
  {
    // The decision columns: no deal-breakers, a report inspected within the last year, fewest days listed first.
    name: 'no deal-breakers, recent report, by days listed',
    query: { dealBreakers: 'none', reportAgeMax: '365', sort: 'daysListed', dir: 'asc', page: '2', pageSize: '50' },
  },
];

// The start command's own helpers (plain .mjs, typed here by what this script uses).
type Stack = { env: Record<string, string>; ports: { app: number }; group: unknown; appUrl: string; stop: () => Promise<void> };
type StackHelpers = {
  bringUp: (mode: 'start' | 'test') => Promise<Stack>;
  buildApp: (env: Record<string, string>) => Promise<void>;
  startApp: (group: unknown, env: Record<string, string>, port: number) => unknown;
  root: string;
  NEXT_DIST_DIR: string;
};
type ProcessHelpers = {
  run: (command: string, args: string[], options: { cwd: string; env: Record<string, string> }) => Promise<void>;
  waitForHttp: (url: string, options: { child: unknown; name: string }) => Promise<void>;
};
const stackModule: string = './lib/stack.mjs';
const processesModule: string = './lib/processes.mjs';
const { bringUp, buildApp, startApp, root, NEXT_DIST_DIR } = (await import(stackModule)) as StackHelpers;
const { run, waitForHttp } = (await import(processesModule)) as ProcessHelpers;
const { db, closeDatabase } = await import('../db/client');
const { comparisonPageSql, loadComparisonViewer } = await import('../db/queries/comparison');
const { comparisonEntries, users } = await import('../db/schema');
const { comparisonQuerySchema } = await import('../lib/validation/comparison-query');
const { count, eq } = await import('drizzle-orm');

const ms = (value: number) => `${value.toFixed(1)} ms`;

type Percentiles = { p50: number; p95: number; p99: number; n: number };
/** One concurrency level of one scenario: the app over HTTP and the same SQL bare. */
type Run = { connections: number; app: Percentiles; bareSql: Percentiles; requestsPerSecond: number; failures: number; errors: number; timeouts: number; loadBefore: string; loadAfter: string };
const results: Array<{ name: string; query: Record<string, string>; matches: number; runs: Run[] }> = [];
const load = () => loadavg().map((l) => l.toFixed(2)).join(' / ');

function percentiles(samples: number[]) {
  const sorted = [...samples].sort((a, b) => a - b);
  return { p50: quantileSorted(sorted, 0.5), p95: quantileSorted(sorted, 0.95), p99: quantileSorted(sorted, 0.99), n: sorted.length };
}

/** Signs in through Auth.js's credentials endpoint as a browser would and returns the cookie header. */
async function signIn(appUrl: string) {
  const jar = new Map<string, string>();
  const remember = (response: Response) => {
    for (const cookie of response.headers.getSetCookie()) {
      const [pair] = cookie.split(';');
      const [name, ...value] = pair!.split('=');
      jar.set(name!.trim(), value.join('='));
    }
  };
  const header = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const csrf = await fetch(`${appUrl}/api/auth/csrf`);
  remember(csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const response = await fetch(`${appUrl}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: header() },
    body: new URLSearchParams({ csrfToken, email: DEALER.email, password: DEALER.password }),
  });
  remember(response);
  if (![...jar.keys()].some((k) => k.includes('session-token'))) throw new Error(`Sign-in as ${DEALER.email} failed (${response.status})`);
  return header();
}

/** The statement the API runs for this page (the page with its count), straight through mysql2. */
async function bareSql(connections: number, seconds: number, statements: Array<{ sql: string; params: unknown[] }>) {
  const pool = mysql.createPool({ uri: BENCH_DATABASE_URL, connectionLimit: connections, timezone: 'Z' });
  const samples: number[] = [];
  const until = Date.now() + seconds * 1000;
  await Promise.all(
    Array.from({ length: connections }, async () => {
      const connection = await pool.getConnection();
      try {
        while (Date.now() < until) {
          const started = performance.now();
          for (const s of statements) await connection.query(s.sql, s.params);
          samples.push(performance.now() - started);
        }
      } finally {
        connection.release();
      }
    }),
  );
  await pool.end();
  return percentiles(samples);
}

async function main() {
  console.log(`Comparison table benchmark · ${availableParallelism()} cores · load average ${load()} (1/5/15 min)`);
  const stack = await bringUp('start');
  try {
    const { env, group, ports, appUrl } = stack;
    const [present] = await db.select({ n: count() }).from(comparisonEntries);
    if ((present?.n ?? 0) < MACHINES) {
      console.log(`The benchmark database has ${present?.n ?? 0} released machines; adding the large data set (about 20 s per 1000)…`);
      await run(process.execPath, ['--conditions=react-server', '--import', 'tsx', 'db/seed/index.ts', '--if-empty'], { cwd: root, env });
      await run(process.execPath, ['--conditions=react-server', '--import', 'tsx', 'db/seed/large.ts', '--machines', String(MACHINES)], { cwd: root, env });
    }
    const [rows] = await db.select({ n: count() }).from(comparisonEntries);
    console.log(`Data set: ${rows!.n.toLocaleString('en-GB')} released machines in ${BENCH_DATABASE_URL.replace(/\/\/[^@]*@/, '//')}`);

    if (BUILD || !existsSync(path.join(root, NEXT_DIST_DIR, 'BUILD_ID'))) {
      console.log('Building the app…');
      await buildApp(env);
    }
    const app = startApp(group, { ...env, MAIL_WORKER_INTERVAL_MS: '0' }, ports.app);
    await waitForHttp(`${appUrl}/sign-in`, { child: app, name: 'app' });
    const cookie = await signIn(appUrl);

    const [dealer] = await db.select({ id: users.id, role: users.role }).from(users).where(eq(users.email, DEALER.email));
    const viewer = await loadComparisonViewer(db, dealer!);
    const summary: string[] = [];
    // A server just started compiles its hot paths as they run: before any figure is taken, every
    // scenario runs for a few seconds so the first one measured is not also the one that warms it up.
    console.log(`Warming the app up: every scenario for ${WARM_UP_S} s at ${TARGET_CONNECTIONS} connections…`);
    for (const scenario of SCENARIOS) {
      await autocannon({ url: `${appUrl}/api/compare?${new URLSearchParams(scenario.query)}`, connections: TARGET_CONNECTIONS, duration: WARM_UP_S, headers: { cookie } });
    }
    for (const scenario of SCENARIOS) {
      // The statements behind this page for this dealer, from the one query builder.
      const query = comparisonQuerySchema.parse(scenario.query);
      // The page query carries its count as a subquery: one statement, as the API sends it.
      const statements = [comparisonPageSql(db, query, viewer)];
      const explainer = await mysql.createConnection({ uri: BENCH_DATABASE_URL, timezone: 'Z' });
      console.log(`\n── ${scenario.name} ──`);
      const [plan] = await explainer.query(`EXPLAIN ${statements[0]!.sql}`, statements[0]!.params);
      console.log('EXPLAIN of the page query (PRIMARY) and its count (SUBQUERY):');
      console.table((plan as Array<Record<string, unknown>>).map((r) => ({ select: r.select_type, table: r.table, type: r.type, key: r.key, rows: r.rows, Extra: r.Extra })));
      await explainer.end();

      const url = `${appUrl}/api/compare?${new URLSearchParams(scenario.query)}`;
      const check = await fetch(url, { headers: { cookie } });
      const body = (await check.json()) as { ok: boolean; data?: { total: number; rows: unknown[] } };
      if (!check.ok || !body.ok) throw new Error(`The table API answered ${check.status}: ${JSON.stringify(body).slice(0, 300)}`);
      console.log(`Request: GET /api/compare?${new URLSearchParams(scenario.query)} → ${body.data!.total.toLocaleString('en-GB')} matches, ${body.data!.rows.length} rows on the page`);

      const runs: Run[] = [];
      for (const connections of CONNECTIONS) {
        console.log(`Warming up (3 s), then ${DURATION_S} s at ${connections} connections…`);
        await autocannon({ url, connections, duration: 3, headers: { cookie } });
        const latencies: number[] = [];
        let failures = 0;
        const loadBefore = load();
        const result = await new Promise<autocannon.Result>((resolve, reject) => {
          const instance = autocannon({ url, connections, duration: DURATION_S, headers: { cookie } }, (error, finished) => (error ? reject(error) : resolve(finished)));
          instance.on('response', (_client, statusCode, _bytes, responseTime) => {
            if (statusCode === 200) latencies.push(responseTime);
            else failures += 1;
          });
        });
        const loadAfter = load();
        console.log(`Bare SQL: the same ${statements.length === 1 ? 'statement' : `${statements.length} statements`} through mysql2 at ${connections} ${connections === 1 ? 'connection' : 'connections'}…`);
        const bare = await bareSql(connections, Math.min(DURATION_S, 10), statements);
        runs.push({ connections, app: percentiles(latencies), bareSql: bare, requestsPerSecond: result.requests.average, failures, errors: result.errors, timeouts: result.timeouts, loadBefore, loadAfter });
      }
      results.push({ name: scenario.name, query: scenario.query, matches: body.data!.total, runs });

      const row = (label: string, f: Percentiles) =>
        `${label.padEnd(34)} ${ms(f.p50).padStart(9)} ${ms(f.p95).padStart(9)} ${ms(f.p99).padStart(9)}   (${f.n.toLocaleString('en-GB')} samples)`;
      const atTarget = runs.find((r) => r.connections === TARGET_CONNECTIONS);
      const lines = [
        `── ${scenario.name}: ${body.data!.total.toLocaleString('en-GB')} matches of ${rows!.n.toLocaleString('en-GB')} ──`,
        `${''.padEnd(34)} ${'p50'.padStart(9)} ${'p95'.padStart(9)} ${'p99'.padStart(9)}`,
        ...runs.flatMap((r) => [
          row(`App, ${r.connections} ${r.connections === 1 ? 'client' : 'clients'} (HTTP, signed in)`, r.app),
          row(`Bare SQL, ${r.connections} ${r.connections === 1 ? 'connection' : 'connections'}`, r.bareSql),
          `  app ÷ bare SQL: p50 ${(r.app.p50 / r.bareSql.p50).toFixed(1)}×, p95 ${(r.app.p95 / r.bareSql.p95).toFixed(1)}× · ${r.requestsPerSecond.toFixed(0)} requests/s · ${r.failures} non-200 · ${r.errors} errors · ${r.timeouts} timeouts · load ${r.loadBefore} → ${r.loadAfter}`,
        ]),
        `(load average 1/5/15 min; ${availableParallelism()} cores, shared)`,
        atTarget
          ? `p95 ${ms(atTarget.app.p95)} ${atTarget.app.p95 <= TARGET_P95_MS ? 'meets' : 'misses'} the target of ${TARGET_P95_MS} ms at ${TARGET_CONNECTIONS} concurrent clients.`
          : `No run at ${TARGET_CONNECTIONS} clients, so the target of ${TARGET_P95_MS} ms was not checked.`,
      ];
      console.log(`\n${lines.join('\n')}`);
      summary.push(...lines, '');
    }
    console.log(`\n════ Summary ════\n${summary.join('\n')}`);
    // Last line, for npm run bench: every figure in milliseconds, by scenario and concurrency.
    if (AS_JSON) console.log(JSON.stringify({ machines: rows!.n, targetP95Ms: TARGET_P95_MS, targetConnections: TARGET_CONNECTIONS, durationS: DURATION_S, scenarios: results }));
  } finally {
    await closeDatabase();
    await stack.stop();
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
