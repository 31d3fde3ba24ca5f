import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { users } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { accountStatusSchema } from '@/lib/validation/people';
import { managedAccount } from './managed-account';

/** Refuses sign-in from now on and ends open sessions: the session version moves past every token. */
export const deactivateAccount = defineOperation({
  name: 'user.deactivate',
  entityType: 'user',
  access: 'users.manage',
  input: accountStatusSchema,
  async run({ actor, input, tx }) {
    const user = await managedAccount(tx, actor, input.userId);
    if (!user.deactivatedAt) {
      await tx.update(users).set({ deactivatedAt: new Date(), sessionVersion: sql`${users.sessionVersion} + 1` }).where(eq(users.id, user.id));
    }
    return { data: { active: false }, entityId: user.id };
  },
});

export const reactivateAccount = defineOperation({
  name: 'user.reactivate',
  entityType: 'user',
  access: 'users.manage',
  input: accountStatusSchema,
  async run({ actor, input, tx }) {
    const user = await managedAccount(tx, actor, input.userId);
    if (user.deactivatedAt) await tx.update(users).set({ deactivatedAt: null }).where(eq(users.id, user.id));
    return { data: { active: true }, entityId: user.id };
  },
});
