import { NextResponse, type NextRequest } from 'next/server';
import { clientIpFrom } from '@/lib/auth/client-ip';
import { httpStatus } from '@/lib/errors';
import { recordPaymentEvent } from '@/lib/payments/record-payment-event';
import { stripeClient, webhookSecret } from '@/lib/payments/stripe-client';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/**
 * The payment provider's events. There is no session here: the signature over the raw body is the
 * authentication, so the body is read as text and verified before anything is parsed or stored.
 * A refused signature answers 400 and changes nothing; a failure while applying answers 5xx so the
 * provider delivers again, and the event id keeps a repeat from applying twice.
 */
export async function POST(request: NextRequest) {
  const body = await request.text();
  const signature = request.headers.get('stripe-signature');
  if (!signature) return NextResponse.json({ ok: false, code: 'invalid_input', message: 'Missing signature.' }, { status: 400 });
  let event;
  try {
    event = stripeClient().webhooks.constructEvent(body, signature, webhookSecret());
  } catch {
    return NextResponse.json({ ok: false, code: 'invalid_input', message: 'Signature does not match.' }, { status: 400 });
  }
  const result = await recordPaymentEvent.execute(null, event, { ip: clientIpFrom(request.headers) });
  if (!result.ok) return NextResponse.json(result, { status: result.code === 'invalid_input' ? 400 : Math.max(500, httpStatus(result.code)) });
  return NextResponse.json({ ok: true, outcome: result.data.outcome });
}
