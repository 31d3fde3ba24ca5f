import 'server-only';
import { eq } from 'drizzle-orm';
import { users } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { changeRoleSchema } from '@/lib/validation/people';
import { managedAccount } from './managed-account';

/** The session picks the new role up on its next request: the jwt callback re-reads it. */
export const changeRole = defineOperation({
  name: 'user.change-role',
  entityType: 'user',
  access: 'users.manage',
  input: changeRoleSchema,
  async run({ actor, input, tx }) {
    const user = await managedAccount(tx, actor, input.userId);
    if (user.role !== input.role) await tx.update(users).set({ role: input.role }).where(eq(users.id, user.id));
    return { data: { role: input.role }, entityId: user.id, detail: { from: user.role, to: input.role } };
  },
});
