// Installs a Debian package when the program it provides is missing. Only root may run apt-get;
// anyone else gets a message that says what to install.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const SYSTEM_PATHS = ['/usr/sbin', '/usr/bin', '/sbin', '/bin', '/usr/local/bin'];

export function findProgram(name) {
  const found = spawnSync('sh', ['-c', `command -v ${name}`], { encoding: 'utf8' });
  if (found.status === 0 && found.stdout.trim()) return found.stdout.trim();
  for (const dir of SYSTEM_PATHS) {
    if (existsSync(`${dir}/${name}`)) return `${dir}/${name}`;
  }
  return null;
}

export function ensureDebianPackage(program, debianPackage, log = console.log) {
  const existing = findProgram(program);
  if (existing) return existing;
  if (typeof process.getuid === 'function' && process.getuid() !== 0) {
    throw new Error(
      `${program} is not installed and this is not root, so it cannot be installed here.\n` +
        `Install it with: sudo apt-get install -y ${debianPackage}  (or set DATABASE_URL to an existing server)`,
    );
  }
  log(`Installing Debian package ${debianPackage} (provides ${program})…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const install = () =>
    spawnSync('apt-get', ['install', '-y', '--no-install-recommends', debianPackage], { stdio: 'inherit', env });
  if (install().status !== 0) {
    execFileSync('apt-get', ['update'], { stdio: 'inherit', env });
    if (install().status !== 0) throw new Error(`apt-get install ${debianPackage} failed`);
  }
  const installed = findProgram(program);
  if (!installed) throw new Error(`${debianPackage} installed but ${program} is still not found`);
  return installed;
}
