import { createHmac } from 'node:crypto';

// Stripe signs each webhook delivery with the endpoint's secret: HMAC-SHA256 over
// "<timestamp>.<exact request body>", sent as `Stripe-Signature: t=<timestamp>,v1=<hex>`.
// (https://docs.stripe.com/webhooks#verify-manually). The `whsec_` secret is used as-is as the key.

export function stripeSignatureHeader(payload: string, secret: string, timestamp: number): string {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${signature}`;
}
