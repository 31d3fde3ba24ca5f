import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  controlRequest,
  payOnCheckoutPage,
  reportPurchaseParams,
  startPaymentsHarness,
  type PaymentsHarness,
} from './test-support/payments-harness';

function onStandIn(harness: PaymentsHarness, pageUrl: string | null, suffix = ''): string {
  return `${harness.standIn.url}${new URL(pageUrl ?? '').pathname}${suffix}`;
}

describe('checkout page', () => {
  let harness: PaymentsHarness;
  beforeAll(async () => {
    harness = await startPaymentsHarness();
  });
  afterAll(() => harness.close());

  it('shows the amount, the product and the buyer’s e-mail with Pay and Cancel buttons', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    const response = await fetch(onStandIn(harness, session.url));
    const html = await response.text();

    expect(response.status).toBe(200);
    expect(response.headers.get('content-security-policy')).toContain("default-src 'none'");
    expect(html).toContain('<title>Test payment</title>');
    expect(html).toContain('€49.00');
    expect(html).toContain('Inspection report: centre lathe, 1,500 mm between centres');
    expect(html).toContain('buyer@example.test');
    expect(html).toMatch(/<button id="pay"[^>]*>Pay<\/button>/);
    expect(html).toMatch(/<button id="cancel"[^>]*>Cancel<\/button>/);
  });

  it('escapes markup in product names', async () => {
    const session = await harness.stripe.checkout.sessions.create(
      reportPurchaseParams({
        line_items: [{ price_data: { currency: 'eur', unit_amount: 100, product_data: { name: '<img src=x>' } }, quantity: 1 }],
      }),
    );
    const html = await (await fetch(onStandIn(harness, session.url))).text();
    expect(html).toContain('&lt;img src=x&gt;');
    expect(html).not.toContain('<img src=x>');
  });

  it('completes the session on Pay and redirects to success_url with the session id filled in', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    const response = await payOnCheckoutPage(session);

    expect(response.status).toBe(303);
    expect(response.headers.get('location')).toBe(`http://localhost:3000/reports/12/paid?session=${session.id}`);
    const paid = await harness.stripe.checkout.sessions.retrieve(session.id);
    expect(paid).toMatchObject({ status: 'complete', payment_status: 'paid', url: null });
    expect(paid.customer_details?.email).toBe('buyer@example.test');
    const intent = await harness.stripe.paymentIntents.retrieve(String(paid.payment_intent));
    expect(intent).toMatchObject({ status: 'succeeded', amount: 4_900, amount_received: 4_900 });
  });

  it('asks for an e-mail when the session has none and records the one given', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams({ customer_email: undefined }));
    const page = await (await fetch(onStandIn(harness, session.url))).text();
    expect(page).toMatch(/<label for="email">/);

    expect((await payOnCheckoutPage(session)).status).toBe(400);
    expect((await payOnCheckoutPage(session, 'walk-in@example.test')).status).toBe(303);
    const paid = await harness.stripe.checkout.sessions.retrieve(session.id);
    expect(paid.customer_details?.email).toBe('walk-in@example.test');
  });

  it('refuses to take a second payment for the same session', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    await payOnCheckoutPage(session);
    const second = await payOnCheckoutPage(session);
    expect(second.status).toBe(409);
    const { body } = await controlRequest<{ data: { objectId: string; type: string }[] }>(harness.standIn, 'events');
    expect(body.data.filter((event) => event.objectId === session.id && event.type === 'checkout.session.completed')).toHaveLength(1);
  });

  it('redirects to cancel_url on Cancel and leaves the session open', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    const response = await fetch(onStandIn(harness, session.url, '/cancel'), { method: 'POST', redirect: 'manual' });

    expect(response.status).toBe(303);
    expect(response.headers.get('location')).toBe('http://localhost:3000/reports/12');
    expect((await harness.stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('tells the buyer when the session has expired', async () => {
    const session = await harness.stripe.checkout.sessions.create(reportPurchaseParams());
    await harness.stripe.checkout.sessions.expire(session.id);
    const response = await fetch(onStandIn(harness, session.url));
    expect(response.status).toBe(410);
    expect(await response.text()).toContain('expired');
    expect((await payOnCheckoutPage(session)).status).toBe(409);
  });
});
