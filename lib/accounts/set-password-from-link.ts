import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { users } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { consumeToken, type TokenPurpose } from '@/lib/auth/one-time-tokens';
import { hashPassword } from '@/lib/auth/password';
import { rememberDevice } from '@/lib/auth/known-device-cookie';
import { clearAttempts, subjectsFor } from '@/lib/auth/rate-limit';
import { AppError } from '@/lib/errors';
import { passwordFromLinkSchema } from '@/lib/validation/one-time-link';

const EXPIRED: Record<'reset_password' | 'invitation', string> = {
  reset_password: 'This reset link has expired or was already used. Ask for a new one.',
  invitation: 'This invitation has expired or was already used. Ask your Waygrade coordinator to send a new one.',
};

/**
 * Sets a password from a mailed link. Following the link proves the address, so it also counts as
 * confirmed; the session version moves on, so every session opened with the old password ends.
 */
function passwordFromLink(name: string, purpose: Extract<TokenPurpose, 'reset_password' | 'invitation'>) {
  return defineOperation({
    name,
    entityType: 'user',
    access: 'public',
    input: passwordFromLinkSchema,
    async run({ input, tx }) {
      const passwordHash = await hashPassword(input.password);
      const userId = await consumeToken(tx, input.token, purpose);
      if (!userId) throw new AppError('not_found', EXPIRED[purpose]);
      const [user] = await tx.select({ email: users.email, deactivatedAt: users.deactivatedAt, emailVerified: users.emailVerified }).from(users).where(eq(users.id, userId)).limit(1);
      if (!user || user.deactivatedAt) throw new AppError('not_found', EXPIRED[purpose]);
      await tx
        .update(users)
        .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1`, emailVerified: user.emailVerified ?? new Date() })
        .where(eq(users.id, userId));
      await clearAttempts(subjectsFor('sign-in', user.email, null));
      // The browser that followed the mailed link is the owner's: it becomes a known device, so a
      // stranger still sending wrong passwords cannot slow its next sign-in down.
      await rememberDevice(userId);
      return { data: { email: user.email }, entityId: userId };
    },
  });
}

export const resetPassword = passwordFromLink('account.reset-password', 'reset_password');
export const acceptInvitation = passwordFromLink('account.accept-invitation', 'invitation');
