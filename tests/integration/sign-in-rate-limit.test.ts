import { afterAll, describe, expect, it } from 'vitest';
import { randomInt } from 'node:crypto';
import { closeDatabase } from '@/db/client';
import { authenticate } from '@/lib/auth/credentials';
import { RATE_LIMITS } from '@/lib/auth/rate-limit';
import { createAccount, uniqueEmail } from '../support/accounts';

// A documentation address (RFC 5737) per test, so address buckets of other tests never interfere.
const someIp = () => `192.0.2.${randomInt(1, 254)}`;
const WINDOW = RATE_LIMITS['sign-in:account'].windowMs;

describe('sign-in rate limit', () => {
  afterAll(closeDatabase);

  it('refuses the 11th attempt within a minute even with the right password, and clears after the window', async () => {
    const account = await createAccount('buyer');
    const ip = someIp();
    const start = new Date();
    for (let attempt = 1; attempt <= 10; attempt += 1) {
      const at = new Date(start.getTime() + attempt * 1_000);
      await expect(authenticate({ email: account.email, password: `wrong guess ${attempt}` }, { ip, now: at })).resolves.toEqual({ ok: false, reason: 'invalid_credentials' });
    }
    const eleventh = await authenticate({ email: account.email, password: account.password }, { ip, now: new Date(start.getTime() + 11_000) });
    expect(eleventh).toEqual({ ok: false, reason: 'rate_limited' });

    const afterWindow = await authenticate({ email: account.email, password: account.password }, { ip, now: new Date(start.getTime() + 11_000 + WINDOW + 1_000) });
    expect(afterWindow.ok).toBe(true);
  });

  it('lets nine wrong passwords pass and then accepts the right one', async () => {
    const account = await createAccount('seller');
    const ip = someIp();
    const start = new Date();
    for (let attempt = 1; attempt <= 9; attempt += 1) {
      await authenticate({ email: account.email, password: 'not it at all' }, { ip, now: new Date(start.getTime() + attempt * 1_000) });
    }
    const tenth = await authenticate({ email: account.email, password: account.password }, { ip, now: new Date(start.getTime() + 10_000) });
    expect(tenth.ok).toBe(true);
  });

  it('starts a new count when failures are spread over more than a window', async () => {
    const account = await createAccount('dealer');
    const ip = someIp();
    const start = new Date();
    for (let attempt = 0; attempt < 9; attempt += 1) {
      await authenticate({ email: account.email, password: 'not it at all' }, { ip, now: new Date(start.getTime() + attempt * 1_000) });
    }
    // Two more failures, but after the first window ended: the count restarts at 1.
    for (let attempt = 0; attempt < 2; attempt += 1) {
      await authenticate({ email: account.email, password: 'not it at all' }, { ip, now: new Date(start.getTime() + WINDOW + 5_000 + attempt * 1_000) });
    }
    const next = await authenticate({ email: account.email, password: account.password }, { ip, now: new Date(start.getTime() + WINDOW + 10_000) });
    expect(next.ok).toBe(true);
  });

  it('gives an unknown address the same answers as a known one', async () => {
    const email = uniqueEmail('nobody');
    const ip = someIp();
    const start = new Date();
    const answers = [];
    for (let attempt = 1; attempt <= 11; attempt += 1) {
      answers.push(await authenticate({ email, password: 'any password at all' }, { ip, now: new Date(start.getTime() + attempt * 1_000) }));
    }
    expect(answers.slice(0, 10).every((answer) => !answer.ok && answer.reason === 'invalid_credentials')).toBe(true);
    expect(answers[10]).toEqual({ ok: false, reason: 'rate_limited' });
  });

  it('takes about as long for an unknown address as for a wrong password', async () => {
    const account = await createAccount('buyer');
    const time = async (email: string) => {
      const t0 = performance.now();
      await authenticate({ email, password: 'wrong but plausible' }, { ip: someIp() });
      return performance.now() - t0;
    };
    // Warm up, then compare medians of a few tries: the dummy hash compare costs what a real one does.
    await time(account.email);
    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 3; i += 1) {
      known.push(await time(account.email));
      unknown.push(await time(uniqueEmail('nobody')));
    }
    const median = (values: number[]) => values.sort((a, b) => a - b)[1]!;
    expect(median(unknown)).toBeGreaterThan(median(known) * 0.5);
  });

  it('refuses a deactivated account with the answer for a wrong password', async () => {
    const account = await createAccount('inspector', { deactivated: true });
    await expect(authenticate({ email: account.email, password: account.password }, { ip: someIp() })).resolves.toEqual({ ok: false, reason: 'invalid_credentials' });
  });

  it('tells only someone with the right password that the address is unconfirmed', async () => {
    const account = await createAccount('seller', { confirmed: false });
    await expect(authenticate({ email: account.email, password: 'wrong password here' }, { ip: someIp() })).resolves.toEqual({ ok: false, reason: 'invalid_credentials' });
    await expect(authenticate({ email: account.email, password: account.password }, { ip: someIp() })).resolves.toEqual({ ok: false, reason: 'unconfirmed' });
  });
});
