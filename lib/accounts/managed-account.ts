import 'server-only';
import { eq } from 'drizzle-orm';
import { users } from '@/db/schema';
import type { Actor, Transaction } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';

/**
 * The account a coordinator is about to change. Coordinators never change their own role or
 * status: that is how the last coordinator would lock everyone out.
 */
export async function managedAccount(tx: Transaction, actor: Actor | null, userId: string) {
  if (actor?.id === userId) throw new AppError('forbidden', 'You cannot change your own account here. Ask another coordinator.');
  const [user] = await tx.select().from(users).where(eq(users.id, userId)).limit(1).for('update');
  if (!user) throw new AppError('not_found');
  return user;
}
