import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { rmSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { encode } from 'next-auth/jwt';
import { databaseUrl, rootSql, startMariaDb, stopMariaDb, type MariaDbPaths } from '@/scripts/lib/mariadb.mjs';

/**
 * A MariaDB server and an app server of the fault tests' own, so they can stop, kill and restart
 * them without touching the database and app that other tests and people are using. The database
 * lives in its own data folder under .data/ and takes the next free port; the app runs the build
 * the shared app was started from, on another port.
 */
const repoRoot = path.resolve(import.meta.dirname, '..', '..');
const quiet = () => {};

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

export async function poll<T>(what: string, check: () => Promise<T | undefined | null | false>, timeoutMs = 120_000, everyMs = 250): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  let lastError: unknown;
  while (Date.now() < deadline) {
    try {
      const value = await check();
      if (value) return value;
    } catch (error) {
      lastError = error;
    }
    await new Promise((resolve) => setTimeout(resolve, everyMs));
  }
  throw new Error(`timed out waiting for ${what}${lastError ? `: ${String(lastError)}` : ''}`);
}

export class PrivateDatabase {
  readonly root: string;
  url = '';
  paths: MariaDbPaths | null = null;
  /**
   * `name` is the database's name; `folder` (default: the name) names the server's data folder, so
   * two servers can hold the same database; `serverArgs` go on mariadbd's command line.
   */
  constructor(
    readonly name: string,
    readonly options: { folder?: string; serverArgs?: string[] } = {},
  ) {
    // startMariaDb keeps its data in <root>/.data/mariadb; a root of our own gives a server of our own.
    this.root = path.join(repoRoot, '.data', `private-${options.folder ?? name}`);
  }

  async start() {
    const saved = process.env.MARIADB_PORT;
    delete process.env.MARIADB_PORT;
    try {
      const { paths } = await startMariaDb(this.root, [this.name], quiet, { serverArgs: this.options.serverArgs });
      this.paths = paths;
      this.url = databaseUrl(paths, this.name);
    } finally {
      if (saved !== undefined) process.env.MARIADB_PORT = saved;
    }
    return this.url;
  }

  /** Statements as root on this server (not through the app's user); rows come back tab-separated. */
  sql(statements: string) {
    if (!this.paths) throw new Error(`the private database ${this.name} is not started`);
    return rootSql(this.paths, statements);
  }

  /** Runs a TypeScript file against this database (DATABASE_URL) and returns what it printed. */
  runScript(file: string) {
    const result = spawnSync(process.execPath, ['--conditions=react-server', '--import', 'tsx', file], {
      cwd: repoRoot,
      env: { ...process.env, DATABASE_URL: this.url, DATABASE_REPLICA_URLS: '' },
      encoding: 'utf8',
    });
    if (result.status !== 0) throw new Error(`${file} failed: ${result.stderr}`);
    return result.stdout;
  }

  async stop() {
    await stopMariaDb(this.root, quiet);
  }

  migrate() {
    const result = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/migrate.ts'], { cwd: repoRoot, env: { ...process.env, DATABASE_URL: this.url, DATABASE_REPLICA_URLS: '' }, encoding: 'utf8' });
    if (result.status !== 0) throw new Error(`migration failed: ${result.stderr}`);
  }

  async remove() {
    await this.stop();
    rmSync(this.root, { recursive: true, force: true });
  }
}

const REPLICATION_USER = 'replication';
const REPLICATION_PASSWORD = 'replication-local';

/**
 * A primary MariaDB with a binary log and a replica that follows it with MariaDB's own replication
 * (GTID), each a private server on loopback with its own data folder and port, holding the same
 * database. The replica is read-only for the app's user, so a write sent there would fail loudly.
 */
export class ReplicatedDatabases {
  readonly primary: PrivateDatabase;
  readonly replica: PrivateDatabase;
  constructor(readonly name: string) {
    const small = ['--innodb-buffer-pool-size=128M', '--max-connections=200'];
    // With a binary log, MariaDB lets only SUPER create triggers unless told to trust their creators;
    // the migrations create triggers as the app's user.
    this.primary = new PrivateDatabase(name, { folder: `${name}-primary`, serverArgs: [...small, '--server-id=1', '--log-bin=primary-bin', '--binlog-format=ROW', '--log-bin-trust-function-creators=1'] });
    this.replica = new PrivateDatabase(name, { folder: `${name}-replica`, serverArgs: [...small, '--server-id=2', '--relay-log=replica-relay', '--read-only=ON'] });
  }

  /** Fresh servers; the replica follows the primary from its first binary log event. */
  async start() {
    for (const server of [this.primary, this.replica]) await server.remove();
    await this.primary.start();
    this.primary.sql(
      `CREATE USER IF NOT EXISTS '${REPLICATION_USER}'@'127.0.0.1' IDENTIFIED BY '${REPLICATION_PASSWORD}'; GRANT REPLICATION SLAVE ON *.* TO '${REPLICATION_USER}'@'127.0.0.1'`,
    );
    await this.replica.start();
    this.replica.sql(
      `CHANGE MASTER TO MASTER_HOST='127.0.0.1', MASTER_PORT=${this.primary.paths!.port}, MASTER_USER='${REPLICATION_USER}', MASTER_PASSWORD='${REPLICATION_PASSWORD}', MASTER_USE_GTID=slave_pos; START SLAVE`,
    );
    await this.caughtUp();
  }

  /** Waits until the replica has applied everything the primary has written so far. */
  async caughtUp(timeoutSeconds = 60) {
    const position = this.primary.sql('SELECT @@gtid_binlog_pos').trim();
    const waited = this.replica.sql(`SELECT MASTER_GTID_WAIT('${position}', ${timeoutSeconds})`).trim();
    if (waited !== '0') throw new Error(`the replica did not reach ${position}:\n${this.replica.sql('SHOW SLAVE STATUS\\G')}`);
  }

  /** Stops applying (the replica keeps receiving the primary's log), as a replica falling behind. */
  pauseApplying() {
    this.replica.sql('STOP SLAVE SQL_THREAD');
  }

  resumeApplying() {
    this.replica.sql('START SLAVE SQL_THREAD');
  }

  async remove() {
    await this.replica.remove();
    await this.primary.remove();
  }
}

export class PrivateApp {
  child: ChildProcess | null = null;
  output = '';
  constructor(
    readonly port: number,
    readonly databaseUrl: string,
    readonly extraEnv: Record<string, string> = {},
  ) {}

  get url() {
    return `http://localhost:${this.port}`;
  }

  async start() {
    const env: NodeJS.ProcessEnv = { ...process.env, DATABASE_URL: this.databaseUrl, NODE_ENV: 'production', PORT: String(this.port), APP_URL: this.url, AUTH_URL: this.url, ...this.extraEnv };
    const child = spawn(process.execPath, ['node_modules/next/dist/bin/next', 'start', '-p', String(this.port)], { cwd: repoRoot, env, stdio: ['ignore', 'pipe', 'pipe'] });
    child.stdout!.on('data', (chunk) => (this.output += chunk));
    child.stderr!.on('data', (chunk) => (this.output += chunk));
    this.child = child;
    await poll(`the private app on ${this.port}`, async () => {
      if (child.exitCode !== null) throw new Error(`app exited: ${this.output.slice(-2000)}`);
      return (await fetch(`${this.url}/sign-in`)).status === 200;
    });
  }

  /** kill -9: no shutdown, no flushing, as when the machine loses power. */
  async kill() {
    const child = this.child;
    if (!child || child.exitCode !== null || child.signalCode !== null) return;
    const exited = new Promise((resolve) => child.once('exit', resolve));
    child.kill('SIGKILL');
    await exited;
    this.child = null;
  }

  async stop() {
    const child = this.child;
    if (!child || child.exitCode !== null || child.signalCode !== null) return;
    const exited = new Promise((resolve) => child.once('exit', resolve));
    child.kill('SIGTERM');
    const grace = setTimeout(() => child.kill('SIGKILL'), 10_000);
    await exited;
    clearTimeout(grace);
    this.child = null;
  }
}

/** A session cookie for a user, signed with the app's secret exactly as sign-in would issue it. */
export async function sessionCookie(user: { id: string; role: string; name: string; email: string; sessionVersion: number }) {
  const name = 'authjs.session-token';
  const value = await encode({
    salt: name,
    secret: process.env.AUTH_SECRET!,
    token: { sub: user.id, role: user.role, name: user.name, email: user.email, sessionVersion: user.sessionVersion },
    maxAge: 60 * 60,
  });
  return `${name}=${value}`;
}
