import 'server-only';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { db, primaryOf } from '@/db/client';
import { users } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import type { Role } from '@/lib/roles';
import { emailAddress } from '@/lib/validation/email-address';
import { readKnownDevice } from './known-device-cookie';
import { verifyPassword } from './password';
import { clearAttempts, limitedSubjects, recordAttempt, subjectsFor } from './rate-limit';

const credentialsSchema = z.object({ email: emailAddress, password: z.string().min(1).max(200) });

export type SignInRefusal = 'invalid_credentials' | 'rate_limited' | 'unconfirmed';
export type Authentication =
  | { ok: true; user: { id: string; name: string | null; email: string; role: Role; sessionVersion: number } }
  | { ok: false; reason: SignInRefusal };

async function audit(actorId: string | null, role: string | null, outcome: 'ok' | 'failed' | 'denied', ip: string | null, detail?: Record<string, unknown>) {
  try {
    await recordAudit(db, { actorId, actorRole: role, action: 'account.sign-in', entityType: 'user', entityId: actorId, outcome, ipAddress: ip, detail });
  } catch (error) {
    // The audit trail must not decide whether someone can sign in.
    console.error('[account.sign-in] audit write failed', error);
  }
}

/**
 * Checks an e-mail and password. The answer and the time taken are the same whether the account
 * exists or not: the hash compare always runs (against a dummy hash for unknown addresses), and
 * failures for unknown addresses are counted like any other.
 *
 * An address over its limit is refused. An account being slowed down (wrong passwords from anywhere,
 * see rate-limit.ts) refuses attempts inside its delay, except from a browser that signed in to this
 * account before (`knownDeviceAccountId`; unset, the request's signed cookie is read): strangers cannot
 * lock the owner out.
 */
export async function authenticate(raw: unknown, meta: { ip: string | null; now?: Date; knownDeviceAccountId?: string | null }): Promise<Authentication> {
  const now = meta.now ?? new Date();
  const parsed = credentialsSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, reason: 'invalid_credentials' };
  const { email, password } = parsed.data;
  const subjects = subjectsFor('sign-in', email, meta.ip);

  const limited = await limitedSubjects(subjects, now);
  // The primary: a password just changed or an account just deactivated must count at once.
  const [user] = await primaryOf(db).select().from(users).where(eq(users.email, email)).limit(1);
  const passwordMatches = await verifyPassword(password, user?.passwordHash);
  const deviceAccount = meta.knownDeviceAccountId === undefined ? await readKnownDevice() : meta.knownDeviceAccountId;
  const knownDevice = Boolean(user && deviceAccount === user.id);
  const slowedDown = limited.has('sign-in:account');

  if (limited.has('sign-in:ip') || (slowedDown && !knownDevice)) {
    await audit(user?.id ?? null, user?.role ?? null, 'denied', meta.ip, { reason: 'rate_limited', knownDevice });
    return { ok: false, reason: 'rate_limited' };
  }
  if (!user || !passwordMatches || user.deactivatedAt) {
    await recordAttempt(subjects, now);
    await audit(user?.id ?? null, user?.role ?? null, 'failed', meta.ip, user?.deactivatedAt ? { reason: 'deactivated' } : undefined);
    return { ok: false, reason: 'invalid_credentials' };
  }
  // Only someone who knows the password learns that the address still needs confirming.
  if (!user.emailVerified) {
    await audit(user.id, user.role, 'denied', meta.ip, { reason: 'unconfirmed' });
    return { ok: false, reason: 'unconfirmed' };
  }
  // The owner passing a slow-down on a known device leaves the strangers' count where it is.
  if (!slowedDown) await clearAttempts(subjects.filter((subject) => subject.name === 'sign-in:account'));
  await audit(user.id, user.role, 'ok', meta.ip, knownDevice ? { knownDevice } : undefined);
  return { ok: true, user: { id: user.id, name: user.name, email: user.email, role: user.role, sessionVersion: user.sessionVersion } };
}
