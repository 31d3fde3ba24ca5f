import 'server-only';
import { cache } from 'react';
import { cookies } from 'next/headers';
import { decode, getToken, type JWT } from 'next-auth/jwt';
import { eq, sql } from 'drizzle-orm';
import { db, perDatabase, primaryOf } from '@/db/client';
import { users } from '@/db/schema';
import { env } from '@/lib/env';
import { toAppError } from '@/lib/errors';
import type { Role } from '@/lib/roles';

export type SessionUser = { id: string; role: Role; name: string | null; email: string | null };

/** __Secure- cookies need HTTPS; a local http:// address keeps plain names (as the Auth.js config does). */
export function usesSecureCookies() {
  return env().NODE_ENV === 'production' && env().APP_URL.startsWith('https:');
}

/** The session's account look-up, prepared once: it runs on every signed-in request. */
const accountStatement = perDatabase((reader: typeof db) =>
  // The primary, not a replica: deactivation and a new session version must end a session at once.
  primaryOf(reader)
    .select({ id: users.id, role: users.role, sessionVersion: users.sessionVersion, deactivatedAt: users.deactivatedAt, name: users.name, email: users.email })
    .from(users)
    .where(eq(users.id, sql.placeholder('id')))
    .limit(1)
    .prepare(),
);

/** The account behind a session, or null when it is gone or deactivated. */
export async function findActiveAccount(id: string) {
  const [row] = await accountStatement(db).execute({ id });
  return row && !row.deactivatedAt ? row : null;
}

/**
 * Decrypted session tokens by their exact text. Decrypting derives the key with HKDF and opens
 * the JWE, a millisecond of CPU on every request; a token's text never changes, so its contents
 * can be kept. Expiry is checked again on every use; the oldest entries go first past the bound.
 */
const decodedTokens = new Map<string, JWT>();
const DECODED_TOKENS_KEPT = 5_000;

async function decodeSessionToken(token: string, salt: string): Promise<JWT | null> {
  let payload = decodedTokens.get(token);
  if (!payload) {
    const secret = env().AUTH_SECRET;
    if (!secret) return null;
    try {
      payload = (await decode({ token, secret, salt })) ?? undefined;
    } catch {
      return null;
    }
    if (!payload) return null;
    if (decodedTokens.size >= DECODED_TOKENS_KEPT) decodedTokens.delete(decodedTokens.keys().next().value!);
    decodedTokens.set(token, payload);
  }
  if (typeof payload.exp !== 'number' || payload.exp * 1000 <= Date.now()) {
    decodedTokens.delete(token);
    return null;
  }
  return payload;
}

/**
 * The signed-in person of this request, read straight from the session cookie: the token is
 * found by Auth.js's `getToken`, decrypted by its `decode` (which checks the expiry), then the account is looked up by
 * primary key, so deactivation or a password change (a new session version) ends the session at
 * once. Unlike `auth()`, it neither re-encrypts the token nor builds an internal session request,
 * which made it the largest cost of a table page, and a token already opened is not decrypted again. Only the cookie counts (no bearer header).
 * Memoised per request, so a page and the components under it share one look-up.
 */
export const readSessionUser = cache(async (): Promise<SessionUser | null> => {
  const secureCookie = usesSecureCookies();
  const cookie = (await cookies()).toString();
  if (!cookie) return null;
  const cookieName = secureCookie ? '__Secure-authjs.session-token' : 'authjs.session-token';
  // Auth.js reads its cookie (joining chunks if it was split); decrypting is ours, to keep the result.
  const raw = await getToken({ req: { headers: { cookie } }, secret: env().AUTH_SECRET, secureCookie, cookieName, raw: true });
  const token = raw ? await decodeSessionToken(raw, cookieName) : null;
  if (!token?.sub) return null;
  try {
    const account = await findActiveAccount(token.sub);
    if (!account || account.sessionVersion !== token.sessionVersion) return null;
    return { id: account.id, role: account.role as Role, name: account.name, email: account.email };
  } catch (error) {
    // The database is down: keep the signed token's word rather than signing the person out.
    // Every operation needs the database too, so it answers "unavailable" (503), not "sign in".
    if (toAppError(error).code === 'unavailable' && token.role) {
      return { id: token.sub, role: token.role, name: token.name ?? null, email: token.email ?? null };
    }
    throw error;
  }
});
