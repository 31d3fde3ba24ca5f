import 'server-only';
import Stripe from 'stripe';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';

/**
 * Connection options from the environment. With STRIPE_API_URL set (a local or proxied API) the
 * SDK is pointed at it and makes exactly one attempt per call, so a test sees each request once.
 */
export function stripeConnectionOptions(apiUrl: string | undefined): Stripe.StripeConfig {
  if (!apiUrl) return {};
  const url = new URL(apiUrl);
  const protocol = url.protocol === 'https:' ? 'https' : 'http';
  return { host: url.hostname, port: Number(url.port || (protocol === 'https' ? 443 : 80)), protocol, maxNetworkRetries: 0 };
}

let client: Stripe | undefined;

/** The payment provider's SDK, built once from STRIPE_SECRET_KEY and STRIPE_API_URL. */
export function stripeClient(): Stripe {
  if (client) return client;
  const { STRIPE_SECRET_KEY, STRIPE_API_URL } = env();
  if (!STRIPE_SECRET_KEY) throw new AppError('unavailable', 'Payments are not set up on this server. Nothing was charged.');
  client = new Stripe(STRIPE_SECRET_KEY, { ...stripeConnectionOptions(STRIPE_API_URL), appInfo: { name: 'Waygrade' } });
  return client;
}

/** The secret that signs the provider's webhooks; without it no event can be trusted. */
export function webhookSecret(): string {
  const secret = env().STRIPE_WEBHOOK_SECRET;
  if (!secret) throw new AppError('unavailable', 'Payment webhooks are not set up on this server.');
  return secret;
}
