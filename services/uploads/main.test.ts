import { spawn } from 'node:child_process';
import { mkdtemp, rm } from 'node:fs/promises';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const projectRoot = path.resolve(import.meta.dirname, '../..');

async function findFreePort(): Promise<number> {
  const probe = createServer();
  await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
  const { port } = probe.address() as { port: number };
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  return port;
}

describe('uploads service entry point', () => {
  it('listens on UPLOADS_PORT, logs one line and exits 0 on SIGTERM', async () => {
    const dataDir = await mkdtemp(path.join(tmpdir(), 'waygrade-uploads-'));
    const port = await findFreePort();
    const child = spawn(process.execPath, ['--import', 'tsx', 'services/uploads/main.ts'], {
      cwd: projectRoot,
      env: { ...process.env, UPLOADS_PORT: String(port), UPLOADS_DATA_DIR: dataDir },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => (output += chunk.toString()));
    const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
    try {
      const deadline = Date.now() + 15_000;
      while (!output.includes('listening') && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 50));
      expect(output).toContain(`listening on http://127.0.0.1:${port}`);

      const missing = await fetch(`http://127.0.0.1:${port}/f/no-such-key`);
      expect(missing.status).toBe(404);
      const unauthorised = await fetch(`http://127.0.0.1:${port}/v6/listFiles`, { method: 'POST', body: '{}' });
      expect(unauthorised.status).toBe(401);

      child.kill('SIGTERM');
      expect(await exited).toBe(0);
    } finally {
      if (child.exitCode === null) child.kill('SIGKILL');
      await rm(dataDir, { recursive: true, force: true });
    }
  }, 30_000);
});
