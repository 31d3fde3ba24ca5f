import 'server-only';
import { db } from '@/db/client';
import { listRefundsDueForAttempt } from '@/db/queries/reinspection-requests';
import type { PaymentProvider } from '@/lib/payments/apply-payment-event';
import { stripePaymentProvider } from '@/lib/payments/stripe-payment-provider';
import { attemptReinspectionRefund, type RefundAttemptOutcome } from './refund-reinspections';

/** How often each app server looks for refunds that failed and are due again (one minute: the shortest back-off). */
export const REFUND_RETRY_INTERVAL_MS = 60_000;

/** Tries every refund that is due again, each in its own transaction; returns the outcome of each. */
export async function retryDueReinspectionRefunds(provider: () => PaymentProvider = () => stripePaymentProvider(), now = new Date()) {
  const due = await listRefundsDueForAttempt(db, now);
  const outcomes: RefundAttemptOutcome[] = [];
  // The provider is built only when there is work, so a server without payments set up stays quiet.
  if (due.length === 0) return outcomes;
  const client = provider();
  for (const { id } of due) {
    outcomes.push(await db.transaction((tx) => attemptReinspectionRefund(tx, id, client, now)));
  }
  return outcomes;
}

const globalForWorker = globalThis as unknown as { waygradeReinspectionRefunds?: ReturnType<typeof setInterval> };

/** Retries failed refunds in this process; safe on every app server (each attempt locks its order). */
export function startReinspectionRefundWorker() {
  if (globalForWorker.waygradeReinspectionRefunds) return;
  let running = false;
  const timer = setInterval(() => {
    if (running) return;
    running = true;
    retryDueReinspectionRefunds()
      .catch((error: unknown) => console.error('[reinspection] retrying refunds failed; will try again', error))
      .finally(() => {
        running = false;
      });
  }, REFUND_RETRY_INTERVAL_MS);
  timer.unref?.();
  globalForWorker.waygradeReinspectionRefunds = timer;
}
