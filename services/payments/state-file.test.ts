import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { payOnCheckoutPage, reportPurchaseParams, startPaymentsHarness } from './test-support/payments-harness';

describe('payments state file', () => {
  const directories: string[] = [];
  afterEach(async () => {
    await Promise.all(directories.splice(0).map((directory) => rm(directory, { recursive: true, force: true })));
  });

  it('keeps sessions, payments and refunds across a restart', async () => {
    const directory = await mkdtemp(join(tmpdir(), 'waygrade-payments-'));
    directories.push(directory);
    const stateFile = join(directory, 'payments.json');

    const before = await startPaymentsHarness({ stateFile });
    const paidSession = await before.stripe.checkout.sessions.create(reportPurchaseParams());
    const openSession = await before.stripe.checkout.sessions.create(reportPurchaseParams());
    await payOnCheckoutPage(paidSession);
    const paymentIntent = String((await before.stripe.checkout.sessions.retrieve(paidSession.id)).payment_intent);
    const refund = await before.stripe.refunds.create({ payment_intent: paymentIntent, amount: 900 });
    await before.close();
    expect(JSON.parse(await readFile(stateFile, 'utf8'))).toHaveProperty('sessions');

    const after = await startPaymentsHarness({ stateFile });
    try {
      expect(await after.stripe.checkout.sessions.retrieve(paidSession.id)).toMatchObject({ status: 'complete', payment_intent: paymentIntent });
      expect(await after.stripe.refunds.retrieve(refund.id)).toMatchObject({ amount: 900 });
      const restOfPayment = await after.stripe.refunds.create({ payment_intent: paymentIntent });
      expect(restOfPayment.amount).toBe(4_000);
      expect((await after.stripe.checkout.sessions.retrieve(openSession.id)).status).toBe('open');
    } finally {
      await after.close();
    }
  });
});
