import 'server-only';
import { and, eq, gt, isNull } from 'drizzle-orm';
import { db } from '@/db/client';
import { users, userTokens } from '@/db/schema';
import { hashToken, type TokenPurpose } from '@/lib/auth/one-time-tokens';

/** The active account a still-usable link belongs to, for pages that greet the person by name. */
export async function findTokenHolder(token: string, purpose: TokenPurpose, now = new Date()) {
  const hash = hashToken(token);
  const [row] = await db
    .select({ email: users.email, name: users.name, role: users.role })
    .from(userTokens)
    .innerJoin(users, eq(users.id, userTokens.userId))
    .where(and(eq(userTokens.tokenHash, hash), eq(userTokens.purpose, purpose), isNull(userTokens.usedAt), gt(userTokens.expiresAt, now), isNull(users.deactivatedAt)))
    .limit(1);
  return row ?? null;
}
