// Child processes that the start and test commands own: started in order, stopped in reverse.
import { spawn } from 'node:child_process';
import net from 'node:net';

const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

export function portIsOpen(port, host = '127.0.0.1') {
  return new Promise((resolve) => {
    const socket = net.connect({ port, host });
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });
}

export async function waitForPort(port, { timeoutMs = 60_000, child, name } = {}) {
  const deadline = Date.now() + timeoutMs;
  while (!(await portIsOpen(port))) {
    if (child && child.exitCode !== null) throw new Error(`${name ?? 'process'} exited with code ${child.exitCode}`);
    if (Date.now() > deadline) throw new Error(`${name ?? 'process'} did not listen on port ${port} within ${timeoutMs / 1000} s`);
    await sleep(150);
  }
}

export async function waitForHttp(url, { timeoutMs = 120_000, child, name } = {}) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    if (child && child.exitCode !== null) throw new Error(`${name ?? 'process'} exited with code ${child.exitCode}`);
    try {
      const response = await fetch(url, { redirect: 'manual' });
      if (response.status < 500) return;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`${url} did not answer within ${timeoutMs / 1000} s`);
    await sleep(300);
  }
}

export class ProcessGroup {
  children = [];

  /** Starts a long-running child; its output is prefixed with its name. */
  start(name, command, args, { env, cwd, quiet = false } = {}) {
    const child = spawn(command, args, { env, cwd, stdio: ['ignore', 'pipe', 'pipe'] });
    const prefix = (chunk) =>
      chunk
        .toString()
        .split('\n')
        .filter(Boolean)
        .map((line) => `[${name}] ${line}`)
        .join('\n');
    child.stdout.on('data', (chunk) => {
      if (!quiet) console.log(prefix(chunk));
    });
    child.stderr.on('data', (chunk) => console.error(prefix(chunk)));
    this.children.push({ name, child });
    return child;
  }

  async stopAll() {
    for (const { child } of [...this.children].reverse()) {
      if (child.exitCode !== null || child.signalCode !== null) continue;
      child.kill('SIGTERM');
      const exited = new Promise((resolve) => child.once('exit', resolve));
      const timedOut = sleep(8_000).then(() => 'timeout');
      if ((await Promise.race([exited, timedOut])) === 'timeout') child.kill('SIGKILL');
    }
    this.children = [];
  }
}

/** Runs a command to completion, inheriting the terminal; rejects on a non-zero exit. */
export function run(command, args, { env, cwd, allowFailure = false } = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { env, cwd, stdio: 'inherit' });
    child.once('exit', (code, signal) => {
      if (code === 0 || allowFailure) resolve(code ?? 1);
      else reject(new Error(`${command} ${args.join(' ')} failed (${signal ?? code})`));
    });
    child.once('error', reject);
  });
}
