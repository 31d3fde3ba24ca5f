import { eq } from 'drizzle-orm';
import nodemailer from 'nodemailer';
import { afterAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { emailOutbox } from '@/db/schema';
import { requestPasswordReset } from '@/lib/accounts/request-password-reset';
import { drainOutbox } from '@/lib/mail/worker';
import { startMailSink, type MailSink } from '@/services/mail/server';
import { createAccount } from '../support/accounts';
import { freePort, poll } from '../support/private-stack';

// A mail sink of this file's own, stopped and started again; the shared sink is never touched.
// The running app drains the same outbox, so the queued row is moved a year ahead, beyond its reach,
// and drained here with a clock set to then.
const YEAR = 365 * 24 * 60 * 60_000;

describe('the mail relay down', () => {
  let sink: MailSink | undefined;
  afterAll(async () => {
    await sink?.close();
    await closeDatabase();
  });

  it('lets the person’s action succeed, keeps the mail in the outbox while the relay is down, and sends it once the relay is back', async () => {
    const smtpPort = await freePort();
    const webPort = await freePort();
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port: smtpPort, secure: false, ignoreTLS: true, connectionTimeout: 5_000 });
    const account = await createAccount('buyer');

    // The relay is down (nothing listens on its port) when the person asks for a reset link.
    const asked = await requestPasswordReset.execute(null, { email: account.email });
    expect(asked.ok).toBe(true);
    const later = new Date(Date.now() + YEAR);
    await db.update(emailOutbox).set({ nextAttemptAt: later }).where(eq(emailOutbox.toAddress, account.email));

    const down = await drainOutbox({ now: later, transport, to: account.email });
    expect(down).toMatchObject({ claimed: 1, sent: 0, retrying: 1 });
    const [waiting] = await db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, account.email));
    expect(waiting).toMatchObject({ status: 'pending', attempts: 1 });
    expect(waiting!.lastError).toMatch(/ECONNREFUSED|connect/i);

    // The relay comes back; the next due attempt delivers the same message.
    sink = await startMailSink({ smtpPort, webPort });
    const back = await drainOutbox({ now: waiting!.nextAttemptAt, transport, to: account.email });
    expect(back).toMatchObject({ claimed: 1, sent: 1 });
    const [sent] = await db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, account.email));
    expect(sent).toMatchObject({ status: 'sent', attempts: 2, lastError: null });

    const received = await poll('the mail at the relay', async () => {
      const response = await fetch(`${sink!.webUrl}/api/messages?to=${encodeURIComponent(account.email)}`);
      const { messages } = (await response.json()) as { messages: Array<{ subject: string }> };
      return messages.length > 0 ? messages : null;
    }, 30_000);
    expect(received).toHaveLength(1);
    expect(received[0]!.subject).toBe(sent!.subject);
  }, 120_000);
});
