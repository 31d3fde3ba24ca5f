import type { NextRequest } from 'next/server';
import { clientIpFrom } from '@/lib/auth/client-ip';
import { AppError, httpStatus } from '@/lib/errors';
import { privateJson } from '@/lib/http/private-json';
import { readLimitedBody } from '@/lib/http/read-limited-body';
import { recordPaymentEvent } from '@/lib/payments/record-payment-event';
import { stripeClient, webhookSecret } from '@/lib/payments/stripe-client';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

// The provider's events are a few kilobytes (a completed checkout with its metadata); a body past
// this is not one of them and is refused before it is read whole or verified.
const WEBHOOK_MAX_BODY_BYTES = 256 * 1024;

/**
 * The payment provider's events. There is no session here: the signature over the raw body is the
 * authentication, so the body is read as text and verified before anything is parsed or stored.
 * A refused signature answers 400 and changes nothing; a failure while applying answers 5xx so the
 * provider delivers again, and the event id keeps a repeat from applying twice. A body over the
 * limit answers 413.
 */
export async function POST(request: NextRequest) {
  const signature = request.headers.get('stripe-signature');
  if (!signature) return privateJson({ ok: false, code: 'invalid_input', message: 'Missing signature.' }, { status: 400 });
  let body: string;
  try {
    body = await readLimitedBody(request, WEBHOOK_MAX_BODY_BYTES);
  } catch (error) {
    const code = error instanceof AppError && error.code === 'too_large' ? 'too_large' : 'invalid_input';
    // The rest of an oversized body is never read: the connection is closed, not reused.
    return privateJson({ ok: false, code, message: new AppError(code).message }, { status: httpStatus(code), headers: { Connection: 'close' } });
  }
  let event;
  try {
    event = stripeClient().webhooks.constructEvent(body, signature, webhookSecret());
  } catch {
    return privateJson({ ok: false, code: 'invalid_input', message: 'Signature does not match.' }, { status: 400 });
  }
  const result = await recordPaymentEvent.execute(null, event, { ip: clientIpFrom(request.headers) });
  if (!result.ok) return privateJson(result, { status: result.code === 'invalid_input' ? 400 : Math.max(500, httpStatus(result.code)) });
  return privateJson({ ok: true, outcome: result.data.outcome });
}
