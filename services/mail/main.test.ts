import { spawn } from 'node:child_process';
import { once } from 'node:events';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const MAIN = fileURLToPath(new URL('./main.ts', import.meta.url));

describe('mail sink process', () => {
  it('logs one line when listening and exits 0 on SIGTERM', async () => {
    const child = spawn(process.execPath, ['--import', 'tsx', MAIN], {
      env: { ...process.env, MAIL_SMTP_PORT: '0', MAIL_WEB_PORT: '0' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => (output += chunk.toString()));
    await new Promise<void>((resolve, reject) => {
      child.stdout.on('data', () => output.includes('\n') && resolve());
      child.once('exit', (code) => reject(new Error(`exited early with ${code}`)));
    });
    const webUrl = /web on (http:\/\/\S+)/.exec(output)?.[1];
    expect(webUrl).toBeDefined();
    expect((await fetch(`${webUrl}/api/messages`)).status).toBe(200);

    child.kill('SIGTERM');
    const [code] = await once(child, 'exit');
    expect(code).toBe(0);
    expect(output.trim().split('\n')).toHaveLength(1);
  }, 20_000);
});
