import 'server-only';
import { createHmac, timingSafeEqual } from 'node:crypto';
import { env } from '@/lib/env';

/**
 * A browser an account has signed in from before carries a signed, http-only cookie naming that
 * account. A correct password from such a browser skips the per-account slow-down, so strangers
 * sending wrong passwords for an account from elsewhere cannot keep its owner out. The cookie proves
 * only "this browser signed in as this account before": the password is still checked.
 */
export const KNOWN_DEVICE_COOKIE = 'waygrade-known-device';
export const KNOWN_DEVICE_MAX_AGE_MS = 180 * 24 * 60 * 60_000;

function signature(payload: string) {
  const secret = env().AUTH_SECRET;
  if (!secret) throw new Error('AUTH_SECRET is not set: devices cannot be remembered.');
  return createHmac('sha256', `waygrade-known-device:${secret}`).update(payload).digest('base64url');
}

/** The cookie value for an account on this browser, issued now. */
export function issueKnownDeviceToken(userId: string, now = new Date()) {
  const payload = `${userId}.${now.getTime()}`;
  return `${payload}.${signature(payload)}`;
}

/** The account a cookie value vouches for, or null when it is forged, damaged or too old. */
export function knownDeviceAccount(token: string | null | undefined, now = new Date()): string | null {
  if (!token) return null;
  const parts = token.split('.');
  if (parts.length !== 3) return null;
  const [userId, issuedAt, given] = parts as [string, string, string];
  const expected = Buffer.from(signature(`${userId}.${issuedAt}`));
  const actual = Buffer.from(given);
  if (actual.length !== expected.length || !timingSafeEqual(actual, expected)) return null;
  const age = now.getTime() - Number(issuedAt);
  if (!Number.isFinite(age) || age < 0 || age > KNOWN_DEVICE_MAX_AGE_MS) return null;
  return userId;
}
