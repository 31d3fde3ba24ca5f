// The stand-in secrets `npm start` and `npm test` use on one machine. They are published in the
// README, so anyone can sign with them: lib/env.ts refuses them outside local use. The same values
// are in scripts/lib/stack.mjs and services/uploads/local-token.ts (lib/local-secrets.test.ts
// checks that they agree).

export const LOCAL_STRIPE_SECRET_KEY = 'sk_test_waygrade_local';
export const LOCAL_STRIPE_WEBHOOK_SECRET = 'whsec_waygrade_local';
export const LOCAL_UPLOADTHING_API_KEY = 'sk_live_waygrade_local_0f3c9a7e52d14b8e9a6c1d2e3f405162';

/** Whether an uploadthing token carries the local stand-in's API key. */
export function isLocalUploadthingToken(token: string): boolean {
  try {
    const decoded = JSON.parse(Buffer.from(token, 'base64').toString('utf8')) as { apiKey?: unknown };
    return decoded.apiKey === LOCAL_UPLOADTHING_API_KEY;
  } catch {
    return false;
  }
}

const LOOPBACK_HOSTS = new Set(['localhost', '127.0.0.1', '[::1]', '::1']);

/** A URL whose host is this machine (localhost, 127.0.0.0/8, ::1). */
export function isLoopbackUrl(url: string): boolean {
  const { hostname } = new URL(url);
  return LOOPBACK_HOSTS.has(hostname) || hostname.endsWith('.localhost') || /^127\.\d+\.\d+\.\d+$/.test(hostname);
}
