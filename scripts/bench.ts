/**
 * `npm run bench`: every performance figure of issue #8 in one table, each with its budget or target
 * and whether it is met. It runs the three benchmarks as child processes, each with `--json`, and
 * reads the JSON each prints as its last line:
 *
 * - `bench:scoring` (scripts/bench-scoring.ts): scoring throughput.
 * - `bench:table` (scripts/bench-table.ts): the comparison table API's p50/p95/p99 at 1, 16 and 64
 *   connections beside the same SQL run bare; it builds the app and fills the benchmark database.
 * - `bench:app` (scripts/bench-app.ts), on that build and database: report PDF cold and cached, the
 *   photo pipeline beside sharp's bare resize of the same 12-megapixel JPEG, first-load JS per page.
 *
 * Options go to the table part: --duration S (seconds per run, default 10 here), --machines N,
 * --connections N[,N…], --no-build. Exits non-zero when a part fails or a budget is missed.
 */
import { spawn } from 'node:child_process';
import { availableParallelism, loadavg } from 'node:os';
import path from 'node:path';
import { databaseUrl, startMariaDb } from './lib/mariadb.mjs';

const root = path.resolve(import.meta.dirname, '..');
const offset = process.env.WAYGRADE_PORT_OFFSET ?? '20';
const distDir = Number(offset) ? `.next-${offset}` : '.next';
const passOn = (name: string, takesValue: boolean) => {
  const at = process.argv.indexOf(`--${name}`);
  if (at < 0) return [];
  return takesValue ? [`--${name}`, process.argv[at + 1] ?? ''] : [`--${name}`];
};
const tableArgs = [
  '--duration',
  process.argv.includes('--duration') ? process.argv[process.argv.indexOf('--duration') + 1]! : '10',
  ...passOn('machines', true),
  ...passOn('connections', true),
  ...passOn('no-build', false),
];

/** Runs one part, echoing its progress, and returns the JSON object it prints last. */
function runPart<T>(name: string, args: string[], env: NodeJS.ProcessEnv): Promise<T> {
  console.log(`\n━━ ${name} ━━`);
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, args, { cwd: root, env, stdio: ['ignore', 'pipe', 'inherit'] });
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => {
      output += chunk.toString('utf8');
      process.stdout.write(chunk);
    });
    child.on('error', reject);
    child.on('close', (code) => {
      // The last line that is a JSON object: the stand-ins may still log a line as the part shuts down.
      const last = output
        .split('\n')
        .reverse()
        .find((line) => line.startsWith('{'));
      try {
        resolve(JSON.parse(last ?? '') as T);
      } catch {
        reject(new Error(`${name} ended (exit code ${code}) without its JSON line`));
      }
    });
  });
}

type Percentiles = { p50: number; p95: number; p99: number; n: number };
type ScoringFigures = { medianMs: number; surveysPerSecond: number; cpuUsPerSurvey: number; targetMs: number; met: boolean };
type TableFigures = {
  machines: number;
  targetP95Ms: number;
  targetConnections: number;
  scenarios: Array<{ name: string; matches: number; runs: Array<{ connections: number; app: Percentiles; bareSql: Percentiles; requestsPerSecond: number; failures: number }> }>;
};
type AppFigures = { rows: Array<{ key: string; what: string; figure: string; value?: number; budget: string; verdict: 'ok' | 'OVER' | '' }> };

type Row = { part: string; measure: string; figure: string; beside: string; budget: string; met: 'met' | 'NOT met' | '' | 'failed' };
const rows: Row[] = [];
const verdict = (ok: boolean) => (ok ? 'met' : 'NOT met');
const trio = (p: Percentiles) => `${p.p50.toFixed(1)} / ${p.p95.toFixed(1)} / ${p.p99.toFixed(1)} ms`;

const loadBefore = loadavg().map((n) => n.toFixed(1)).join(' / ');
const { paths } = await startMariaDb(root, ['waygrade_bench']);
const env = { ...process.env, TZ: 'UTC', WAYGRADE_PORT_OFFSET: offset, BENCH_DATABASE_URL: process.env.BENCH_DATABASE_URL ?? databaseUrl(paths, 'waygrade_bench') };

try {
  const scoring = await runPart<ScoringFigures>('Scoring (bench:scoring)', ['--import', 'tsx', 'scripts/bench-scoring.ts', '--json'], env);
  rows.push({
    part: 'Scoring',
    measure: 'Full survey scored, median',
    figure: `${(scoring.medianMs * 1000).toFixed(1)} µs (${scoring.surveysPerSecond.toLocaleString('en-GB')} surveys/s)`,
    beside: `CPU ${scoring.cpuUsPerSurvey.toFixed(1)} µs per survey`,
    budget: `< ${scoring.targetMs * 1000} µs`,
    met: verdict(scoring.met),
  });
} catch (error) {
  rows.push({ part: 'Scoring', measure: 'bench:scoring', figure: (error as Error).message, beside: '', budget: '', met: 'failed' });
}

try {
  const table = await runPart<TableFigures>('Comparison table API (bench:table)', ['--conditions=react-server', '--import', 'tsx', 'scripts/bench-table.ts', '--json', ...tableArgs], env);
  for (const scenario of table.scenarios) {
    for (const run of scenario.runs) {
      const targeted = run.connections === table.targetConnections;
      rows.push({
        part: 'Table API',
        measure: `${scenario.name}, ${run.connections} ${run.connections === 1 ? 'client' : 'clients'}: p50 / p95 / p99`,
        figure: `${trio(run.app)}${run.failures ? ` · ${run.failures} non-200` : ''}`,
        beside: `bare SQL ${trio(run.bareSql)}`,
        budget: targeted ? `p95 ≤ ${table.targetP95Ms} ms` : '',
        met: targeted ? verdict(run.app.p95 <= table.targetP95Ms && run.failures === 0) : '',
      });
    }
  }
} catch (error) {
  rows.push({ part: 'Table API', measure: 'bench:table', figure: (error as Error).message, beside: '', budget: '', met: 'failed' });
}

try {
  const app = await runPart<AppFigures>(
    'Report PDF, photo pipeline, first-load JS (bench:app)',
    ['--import', './scripts/lib/allow-server-only.mjs', '--import', 'tsx', 'scripts/bench-app.ts', '--json'],
    { ...env, DATABASE_URL: env.BENCH_DATABASE_URL, NEXT_DIST_DIR: distDir },
  );
  const byKey = new Map(app.rows.map((r) => [r.key, r]));
  const met = (r: { verdict: string }) => (r.verdict === 'ok' ? 'met' : r.verdict === 'OVER' ? 'NOT met' : '');
  const cold = byKey.get('pdf-cold');
  const cached = byKey.get('pdf-cached');
  if (cold && cached) {
    rows.push({ part: 'Report PDF', measure: 'First render in a fresh process (cold)', figure: cold.figure, beside: `later renders ${byKey.get('pdf-later')?.figure ?? '–'}`, budget: '', met: '' });
    rows.push({ part: 'Report PDF', measure: 'From the cache', figure: cached.figure, beside: '', budget: cached.budget, met: met(cached) });
  } else {
    rows.push({ part: 'Report PDF', measure: 'Render', figure: byKey.get('pdf')?.figure ?? 'not measured', beside: '', budget: '', met: 'failed' });
  }
  const pipeline = byKey.get('photo-pipeline');
  const bare = byKey.get('photo-bare');
  if (pipeline && bare) {
    rows.push({ part: 'Photo', measure: '12 MP JPEG: check, upright, strip, 3 sizes', figure: pipeline.figure, beside: `sharp's bare resize to the same sizes ${bare.figure}`, budget: pipeline.budget, met: met(pipeline) });
  }
  for (const r of app.rows.filter((row) => row.key === 'js' || row.key.startsWith('js:'))) {
    rows.push({ part: 'First-load JS', measure: r.what.replace(/^First-load JS, /, ''), figure: r.figure, beside: '', budget: r.budget, met: r.key === 'js' ? 'failed' : met(r) });
  }
} catch (error) {
  rows.push({ part: 'App', measure: 'bench:app', figure: (error as Error).message, beside: '', budget: '', met: 'failed' });
}

const header: Row = { part: 'Part', measure: 'Measure', figure: 'Figure', beside: 'Beside it', budget: 'Budget / target', met: '' };
const columns = ['part', 'measure', 'figure', 'beside', 'budget', 'met'] as const;
const widths = columns.map((c) => Math.max(...[header, ...rows].map((r) => r[c].length), c === 'met' ? 7 : 4));
const line = (cells: string[]) => `| ${cells.map((c, i) => c.padEnd(widths[i]!)).join(' | ')} |`;
console.log(`\n━━ Waygrade benchmark · ${availableParallelism()} cores · load average ${loadBefore} before, ${loadavg().map((n) => n.toFixed(1)).join(' / ')} after (1/5/15 min) ━━\n`);
console.log(line([...columns.slice(0, 5).map((c) => header[c]), 'Met?']));
console.log(line(widths.map((w) => '-'.repeat(w))));
for (const r of rows) console.log(line(columns.map((c) => r[c])));
const missed = rows.filter((r) => r.met === 'NOT met' || r.met === 'failed');
console.log(missed.length ? `\n${missed.length} not met or failed.` : '\nEvery budget and target met.');
process.exitCode = missed.length ? 1 : 0;
