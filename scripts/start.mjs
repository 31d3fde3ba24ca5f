// npm start: everything Waygrade needs, then the app on http://localhost:3000 with demo data.
// npm run dev: the same with `next dev`. Ctrl-C stops what this command started.
import { bringUp, buildApp, ensureNodeModules, root, startApp } from './lib/stack.mjs';
import { run, waitForHttp } from './lib/processes.mjs';

const dev = process.argv.includes('--dev');
const startedAt = Date.now();

await ensureNodeModules();
let stack;
let stopping = false;

async function shutdown(code = 0) {
  if (stopping) return;
  stopping = true;
  console.log('\nStopping Waygrade…');
  if (stack) await stack.stop();
  process.exit(code);
}
process.on('SIGINT', () => void shutdown(0));
process.on('SIGTERM', () => void shutdown(0));

try {
  stack = await bringUp('start');
  const { env, group, appUrl, ports } = stack;
  await run(process.execPath, ['--conditions=react-server', '--import', 'tsx', 'db/seed/index.ts', '--if-empty'], { cwd: root, env });

  let app;
  if (dev) {
    app = group.start('app', process.execPath, ['node_modules/next/dist/bin/next', 'dev', '-p', String(ports.app)], { cwd: root, env });
  } else {
    await buildApp(env);
    app = startApp(group, env, ports.app);
  }
  await waitForHttp(appUrl, { child: app, name: 'app' });
  app.once('exit', (code) => {
    if (!stopping) {
      console.error(`The app server exited (${code}).`);
      void shutdown(1);
    }
  });
  const { DEMO_LOGINS } = await import('../db/seed/demo-logins.mjs');
  console.log(`
Waygrade is running at ${appUrl}   (ready in ${Math.round((Date.now() - startedAt) / 1000)} s)

Demo sign-ins (password for all: ${DEMO_LOGINS.password}):
${DEMO_LOGINS.accounts.map((a) => `  ${a.role.padEnd(10)} ${a.email}`).join('\n')}

Mail sink (every e-mail the app sends): ${env.MAIL_WEB_URL}
Press Ctrl-C to stop.`);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  await shutdown(1);
}
