import 'server-only';
import { and, asc, eq, inArray, lt, lte, or } from 'drizzle-orm';
import type { Transporter } from 'nodemailer';
import { db } from '@/db/client';
import { emailOutbox } from '@/db/schema';
import { env } from '@/lib/env';
import { mailTransport } from './transport';

/** How the outbox retries: a minute, then doubling up to an hour; after six tries a person looks. */
export const OUTBOX_POLICY = {
  batchSize: 20,
  maxAttempts: 6,
  firstRetryMs: 60_000,
  longestRetryMs: 60 * 60_000,
  // A claimed row is another worker's for this long; after that a crashed worker's claim lapses.
  claimMs: 2 * 60_000,
} as const;

export function retryDelayMs(attemptsSoFar: number) {
  return Math.min(OUTBOX_POLICY.firstRetryMs * 2 ** Math.max(0, attemptsSoFar - 1), OUTBOX_POLICY.longestRetryMs);
}

type DrainOptions = {
  now?: Date;
  transport?: Pick<Transporter, 'sendMail'> | null;
  limit?: number;
  /** Only mail to this address, e.g. to resend one person's mail now. */
  to?: string;
};
export type DrainSummary = { claimed: number; sent: number; retrying: number; failed: number };

/**
 * Claims due rows with SELECT … FOR UPDATE SKIP LOCKED and marks them "sending" in the same
 * transaction, so two app servers draining at once never pick the same message.
 */
async function claimDue(now: Date, limit: number, to: string | undefined) {
  return db.transaction(async (tx) => {
    const rows = await tx
      .select({ id: emailOutbox.id, toAddress: emailOutbox.toAddress, subject: emailOutbox.subject, textBody: emailOutbox.textBody, htmlBody: emailOutbox.htmlBody, attempts: emailOutbox.attempts })
      .from(emailOutbox)
      .where(
        and(
          or(
            and(eq(emailOutbox.status, 'pending'), lte(emailOutbox.nextAttemptAt, now)),
            and(eq(emailOutbox.status, 'sending'), lt(emailOutbox.lockedUntil, now)),
          ),
          to ? eq(emailOutbox.toAddress, to) : undefined,
        ),
      )
      .orderBy(asc(emailOutbox.nextAttemptAt))
      .limit(limit)
      .for('update', { skipLocked: true });
    if (rows.length === 0) return rows;
    await tx
      .update(emailOutbox)
      .set({ status: 'sending', lockedUntil: new Date(now.getTime() + OUTBOX_POLICY.claimMs) })
      .where(inArray(emailOutbox.id, rows.map((row) => row.id)));
    return rows;
  });
}

/** Sends every message that is due once; used by the interval worker and by tests. */
export async function drainOutbox(options: DrainOptions = {}): Promise<DrainSummary> {
  const now = options.now ?? new Date();
  const transport = options.transport === undefined ? mailTransport() : options.transport;
  const summary: DrainSummary = { claimed: 0, sent: 0, retrying: 0, failed: 0 };
  if (!transport) return summary;
  const rows = await claimDue(now, options.limit ?? OUTBOX_POLICY.batchSize, options.to);
  summary.claimed = rows.length;
  for (const row of rows) {
    try {
      await transport.sendMail({ from: env().MAIL_FROM, to: row.toAddress, subject: row.subject, text: row.textBody, html: row.htmlBody });
      await db.update(emailOutbox).set({ status: 'sent', sentAt: new Date(), lockedUntil: null, attempts: row.attempts + 1, lastError: null }).where(eq(emailOutbox.id, row.id));
      summary.sent += 1;
    } catch (error) {
      const attempts = row.attempts + 1;
      const givingUp = attempts >= OUTBOX_POLICY.maxAttempts;
      await db
        .update(emailOutbox)
        .set({
          status: givingUp ? 'failed' : 'pending',
          attempts,
          lockedUntil: null,
          nextAttemptAt: new Date(now.getTime() + retryDelayMs(attempts)),
          lastError: (error instanceof Error ? error.message : String(error)).slice(0, 2000),
        })
        .where(eq(emailOutbox.id, row.id));
      if (givingUp) summary.failed += 1;
      else summary.retrying += 1;
    }
  }
  return summary;
}

const globalForWorker = globalThis as unknown as { waygradeOutboxWorker?: ReturnType<typeof setInterval> };

/** Drains the outbox every few seconds in this process; safe to run on every app server. */
export function startOutboxWorker() {
  const intervalMs = env().MAIL_WORKER_INTERVAL_MS;
  if (globalForWorker.waygradeOutboxWorker || intervalMs === 0) return;
  if (!env().SMTP_URL) {
    console.warn('[mail] SMTP_URL is not set: e-mail stays queued in email_outbox until it is.');
    return;
  }
  let running = false;
  const timer = setInterval(() => {
    if (running) return;
    running = true;
    drainOutbox()
      .catch((error: unknown) => console.error('[mail] draining the outbox failed; will try again', error))
      .finally(() => {
        running = false;
      });
  }, intervalMs);
  timer.unref?.();
  globalForWorker.waygradeOutboxWorker = timer;
}
