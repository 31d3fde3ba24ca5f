import { afterAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { emailOutbox } from '@/db/schema';
import { enqueueEmail } from '@/lib/mail/outbox';
import { OUTBOX_POLICY, drainOutbox, retryDelayMs } from '@/lib/mail/worker';
import { uniqueEmail } from '../support/accounts';
import { waitForMail } from '../support/mail-sink';

// The running app drains the same outbox. Rows in these tests are moved a year ahead, beyond the
// app's reach, and drained with a clock set to then.
const YEAR = 365 * 24 * 60 * 60_000;
const failing = { sendMail: async () => Promise.reject(new Error('454 mail relay is down')) };

async function queueFutureMail(to: string) {
  const later = new Date(Date.now() + YEAR);
  await db.transaction(async (tx) => {
    await enqueueEmail(tx, { to, template: 'reset-password', data: { name: 'Ines Harrow', url: 'http://localhost/reset-password?token=x', expiresInMinutes: 60 } });
  });
  await db.update(emailOutbox).set({ nextAttemptAt: later }).where(eq(emailOutbox.toAddress, to));
  return later;
}

async function rowFor(to: string) {
  const [row] = await db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, to));
  return row!;
}

describe('the e-mail outbox', () => {
  afterAll(closeDatabase);

  it('queues nothing when the transaction that caused the mail rolls back', async () => {
    const to = uniqueEmail('rollback');
    await expect(
      db.transaction(async (tx) => {
        await enqueueEmail(tx, { to, template: 'verify-email', data: { name: null, url: 'http://localhost/confirm-email?token=x', expiresInHours: 48 } });
        throw new Error('the change failed');
      }),
    ).rejects.toThrow('the change failed');
    expect(await db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, to))).toHaveLength(0);
  });

  it('backs off after a failed send and gives up after the last attempt', async () => {
    const to = uniqueEmail('backoff');
    let now = await queueFutureMail(to);
    for (let attempt = 1; attempt < OUTBOX_POLICY.maxAttempts; attempt += 1) {
      await expect(drainOutbox({ now, transport: failing, to })).resolves.toMatchObject({ claimed: 1, retrying: 1 });
      const row = await rowFor(to);
      expect(row).toMatchObject({ status: 'pending', attempts: attempt, lastError: '454 mail relay is down' });
      expect(row.nextAttemptAt.getTime()).toBe(now.getTime() + retryDelayMs(attempt));
      // Not due yet: a drain a second before the next attempt leaves it alone.
      await expect(drainOutbox({ now: new Date(row.nextAttemptAt.getTime() - 1_000), transport: failing, to })).resolves.toMatchObject({ claimed: 0 });
      now = row.nextAttemptAt;
    }
    await expect(drainOutbox({ now, transport: failing, to })).resolves.toMatchObject({ claimed: 1, failed: 1 });
    expect(await rowFor(to)).toMatchObject({ status: 'failed', attempts: OUTBOX_POLICY.maxAttempts });
    await expect(drainOutbox({ now: new Date(now.getTime() + YEAR), transport: failing, to })).resolves.toMatchObject({ claimed: 0 });
  });

  it('doubles the wait between attempts up to an hour', () => {
    expect([1, 2, 3, 4, 5, 6, 7, 8].map(retryDelayMs)).toEqual([60_000, 120_000, 240_000, 480_000, 960_000, 1_920_000, 3_600_000, 3_600_000]);
  });

  it('sends a due message through SMTP to the sink and marks it sent', async () => {
    const to = uniqueEmail('sent');
    const now = await queueFutureMail(to);
    await expect(drainOutbox({ now, to })).resolves.toMatchObject({ claimed: 1, sent: 1 });
    expect(await rowFor(to)).toMatchObject({ status: 'sent', attempts: 1, lastError: null });
    const mail = await waitForMail(to, 'Choose a new Waygrade password');
    expect(mail.text).toContain('Hello Ines,');
    expect(mail.html).toContain('Choose a new password');
  });

  it('lets two drains running at once send a message only once', async () => {
    const to = uniqueEmail('once');
    const now = await queueFutureMail(to);
    let sends = 0;
    const counting = { sendMail: async () => void (sends += 1) };
    const results = await Promise.all([drainOutbox({ now, transport: counting, to }), drainOutbox({ now, transport: counting, to })]);
    expect(results.reduce((sum, result) => sum + result.claimed, 0)).toBe(1);
    expect(sends).toBe(1);
  });

  it('takes over a message whose claim lapsed when a worker stopped mid-send', async () => {
    const to = uniqueEmail('lapsed');
    const now = await queueFutureMail(to);
    await db.update(emailOutbox).set({ status: 'sending', lockedUntil: new Date(now.getTime() - 1_000) }).where(eq(emailOutbox.toAddress, to));
    await expect(drainOutbox({ now, transport: { sendMail: async () => undefined }, to })).resolves.toMatchObject({ claimed: 1, sent: 1 });
  });
});
