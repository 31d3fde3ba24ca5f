import 'server-only';
import { eq } from 'drizzle-orm';
import { users } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { consumeToken } from '@/lib/auth/one-time-tokens';
import { AppError } from '@/lib/errors';
import { confirmEmailSchema } from '@/lib/validation/one-time-link';

export const EXPIRED_LINK = 'This link has expired or was already used. Ask for a new one below.';

/** The link from the confirmation mail: proves the address belongs to the person who signed up. */
export const confirmEmail = defineOperation({
  name: 'account.confirm-email',
  entityType: 'user',
  access: 'public',
  input: confirmEmailSchema,
  async run({ input, tx }) {
    const userId = await consumeToken(tx, input.token, 'verify_email');
    if (!userId) throw new AppError('not_found', EXPIRED_LINK);
    await tx.update(users).set({ emailVerified: new Date() }).where(eq(users.id, userId));
    return { data: { confirmed: true }, entityId: userId };
  },
});
