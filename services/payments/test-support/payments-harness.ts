import Stripe from 'stripe';
import { startPaymentsStandIn, type PaymentsStandIn, type PaymentsStandInOptions } from '../server';
import { startWebhookReceiver, type WebhookReceiver } from './webhook-receiver';

// One stand-in, one webhook receiver and one real Stripe SDK client pointed at the stand-in,
// as the app would configure it, for a test file.

export const TEST_WEBHOOK_SECRET = 'whsec_waygrade_test_secret';

export interface PaymentsHarness {
  standIn: PaymentsStandIn;
  receiver: WebhookReceiver;
  stripe: Stripe;
  close(): Promise<void>;
}

export async function startPaymentsHarness(
  options: Partial<Omit<PaymentsStandInOptions, 'port' | 'webhookUrl' | 'webhookSecret'>> = {},
): Promise<PaymentsHarness> {
  const receiver = await startWebhookReceiver();
  const standIn = await startPaymentsStandIn({
    port: 0,
    webhookUrl: receiver.url,
    webhookSecret: TEST_WEBHOOK_SECRET,
    retryDelaysMs: [50, 100, 200],
    ...options,
  });
  return {
    standIn,
    receiver,
    stripe: stripeClientFor(standIn.url),
    async close() {
      await standIn.close();
      await receiver.close();
    },
  };
}

export function stripeClientFor(standInUrl: string, secretKey = 'sk_test_waygrade'): Stripe {
  const { hostname, port } = new URL(standInUrl);
  return new Stripe(secretKey, { host: hostname, port: Number(port), protocol: 'http', maxNetworkRetries: 0 });
}

/** Session params as the app sends them for an inspection-report purchase. */
export function reportPurchaseParams(overrides: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
  return {
    mode: 'payment',
    line_items: [
      {
        price_data: {
          currency: 'eur',
          unit_amount: 4_900,
          product_data: { name: 'Inspection report: centre lathe, 1,500 mm between centres' },
        },
        quantity: 1,
      },
    ],
    success_url: 'http://localhost:3000/reports/12/paid?session={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://localhost:3000/reports/12',
    customer_email: 'buyer@example.test',
    client_reference_id: 'report-12',
    metadata: { reportId: '12', buyerId: '7' },
    ...overrides,
  } satisfies Stripe.Checkout.SessionCreateParams;
}

/** Presses "Pay" on the hosted checkout page, as the browser's form POST does. */
export async function payOnCheckoutPage(session: Stripe.Checkout.Session, email?: string): Promise<Response> {
  const pageUrl = new URL(session.url ?? '');
  const form = new URLSearchParams(email ? { email } : {});
  return fetch(new URL(`${pageUrl.pathname}/pay`, standInOrigin(pageUrl)), {
    method: 'POST',
    body: form,
    redirect: 'manual',
  });
}

/** A report purchase paid on the checkout page: the id of its payment intent. */
export async function paidPaymentIntentId(stripe: Stripe): Promise<string> {
  const session = await stripe.checkout.sessions.create(reportPurchaseParams());
  await payOnCheckoutPage(session);
  return String((await stripe.checkout.sessions.retrieve(session.id)).payment_intent);
}

/** The page URL says localhost for browsers; tests reach the same port on 127.0.0.1. */
function standInOrigin(pageUrl: URL): string {
  return `http://127.0.0.1:${pageUrl.port}`;
}

export async function controlRequest<T = unknown>(
  standIn: PaymentsStandIn,
  path: string,
  init: { method?: string; body?: unknown } = {},
): Promise<{ status: number; body: T }> {
  const response = await fetch(`${standIn.url}/__control/${path}`, {
    method: init.method ?? 'GET',
    headers: init.body === undefined ? {} : { 'Content-Type': 'application/json' },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
  });
  return { status: response.status, body: (await response.json()) as T };
}
