import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { rmSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { encode } from 'next-auth/jwt';
import { databaseUrl, startMariaDb, stopMariaDb } from '@/scripts/lib/mariadb.mjs';

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
  constructor(readonly name: string) {
    // startMariaDb keeps its data in <root>/.data/mariadb; a root of our own gives a server of our own.
    this.root = path.join(repoRoot, '.data', `private-${name}`);
  }

  async start() {
    const saved = process.env.MARIADB_PORT;
    delete process.env.MARIADB_PORT;
    try {
      const { paths } = await startMariaDb(this.root, [this.name], quiet);
      this.url = databaseUrl(paths, this.name);
    } finally {
      if (saved !== undefined) process.env.MARIADB_PORT = saved;
    }
    return this.url;
  }

  async stop() {
    await stopMariaDb(this.root, quiet);
  }

  migrate() {
    const result = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/migrate.ts'], { cwd: repoRoot, env: { ...process.env, DATABASE_URL: this.url }, encoding: 'utf8' });
    if (result.status !== 0) throw new Error(`migration failed: ${result.stderr}`);
  }

  async remove() {
    await this.stop();
    rmSync(this.root, { recursive: true, force: true });
  }
}

export class PrivateApp {
  child: ChildProcess | null = null;
  output = '';
  constructor(
    readonly port: number,
    readonly databaseUrl: string,
  ) {}

  get url() {
    return `http://localhost:${this.port}`;
  }

  async start() {
    const env: NodeJS.ProcessEnv = { ...process.env, DATABASE_URL: this.databaseUrl, NODE_ENV: 'production', PORT: String(this.port), APP_URL: this.url, AUTH_URL: this.url };
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
