import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';

export type Secret = { name: string; value: string };

/** The server-only values that must never reach a browser, from the environment the app runs with. */
export function serverSecrets(env: NodeJS.ProcessEnv = process.env): Secret[] {
  const secrets: Secret[] = [];
  const add = (name: string, value: string | undefined) => {
    // Very short values would match by chance; every real secret here is far longer.
    if (value && value.length >= 8) secrets.push({ name, value });
  };
  add('AUTH_SECRET', env.AUTH_SECRET);
  add('STRIPE_SECRET_KEY', env.STRIPE_SECRET_KEY);
  add('STRIPE_WEBHOOK_SECRET', env.STRIPE_WEBHOOK_SECRET);
  add('UPLOADTHING_TOKEN', env.UPLOADTHING_TOKEN);
  if (env.UPLOADTHING_TOKEN) {
    try {
      const token = JSON.parse(Buffer.from(env.UPLOADTHING_TOKEN, 'base64').toString('utf8')) as { apiKey?: string };
      add('uploadthing apiKey', token.apiKey);
    } catch {
      // Not a token uploadthing would accept either; the raw value is still checked.
    }
  }
  add('DATABASE_URL', env.DATABASE_URL);
  if (env.DATABASE_URL) {
    const password = decodeURIComponent(new URL(env.DATABASE_URL).password);
    add('database password', password);
  }
  return secrets;
}

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? filesUnder(full) : [full];
  });
}

export type Leak = { file: string; secret: string };

/** Every client file (scripts, styles, source maps, manifests) under `staticDir` that contains a secret. */
export function scanForSecrets(staticDir: string, secrets: Secret[]): { scanned: number; leaks: Leak[] } {
  const files = filesUnder(staticDir).filter((file) => /\.(js|mjs|css|map|json|txt|html)$/.test(file));
  const leaks: Leak[] = [];
  for (const file of files) {
    const text = readFileSync(file, 'utf8');
    for (const secret of secrets) {
      if (text.includes(secret.value)) leaks.push({ file: path.relative(staticDir, file), secret: secret.name });
    }
  }
  return { scanned: files.length, leaks };
}
