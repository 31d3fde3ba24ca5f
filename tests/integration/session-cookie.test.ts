import { eq, sql } from 'drizzle-orm';
import { encode } from 'next-auth/jwt';
import { describe, expect, it } from 'vitest';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import { createAccount } from '@/tests/support/accounts';

// The session check every operation and page relies on, through the running app: a cookie opens
// the door only while it is genuine, unexpired and its account still active at the same session version.
const APP_URL = process.env.APP_URL!;
const COOKIE = 'authjs.session-token';
const TABLE = '/api/compare?page=1&pageSize=25';

async function cookieFor(account: { id: string; role: string }, options: { secret?: string; maxAge?: number; sessionVersion?: number } = {}) {
  const value = await encode({
    salt: COOKIE,
    secret: options.secret ?? process.env.AUTH_SECRET!,
    token: { sub: account.id, role: account.role, sessionVersion: options.sessionVersion ?? 0 },
    maxAge: options.maxAge ?? 60 * 60,
  });
  return `${COOKIE}=${value}`;
}

const status = async (cookie: string) => (await fetch(`${APP_URL}${TABLE}`, { headers: { cookie } })).status;

describe('session cookie', () => {
  it('lets a dealer with a genuine cookie read the table, again and again', async () => {
    const dealer = await createAccount('dealer');
    const cookie = await cookieFor(dealer);
    expect(await status(cookie)).toBe(200);
    expect(await status(cookie)).toBe(200);
  });

  it('ends the same cookie once the account is deactivated', async () => {
    const dealer = await createAccount('dealer');
    const cookie = await cookieFor(dealer);
    expect(await status(cookie)).toBe(200);
    await db.update(users).set({ deactivatedAt: new Date() }).where(eq(users.id, dealer.id));
    expect(await status(cookie)).toBe(401);
  });

  it('ends the same cookie once the session version moves on (password change, role change)', async () => {
    const dealer = await createAccount('dealer');
    const cookie = await cookieFor(dealer);
    expect(await status(cookie)).toBe(200);
    await db.update(users).set({ sessionVersion: sql`${users.sessionVersion} + 1` }).where(eq(users.id, dealer.id));
    expect(await status(cookie)).toBe(401);
  });

  it('takes the role from the account, not from the cookie', async () => {
    const buyer = await createAccount('buyer');
    // A cookie claiming "dealer" for a buyer's account still acts as a buyer, who may not use the table.
    expect(await status(await cookieFor({ id: buyer.id, role: 'dealer' }))).toBe(403);
  });

  it('refuses an expired cookie', async () => {
    const dealer = await createAccount('dealer');
    expect(await status(await cookieFor(dealer, { maxAge: -60 }))).toBe(401);
  });

  it('refuses a cookie sealed with another secret, and one altered in transit', async () => {
    const dealer = await createAccount('dealer');
    expect(await status(await cookieFor(dealer, { secret: 'another-secret-of-at-least-thirty-two-characters' }))).toBe(401);
    const genuine = await cookieFor(dealer);
    const at = genuine.length - 10;
    const altered = genuine.slice(0, at) + (genuine[at] === 'A' ? 'B' : 'A') + genuine.slice(at + 1);
    expect(await status(altered)).toBe(401);
  });

  it('ignores a bearer header: only the cookie carries a session', async () => {
    const dealer = await createAccount('dealer');
    const token = (await cookieFor(dealer)).slice(COOKIE.length + 1);
    const response = await fetch(`${APP_URL}${TABLE}`, { headers: { authorization: `Bearer ${token}` } });
    expect(response.status).toBe(401);
  });
});
