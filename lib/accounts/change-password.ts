import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { users } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { hashPassword, verifyPassword } from '@/lib/auth/password';
import { isRateLimited, recordAttempt, subjectsFor } from '@/lib/auth/rate-limit';
import { AppError } from '@/lib/errors';
import { changePasswordSchema } from '@/lib/validation/change-password';

const WRONG_CURRENT = { currentPassword: ['That is not your current password'] };

/** A signed-in person's new password. Every session, this one included, ends: sign in again. */
export const changePassword = defineOperation({
  name: 'account.change-password',
  entityType: 'user',
  access: 'signed-in',
  input: changePasswordSchema,
  async run({ actor, input, ip, tx }) {
    const [user] = await tx.select().from(users).where(eq(users.id, actor!.id)).limit(1);
    if (!user) throw new AppError('not_found');
    // Wrong current passwords count against the same limits as sign-in: this form must not be a guessing oracle.
    const subjects = subjectsFor('sign-in', user.email, ip);
    if (await isRateLimited(subjects)) throw new AppError('rate_limited');
    if (!(await verifyPassword(input.currentPassword, user.passwordHash))) {
      await recordAttempt(subjects);
      throw new AppError('invalid_input', undefined, WRONG_CURRENT);
    }
    const passwordHash = await hashPassword(input.password);
    await tx.update(users).set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` }).where(eq(users.id, user.id));
    return { data: { changed: true }, entityId: user.id };
  },
});
