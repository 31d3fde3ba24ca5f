// The production app server: one Next.js server per core behind Node's cluster module, all on one port.
// A Next server runs its JavaScript on one thread, so on a two-core machine a single `next start`
// leaves a core idle while requests queue. Each worker is a stateless app server like any other behind
// a load balancer (sessions are signed cookies; counters, the outbox and payment events live in the
// database). APP_WORKERS sets the count (default: the cores available); PORT and HOSTNAME as for next start.
import cluster from 'node:cluster';
import { createServer } from 'node:http';
import { availableParallelism } from 'node:os';

const port = Number(process.env.PORT ?? 3000);

/** True when the request path decodes: every % starts a two-digit escape and the bytes are UTF-8. */
function hasDecodablePath(url = '/') {
  const path = url.split(/[?#]/, 1)[0];
  if (!path.includes('%')) return true;
  try {
    decodeURIComponent(path);
    return true;
  } catch {
    return false;
  }
}

const hostname = process.env.HOSTNAME_BIND ?? '0.0.0.0';
const workers = Math.max(1, Number(process.env.APP_WORKERS) || availableParallelism());

if (cluster.isPrimary) {
  // APP_WORKER_FLAGS adds Node flags to the workers only, e.g. "--cpu-prof --cpu-prof-dir=tmp/prof" to profile them
  // (flags NODE_OPTIONS refuses).
  const workerFlags = (process.env.APP_WORKER_FLAGS ?? '').split(' ').filter(Boolean);
  if (workerFlags.length) cluster.setupPrimary({ execArgv: [...process.execArgv, ...workerFlags] });
  let stopping = false;
  const fork = () => cluster.fork();
  for (let i = 0; i < workers; i += 1) fork();
  cluster.on('exit', (worker, code, signal) => {
    if (stopping) {
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(0);
      return;
    }
    // A worker that dies is replaced, as a process manager would; the others keep serving meanwhile.
    console.error(`app worker ${worker.process.pid} exited (${signal ?? code}); starting another`);
    fork();
  });
  const stop = () => {
    if (stopping) return;
    stopping = true;
    const running = Object.values(cluster.workers ?? {});
    if (running.length === 0) process.exit(0);
    for (const worker of running) worker?.process.kill('SIGTERM');
    // Workers that do not finish in time are not waited for.
    setTimeout(() => process.exit(0), 6_000).unref();
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
  console.log(`app: ${workers} worker${workers === 1 ? '' : 's'} on http://localhost:${port}`);
} else {
  const { default: next } = await import('next');
  const app = next({ dev: false, dir: process.cwd(), hostname: 'localhost', port });
  const handle = app.getRequestHandler();
  await app.prepare();
  const server = createServer((request, response) => {
    // A path whose percent-encoding is broken (`/verify/%ZZ`) makes Next.js fail while matching a
    // dynamic route and answer a bare 500 (an App Router app has no /400 page to show). No page of ours
    // has such an address: send it to a path that can never be a route (folders starting with "_"
    // are private in the App Router), which Next answers with the product's 404 page and headers.
    if (!hasDecodablePath(request.url)) request.url = '/_malformed-address';
    // Like any proxy, add the address of the peer that connected to X-Forwarded-For. The app reads the
    // visitor's address counting TRUSTED_PROXY_COUNT entries back from this one (lib/auth/client-ip.ts),
    // so whatever a visitor writes in the header themselves is never taken for their address.
    const peer = request.socket.remoteAddress;
    if (peer) {
      const forwarded = request.headers['x-forwarded-for'];
      request.headers['x-forwarded-for'] = forwarded ? `${forwarded}, ${peer}` : peer;
    }
    return handle(request, response);
  });
  server.listen(port, hostname);
  process.on('SIGTERM', () => {
    server.close(() => process.exit(0));
    server.closeIdleConnections();
  });
  // The primary is gone (stopped or killed): a worker must not outlive it and hold the port.
  process.on('disconnect', () => process.exit(0));
}
