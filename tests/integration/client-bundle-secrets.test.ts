import { mkdtempSync, mkdirSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { scanForSecrets, serverSecrets } from '../support/bundle-secrets';

// The build the app under test was started from (scripts/test.mjs builds before the integration tests).
const staticDir = path.resolve(process.env.NEXT_DIST_DIR ?? '.next', 'static');

describe('the client bundles', () => {
  const planted = mkdtempSync(path.join(tmpdir(), 'waygrade-bundle-scan-'));
  afterAll(() => rmSync(planted, { recursive: true, force: true }));

  it('knows every server secret of this environment', () => {
    const names = serverSecrets().map((s) => s.name);
    expect(names).toEqual(
      expect.arrayContaining(['AUTH_SECRET', 'STRIPE_SECRET_KEY', 'STRIPE_WEBHOOK_SECRET', 'uploadthing apiKey', 'DATABASE_URL', 'database password']),
    );
  });

  it('finds a secret planted in a chunk, so a clean scan means something', () => {
    const secrets = serverSecrets();
    mkdirSync(path.join(planted, 'chunks'), { recursive: true });
    writeFileSync(path.join(planted, 'chunks', 'clean.js'), 'self.__chunk=function(){return 1}');
    writeFileSync(path.join(planted, 'chunks', 'leaky.js'), `const k=${JSON.stringify(secrets.find((s) => s.name === 'STRIPE_SECRET_KEY')!.value)};`);
    const { scanned, leaks } = scanForSecrets(planted, secrets);
    expect(scanned).toBe(2);
    expect(leaks).toEqual([{ file: path.join('chunks', 'leaky.js'), secret: 'STRIPE_SECRET_KEY' }]);
  });

  it('contain no server secret: auth secret, payment keys, upload key, database address or password', () => {
    expect(existsSync(staticDir), `no build output at ${staticDir}`).toBe(true);
    const { scanned, leaks } = scanForSecrets(staticDir, serverSecrets());
    expect(scanned).toBeGreaterThan(10);
    expect(leaks).toEqual([]);
  });
});
