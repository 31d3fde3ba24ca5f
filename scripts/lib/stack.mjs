// Brings up everything Waygrade needs on one machine: npm packages, the private MariaDB, the local
// stand-ins for payments, uploads and mail, the schema, and (when asked) the demo data.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ProcessGroup, portIsOpen, run, waitForPort } from './processes.mjs';
import { appConnectionCount, databaseUrl, startMariaDb, stopMariaDb } from './mariadb.mjs';
import { ensureDebianPackage, findProgram } from './debian-package.mjs';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

/**
 * Ports per mode, so `npm test` can run while `npm start` is serving. WAYGRADE_PORT_OFFSET shifts
 * every port and gives separate databases and build folders, for several working copies at once.
 */
const OFFSET = Number(process.env.WAYGRADE_PORT_OFFSET ?? 0);
const suffix = OFFSET ? `_${OFFSET}` : '';
export const PROFILES = {
  start: { database: `waygrade${suffix}`, app: 3000 + OFFSET, payments: 12111 + OFFSET, uploads: 12112 + OFFSET, smtp: 12025 + OFFSET, mailWeb: 12080 + OFFSET },
  test: { database: `waygrade_test${suffix}`, app: 3100 + OFFSET, payments: 12211 + OFFSET, uploads: 12212 + OFFSET, smtp: 12125 + OFFSET, mailWeb: 12180 + OFFSET },
};
export const NEXT_DIST_DIR = OFFSET ? `.next-${OFFSET}` : '.next';

// Published stand-in secrets: lib/env.ts refuses them outside local use (same values in lib/local-secrets.ts).
export const LOCAL_STRIPE_SECRET_KEY = 'sk_test_waygrade_local';
export const LOCAL_STRIPE_WEBHOOK_SECRET = 'whsec_waygrade_local';
// uploadthing token for the local upload service: base64 JSON of apiKey, appId and regions.
// Same values as services/uploads/local-token.ts.
export const LOCAL_UPLOADTHING_API_KEY = 'sk_live_waygrade_local_0f3c9a7e52d14b8e9a6c1d2e3f405162';
export const LOCAL_UPLOADTHING_APP_ID = 'waygrade-local';

export function localUploadthingToken() {
  return Buffer.from(
    JSON.stringify({ apiKey: LOCAL_UPLOADTHING_API_KEY, appId: LOCAL_UPLOADTHING_APP_ID, regions: ['local'] }),
  ).toString('base64');
}

/**
 * Which local stand-in secrets may fill in what is unset, by the rule lib/env.ts applies: none in a
 * production deployment (WAYGRADE_DEPLOYMENT=production, or unset with an APP_URL not on this
 * machine), and none beside a real STRIPE_SECRET_KEY. Throws, naming what is missing, instead of
 * starting with a mix.
 */
export function checkLocalFallbacks(source = process.env) {
  const appUrl = source.APP_URL ?? 'http://localhost:3000';
  const host = new URL(appUrl).hostname;
  const onThisMachine = host === 'localhost' || host.endsWith('.localhost') || host === '[::1]' || /^127\.\d+\.\d+\.\d+$/.test(host);
  const deployment = source.WAYGRADE_DEPLOYMENT ?? (onThisMachine ? 'local' : 'production');
  const secrets = ['STRIPE_SECRET_KEY', 'STRIPE_WEBHOOK_SECRET', 'UPLOADTHING_TOKEN'];
  const missing = secrets.filter((name) => !source[name]);
  if (missing.length === 0) return;
  if (deployment === 'production') {
    throw new Error(`A production deployment (WAYGRADE_DEPLOYMENT=production, or APP_URL ${appUrl} not on this machine) gets no local stand-in secrets: set ${missing.join(', ')}.`);
  }
  if (source.STRIPE_SECRET_KEY && source.STRIPE_SECRET_KEY !== LOCAL_STRIPE_SECRET_KEY) {
    throw new Error(`A real STRIPE_SECRET_KEY is set: set ${missing.join(', ')} as well; the local stand-in values are never mixed with a real key.`);
  }
}

const node = process.execPath;
const tsx = ['--import', 'tsx'];

export async function ensureNodeModules() {
  if (existsSync(path.join(root, 'node_modules', '.package-lock.json')) && existsSync(path.join(root, 'node_modules', 'next'))) return;
  console.log('Installing npm packages (npm ci)…');
  await run('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root });
}

/** A long random secret kept in the git-ignored .data folder, so sessions survive restarts. */
function localSecret(name) {
  const dir = path.join(root, '.data');
  mkdirSync(dir, { recursive: true });
  const file = path.join(dir, name);
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
  return readFileSync(file, 'utf8').trim();
}

/**
 * Starts the database and the stand-ins. Returns the environment the app and the tests need,
 * and a stop function that ends only what was started here.
 */
export async function bringUp(mode, { resetDatabase = false } = {}) {
  const ports = PROFILES[mode];
  const group = new ProcessGroup();
  let stopDatabase = false;
  const appUrl = `http://localhost:${ports.app}`;

  const stop = async () => {
    await group.stopAll();
    // A server this run started is stopped again, unless other programs (another run with its own
    // WAYGRADE_PORT_OFFSET, a benchmark) have connected to it meanwhile: they would lose their database.
    if (stopDatabase) {
      const others = appConnectionCount(root);
      if (others === 0) await stopMariaDb(root);
      else console.log(`MariaDB left running: ${others} connection(s) from other programs`);
    }
  };

  try {
    checkLocalFallbacks();
    let databaseUrlForApp = process.env.DATABASE_URL;
    if (!databaseUrlForApp) {
      const { paths, startedHere } = await startMariaDb(root, [PROFILES.start.database, PROFILES.test.database]);
      stopDatabase = startedHere;
      databaseUrlForApp = databaseUrl(paths, ports.database);
      if (resetDatabase) await resetSchema(paths, ports.database);
    }

    const env = {
      ...process.env,
      TZ: 'UTC',
      NEXT_TELEMETRY_DISABLED: '1',
      NEXT_DIST_DIR,
      DATABASE_URL: databaseUrlForApp,
      APP_URL: process.env.APP_URL ?? appUrl,
      AUTH_URL: process.env.AUTH_URL ?? appUrl,
      AUTH_SECRET: process.env.AUTH_SECRET ?? localSecret('auth-secret'),
      AUTH_TRUST_HOST: 'true',
      STRIPE_SECRET_KEY: process.env.STRIPE_SECRET_KEY ?? LOCAL_STRIPE_SECRET_KEY,
      STRIPE_WEBHOOK_SECRET: process.env.STRIPE_WEBHOOK_SECRET ?? LOCAL_STRIPE_WEBHOOK_SECRET,
      STRIPE_API_URL: process.env.STRIPE_API_URL ?? `http://127.0.0.1:${ports.payments}`,
      SMTP_URL: process.env.SMTP_URL ?? `smtp://127.0.0.1:${ports.smtp}`,
      MAIL_WEB_URL: `http://localhost:${ports.mailWeb}`,
      UPLOADTHING_TOKEN: process.env.UPLOADTHING_TOKEN ?? localUploadthingToken(),
      UPLOADS_PUBLIC_URL: process.env.UPLOADS_PUBLIC_URL ?? `http://localhost:${ports.uploads}`,
    };
    const useLocalUploads = !process.env.UPLOADTHING_TOKEN;
    if (useLocalUploads) {
      env.UPLOADTHING_API_URL = `http://localhost:${ports.uploads}`;
      env.UPLOADTHING_UFS_HOST = `localhost:${ports.uploads}`;
      env.UPLOADTHING_UFS_APP_ID_LOCATION = 'path';
      env.UPLOADTHING_INGEST_URL = `http://localhost:${ports.uploads}`;
      env.UPLOADTHING_IS_DEV = 'false';
      env.UPLOADTHING_CALLBACK_URL = `${appUrl}/api/uploadthing`;
    }

    const standIns = [
      {
        name: 'payments',
        entry: 'services/payments/main.ts',
        port: ports.payments,
        env: {
          PAYMENTS_PORT: String(ports.payments),
          PAYMENTS_PUBLIC_URL: `http://localhost:${ports.payments}`,
          PAYMENTS_WEBHOOK_URL: `${appUrl}/api/payments/webhook`,
          STRIPE_WEBHOOK_SECRET: env.STRIPE_WEBHOOK_SECRET,
        },
        wanted: !process.env.STRIPE_API_URL && !process.env.STRIPE_SECRET_KEY,
      },
      {
        name: 'uploads',
        entry: 'services/uploads/main.ts',
        port: ports.uploads,
        env: {
          UPLOADS_PORT: String(ports.uploads),
          UPLOADS_DATA_DIR: path.join(root, '.data', `${mode === 'test' ? 'uploads-test' : 'uploads'}${suffix}`),
          UPLOADS_PUBLIC_URL: `http://localhost:${ports.uploads}`,
          UPLOADTHING_TOKEN: env.UPLOADTHING_TOKEN,
        },
        wanted: useLocalUploads,
      },
      {
        name: 'mail',
        entry: 'services/mail/main.ts',
        port: ports.smtp,
        env: { MAIL_SMTP_PORT: String(ports.smtp), MAIL_WEB_PORT: String(ports.mailWeb) },
        wanted: !process.env.SMTP_URL,
      },
    ];
    for (const port of [ports.app, ...standIns.filter((s) => s.wanted).map((s) => s.port)]) {
      if (await portIsOpen(port)) {
        throw new Error(`Port ${port} is already in use — is another Waygrade running? Stop it, or run with WAYGRADE_PORT_OFFSET=<n> to shift every port.`);
      }
    }
    for (const service of standIns) {
      if (!service.wanted || !existsSync(path.join(root, service.entry))) continue;
      const child = group.start(service.name, node, [...tsx, service.entry], {
        cwd: root,
        env: { ...env, ...service.env },
        quiet: mode === 'test',
      });
      await waitForPort(service.port, { child, name: `${service.name} stand-in`, timeoutMs: 30_000 });
    }

    await run(node, [...tsx, 'scripts/migrate.ts'], { cwd: root, env });
    return { env, ports, group, stop, appUrl };
  } catch (error) {
    await stop();
    throw error;
  }
}

/** Drops and recreates a database so a test run starts from nothing. */
async function resetSchema(paths, database) {
  const { spawnSync } = await import('node:child_process');
  const result = spawnSync(
    findProgram('mariadb') ?? 'mariadb',
    ['--no-defaults', `--socket=${paths.socket}`, '-uroot', '-e', `DROP DATABASE IF EXISTS \`${database}\`; CREATE DATABASE \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`],
    { encoding: 'utf8' },
  );
  if (result.status !== 0) throw new Error(`Could not reset ${database}: ${result.stderr}`);
}

/**
 * The stack `npm test` and `npm run screenshots` run on: npm packages, Debian's chromium and
 * poppler-utils (the PDF tests read text with pdftotext and render pages with pdftoppm), the test
 * profile with its database reset, and the demo data. Returns the stack (to stop) and the tests' env.
 */
export async function bringUpTestStack() {
  await ensureNodeModules();
  const chromium = ensureDebianPackage('chromium', 'chromium');
  ensureDebianPackage('pdftotext', 'poppler-utils');
  const stack = await bringUp('test', { resetDatabase: true });
  const env = { ...stack.env, CHROMIUM_PATH: chromium, NODE_ENV: 'test' };
  try {
    await run(process.execPath, ['--conditions=react-server', '--import', 'tsx', 'db/seed/index.ts'], { cwd: root, env });
  } catch (error) {
    await stack.stop();
    throw error;
  }
  return { stack, env };
}

/** Builds the app for production. */
export async function buildApp(env) {
  await run(node, ['node_modules/next/dist/bin/next', 'build'], { cwd: root, env });
}

/** The built app, one Next.js server per core (scripts/app-server.mjs). */
export function startApp(group, env, port) {
  return group.start('app', node, ['scripts/app-server.mjs'], {
    cwd: root,
    env: { ...env, NODE_ENV: 'production', PORT: String(port) },
  });
}
