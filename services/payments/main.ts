import { DEFAULT_RETRY_DELAYS_MS, startPaymentsStandIn } from './server';

// Runs the payments stand-in for the start and test scripts, configured by environment only.

function retryDelaysFromEnv(value: string | undefined): number[] {
  if (!value) return DEFAULT_RETRY_DELAYS_MS;
  const delays = value.split(',').map((part) => Number(part.trim()));
  if (delays.some((delay) => !Number.isInteger(delay) || delay < 0)) {
    throw new Error(`PAYMENTS_WEBHOOK_RETRY_DELAYS_MS must be comma-separated milliseconds, got "${value}"`);
  }
  return delays;
}

const port = Number(process.env.PAYMENTS_PORT ?? 12111);
const standIn = await startPaymentsStandIn({
  port,
  host: process.env.PAYMENTS_HOST ?? '127.0.0.1',
  webhookUrl: process.env.PAYMENTS_WEBHOOK_URL ?? 'http://localhost:3000/api/payments/webhook',
  webhookSecret: process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_waygrade_local',
  // Unset means http://localhost:<the port actually bound>, i.e. http://localhost:12111 by default.
  publicUrl: process.env.PAYMENTS_PUBLIC_URL || undefined,
  retryDelaysMs: retryDelaysFromEnv(process.env.PAYMENTS_WEBHOOK_RETRY_DELAYS_MS),
  stateFile: process.env.PAYMENTS_STATE_FILE || undefined,
});
console.log(`payments stand-in listening on ${standIn.url}`);

let stopping = false;
async function stop(): Promise<void> {
  if (stopping) return;
  stopping = true;
  await standIn.close();
  process.exit(0);
}
process.on('SIGINT', () => void stop());
process.on('SIGTERM', () => void stop());
