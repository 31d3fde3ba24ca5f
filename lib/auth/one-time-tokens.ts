import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import { and, eq, gt, isNull } from 'drizzle-orm';
import type { Database } from '@/db/client';
import { userTokens, USER_TOKEN_PURPOSES } from '@/db/schema';

export type TokenPurpose = (typeof USER_TOKEN_PURPOSES)[number];

/** How long each mailed link works. Resets are short: the mail may sit in a shared inbox. */
export const TOKEN_LIFETIME_MS: Record<TokenPurpose, number> = {
  verify_email: 48 * 60 * 60_000,
  reset_password: 60 * 60_000,
  invitation: 7 * 24 * 60 * 60_000,
};

type Writer = Pick<Database, 'insert' | 'update'>;

// Only the SHA-256 is stored: a copy of the table cannot be turned into working links.
export function hashToken(token: string) {
  return createHash('sha256').update(token).digest('hex');
}

/** A new link token for the user; earlier unused ones of the same purpose stop working. */
export async function issueToken(writer: Writer, userId: string, purpose: TokenPurpose, now = new Date()) {
  const token = randomBytes(32).toString('base64url');
  await writer
    .update(userTokens)
    .set({ usedAt: now })
    .where(and(eq(userTokens.userId, userId), eq(userTokens.purpose, purpose), isNull(userTokens.usedAt)));
  await writer.insert(userTokens).values({ userId, purpose, tokenHash: hashToken(token), expiresAt: new Date(now.getTime() + TOKEN_LIFETIME_MS[purpose]) });
  return token;
}

/**
 * Uses up a token: one conditional UPDATE, so two clicks racing each other cannot both succeed.
 * Returns the user it belongs to, or null when it is unknown, used or expired.
 */
export async function consumeToken(writer: Pick<Database, 'update' | 'select'>, token: string, purpose: TokenPurpose, now = new Date()) {
  const hash = hashToken(token);
  const [result] = await writer
    .update(userTokens)
    .set({ usedAt: now })
    .where(and(eq(userTokens.tokenHash, hash), eq(userTokens.purpose, purpose), isNull(userTokens.usedAt), gt(userTokens.expiresAt, now)));
  if (result.affectedRows !== 1) return null;
  const [row] = await writer.select({ userId: userTokens.userId }).from(userTokens).where(eq(userTokens.tokenHash, hash)).limit(1);
  return row?.userId ?? null;
}
