import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import type { Role } from '@/db/schema/users';
import { hashPassword } from '@/lib/auth/password';
import type { Actor } from '@/lib/auth/operation';

export const TEST_PASSWORD = 'a spindle turns true';
let passwordHash: Promise<string> | undefined;

/** An address no other test (or earlier run) uses. */
export function uniqueEmail(prefix: string) {
  return `${prefix}-${randomUUID().slice(0, 8)}@tests.waygrade.example`;
}

export type TestAccount = { id: string; email: string; name: string; role: Role; password: string; actor: Actor };

/** A ready account straight in the database: confirmed and with a known password unless told otherwise. */
export async function createAccount(role: Role, options: { confirmed?: boolean; deactivated?: boolean; name?: string } = {}): Promise<TestAccount> {
  passwordHash ??= hashPassword(TEST_PASSWORD);
  const id = randomUUID();
  const name = options.name ?? `Test ${role} ${id.slice(0, 4)}`;
  const email = uniqueEmail(role);
  await db.insert(users).values({
    id,
    name,
    email,
    role,
    passwordHash: await passwordHash,
    emailVerified: options.confirmed === false ? null : new Date(),
    deactivatedAt: options.deactivated ? new Date() : null,
  });
  return { id, email, name, role, password: TEST_PASSWORD, actor: { id, role, name, email } };
}

export async function readAccount(id: string) {
  const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1);
  return row;
}
