import { z } from 'zod';
import { isLocalUploadthingToken, isLoopbackUrl, LOCAL_STRIPE_SECRET_KEY, LOCAL_STRIPE_WEBHOOK_SECRET } from './local-secrets';

// The one place that reads process.env. Everything configurable is listed and checked here.
const optionalUrl = z.url().optional();

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  DATABASE_URL: z.string().regex(/^mysql:\/\//, 'must be a mysql:// URL'),
  // Comma-separated read-replica URLs; reads go there, writes to DATABASE_URL.
  DATABASE_REPLICA_URLS: z.string().optional(),
  DATABASE_POOL_SIZE: z.coerce.number().int().min(1).max(200).default(20),
  APP_URL: z.url().default('http://localhost:3000'),
  AUTH_SECRET: z.string().min(32, 'must be at least 32 characters').optional(),
  STRIPE_SECRET_KEY: z.string().startsWith('sk_').optional(),
  STRIPE_WEBHOOK_SECRET: z.string().startsWith('whsec_').optional(),
  // Where the Stripe SDK sends API calls; unset means Stripe's own API.
  STRIPE_API_URL: optionalUrl,
  SMTP_URL: z.string().regex(/^smtps?:\/\//, 'must be an smtp:// or smtps:// URL').optional(),
  MAIL_FROM: z.string().default('Waygrade <reports@waygrade.example>'),
  // How often each app server drains the e-mail outbox; 0 turns the worker off on this server.
  MAIL_WORKER_INTERVAL_MS: z.coerce.number().int().min(0).max(600_000).default(3_000),
  // How often each app server renders and stores the PDFs of newly released reports; 0 turns it off here.
  REPORT_PDF_WORKER_INTERVAL_MS: z.coerce.number().int().min(0).max(600_000).default(3_000),
  UPLOADTHING_TOKEN: z.string().optional(),
  UPLOADS_PUBLIC_URL: optionalUrl,
  // `production` refuses the published local stand-in secrets. Unset: `production` when APP_URL is not
  // on this machine (localhost, 127.x, ::1), else `local`. NODE_ENV says how the app was built, not this.
  WAYGRADE_DEPLOYMENT: z.enum(['local', 'production']).optional(),
  // How many proxies of our own (load balancers) stand in front of the app server. The visitor's
  // address is the entry that many places left of the socket's in X-Forwarded-For; 0 = the socket.
  TRUSTED_PROXY_COUNT: z.coerce.number().int().min(0).max(10).default(0),
});

export type Env = Omit<z.infer<typeof envSchema>, 'WAYGRADE_DEPLOYMENT'> & { WAYGRADE_DEPLOYMENT: 'local' | 'production' };

/**
 * The local stand-in secrets are published, so a webhook or upload callback signed with them can be
 * forged by anyone. They are refused in a production deployment, and anywhere beside a real payments
 * key (a real key with the local webhook secret would let a forged webhook grant a report).
 */
function localSecretProblems(config: z.infer<typeof envSchema>, deployment: 'local' | 'production'): string[] {
  const local = [
    config.STRIPE_SECRET_KEY === LOCAL_STRIPE_SECRET_KEY && 'STRIPE_SECRET_KEY',
    config.STRIPE_WEBHOOK_SECRET === LOCAL_STRIPE_WEBHOOK_SECRET && 'STRIPE_WEBHOOK_SECRET',
    config.UPLOADTHING_TOKEN !== undefined && isLocalUploadthingToken(config.UPLOADTHING_TOKEN) && 'UPLOADTHING_TOKEN',
  ].filter((name): name is string => Boolean(name));
  if (deployment === 'production') {
    return local.map((name) => `  ${name}: is the published local stand-in value, refused in a production deployment (WAYGRADE_DEPLOYMENT=production, or an APP_URL not on this machine); set the real one`);
  }
  const realPaymentsKey = config.STRIPE_SECRET_KEY !== undefined && config.STRIPE_SECRET_KEY !== LOCAL_STRIPE_SECRET_KEY;
  if (!realPaymentsKey) return [];
  return local.map((name) => `  ${name}: is the published local stand-in value beside a real STRIPE_SECRET_KEY; set the real one too, never mix them`);
}

/** Validates a set of environment variables (process.env by default). */
export function readEnv(source: Record<string, string | undefined> = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid environment configuration:\n${lines.join('\n')}`);
  }
  const deployment = parsed.data.WAYGRADE_DEPLOYMENT ?? (isLoopbackUrl(parsed.data.APP_URL) ? 'local' : 'production');
  const problems = localSecretProblems(parsed.data, deployment);
  if (problems.length > 0) throw new Error(`Invalid environment configuration:\n${problems.join('\n')}`);
  return { ...parsed.data, WAYGRADE_DEPLOYMENT: deployment };
}

let cached: Env | undefined;

/** Validated environment, read once on first use (not at import, so builds need no database). */
export function env(): Env {
  cached ??= readEnv();
  return cached;
}
