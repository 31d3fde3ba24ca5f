import { z } from 'zod';

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
  UPLOADTHING_TOKEN: z.string().optional(),
  UPLOADS_PUBLIC_URL: optionalUrl,
  // How many proxies of our own (load balancers) stand in front of the app server. The visitor's
  // address is the entry that many places left of the socket's in X-Forwarded-For; 0 = the socket.
  TRUSTED_PROXY_COUNT: z.coerce.number().int().min(0).max(10).default(0),
});

export type Env = z.infer<typeof envSchema>;

function readEnv(): Env {
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid environment configuration:\n${lines.join('\n')}`);
  }
  return parsed.data;
}

let cached: Env | undefined;

/** Validated environment, read once on first use (not at import, so builds need no database). */
export function env(): Env {
  cached ??= readEnv();
  return cached;
}
