import { randomInt, randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { emailOutbox } from '@/db/schema';
import { confirmEmail } from '@/lib/accounts/confirm-email';
import { requestPasswordReset } from '@/lib/accounts/request-password-reset';
import { resendConfirmation } from '@/lib/accounts/resend-confirmation';
import { resetPassword } from '@/lib/accounts/set-password-from-link';
import { authenticate } from '@/lib/auth/credentials';
import { issueKnownDeviceToken, knownDeviceAccount, KNOWN_DEVICE_MAX_AGE_MS } from '@/lib/auth/known-device';
import { RATE_LIMITS, slowDownDelayMs } from '@/lib/auth/rate-limit';
import { createAccount } from '../support/accounts';

// Strangers' addresses: documentation ranges (RFC 5737, RFC 3849), fresh per test.
const strangerIp = (i: number) => `203.0.113.${(i % 250) + 1}`;
const ownerIp = () => `198.51.100.${randomInt(1, 254)}`;
const NEW_PASSWORD = 'a freshly ground tool bit';

async function resetMails(to: string) {
  return db.select({ text: emailOutbox.textBody }).from(emailOutbox).where(and(eq(emailOutbox.toAddress, to), eq(emailOutbox.template, 'reset-password')));
}

afterAll(closeDatabase);

describe('per-account sign-in protection', () => {
  it('lets the owner sign in from a known device while strangers at many addresses send wrong passwords', async () => {
    const owner = await createAccount('buyer');
    const start = Date.now();
    for (let i = 0; i < 15; i += 1) {
      await authenticate({ email: owner.email, password: `guess ${i}` }, { ip: strangerIp(i), now: new Date(start + i * 100), knownDeviceAccountId: null });
    }
    const at = new Date(start + 1_600);
    const fromKnownDevice = await authenticate({ email: owner.email, password: owner.password }, { ip: ownerIp(), now: at, knownDeviceAccountId: owner.id });
    const fromNewDevice = await authenticate({ email: owner.email, password: owner.password }, { ip: ownerIp(), now: at, knownDeviceAccountId: null });
    expect(fromKnownDevice.ok).toBe(true);
    // Someone else's browser, even with the right password, waits out the delay like the strangers.
    expect(fromNewDevice).toEqual({ ok: false, reason: 'rate_limited' });
  });

  it('does not let one account’s known device pass another account’s slow-down', async () => {
    const [owner, other] = await Promise.all([createAccount('seller'), createAccount('seller')]);
    const start = Date.now();
    for (let i = 0; i < 12; i += 1) {
      await authenticate({ email: owner.email, password: `guess ${i}` }, { ip: strangerIp(i), now: new Date(start + i * 100), knownDeviceAccountId: null });
    }
    const outcome = await authenticate({ email: owner.email, password: owner.password }, { ip: ownerIp(), now: new Date(start + 1_300), knownDeviceAccountId: other.id });
    expect(outcome).toEqual({ ok: false, reason: 'rate_limited' });
  });

  it('slows an account down by at most a minute however long strangers keep guessing, and judges few guesses', async () => {
    const owner = await createAccount('dealer');
    const start = Date.now();
    const judgedAt: number[] = [];
    // One wrong password every 5 s for 5 minutes, from ever-changing addresses.
    for (let t = 0; t < 300_000; t += 5_000) {
      const answer = await authenticate({ email: owner.email, password: 'still guessing' }, { ip: strangerIp(t / 5_000), now: new Date(start + t), knownDeviceAccountId: null });
      if (!answer.ok && answer.reason === 'invalid_credentials') judgedAt.push(t / 1_000);
    }
    // Worked example: the first 10 guesses (0–45 s) are judged; the 10th starts a 2 s wait, so 50 s is
    // judged (11th, then 4 s), 55 s (12th, then 8 s), 65 s (13th, then 16 s), 85 s (14th, then 32 s),
    // 120 s (15th, then 60 s, the most), 180 s and 240 s; everything between is refused unjudged.
    expect(judgedAt).toEqual([0, 5, 10, 15, 20, 25, 30, 35, 40, 45, 50, 55, 65, 85, 120, 180, 240]);
    // A minute after the last judged guess the owner's new device is let in, strangers or not.
    const owners = await authenticate({ email: owner.email, password: owner.password }, { ip: ownerIp(), now: new Date(start + 300_000), knownDeviceAccountId: null });
    expect(owners.ok).toBe(true);
  }, 120_000);

  it.each([
    [10, 2_000],
    [11, 4_000],
    [14, 32_000],
    [15, 60_000],
    [40, 60_000],
  ])('waits, after the %i-th wrong password in the window, %i ms (worked example: 2^(n − 9) s, at most 60 s)', (hits, delay) => {
    expect(slowDownDelayMs(hits, RATE_LIMITS['sign-in:account'].limit, RATE_LIMITS['sign-in:account'].slowDown.maxDelayMs)).toBe(delay);
  });
});

describe('the known-device cookie', () => {
  it('vouches for the account it was issued to', () => {
    const userId = randomUUID();
    expect(knownDeviceAccount(issueKnownDeviceToken(userId))).toBe(userId);
  });

  it('vouches for nobody when forged, altered or too old', () => {
    const userId = randomUUID();
    const token = issueKnownDeviceToken(userId);
    const [, issuedAt, signature] = token.split('.');
    expect(knownDeviceAccount(`${randomUUID()}.${issuedAt}.${signature}`)).toBeNull();
    expect(knownDeviceAccount(`${userId}.${issuedAt}.${signature!.slice(0, -2)}xx`)).toBeNull();
    expect(knownDeviceAccount(`${userId}.${issuedAt}`)).toBeNull();
    expect(knownDeviceAccount(token, new Date(Number(issuedAt) + KNOWN_DEVICE_MAX_AGE_MS + 1))).toBeNull();
  });
});

describe('password reset requests for an account strangers are targeting', () => {
  it('still answers the owner, and the latest link mailed works', async () => {
    const owner = await createAccount('buyer');
    for (let i = 0; i < 12; i += 1) {
      await requestPasswordReset.execute(null, { email: owner.email }, { ip: strangerIp(i + 100) });
    }
    const asked = await requestPasswordReset.execute(null, { email: owner.email }, { ip: ownerIp() });
    expect(asked).toEqual({ ok: true, data: { email: owner.email } });

    const mails = await resetMails(owner.email);
    expect(mails.length).toBe(RATE_LIMITS['reset:account'].limit);
    const token = new URL(mails.at(-1)!.text.match(/http\S+reset-password\S+/)![0]).searchParams.get('token')!;
    await expect(resetPassword.execute(null, { token, password: NEW_PASSWORD, passwordAgain: NEW_PASSWORD })).resolves.toMatchObject({ ok: true });
  });

  it('still answers an unconfirmed owner asking for a new confirmation link, and the latest one works', async () => {
    const owner = await createAccount('seller', { confirmed: false });
    for (let i = 0; i < 8; i += 1) await resendConfirmation.execute(null, { email: owner.email }, { ip: strangerIp(i + 60) });
    await expect(resendConfirmation.execute(null, { email: owner.email }, { ip: ownerIp() })).resolves.toEqual({ ok: true, data: { email: owner.email } });
    const mails = await db.select({ text: emailOutbox.textBody }).from(emailOutbox).where(and(eq(emailOutbox.toAddress, owner.email), eq(emailOutbox.template, 'verify-email')));
    expect(mails.length).toBe(RATE_LIMITS['reset:account'].limit);
    const token = new URL(mails.at(-1)!.text.match(/http\S+confirm-email\S+/)![0]).searchParams.get('token')!;
    await expect(confirmEmail.execute(null, { token })).resolves.toMatchObject({ ok: true });
  });

  it('still refuses too many requests from one address', async () => {
    const ip = `2001:db8::${randomUUID().slice(0, 4)}`;
    const answers = [];
    for (let i = 0; i < 21; i += 1) answers.push(await requestPasswordReset.execute(null, { email: `someone-${randomUUID().slice(0, 8)}@reset-tests.example` }, { ip }));
    expect(answers.slice(0, 20).every((a) => a.ok)).toBe(true);
    expect(answers[20]).toMatchObject({ ok: false, code: 'rate_limited' });
  });

  it('lets the owner in with the new password right after a completed reset, while strangers were guessing', async () => {
    const owner = await createAccount('seller');
    const start = Date.now();
    for (let i = 0; i < 12; i += 1) {
      await authenticate({ email: owner.email, password: `guess ${i}` }, { ip: strangerIp(i), now: new Date(start + i * 100), knownDeviceAccountId: null });
    }
    await requestPasswordReset.execute(null, { email: owner.email }, { ip: ownerIp() });
    const [mail] = await resetMails(owner.email);
    const token = new URL(mail!.text.match(/http\S+reset-password\S+/)![0]).searchParams.get('token')!;
    await expect(resetPassword.execute(null, { token, password: NEW_PASSWORD, passwordAgain: NEW_PASSWORD })).resolves.toMatchObject({ ok: true });
    const signedIn = await authenticate({ email: owner.email, password: NEW_PASSWORD }, { ip: ownerIp(), now: new Date(start + 1_300), knownDeviceAccountId: null });
    expect(signedIn.ok).toBe(true);
  });
});
