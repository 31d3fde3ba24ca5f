import 'server-only';
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { users, workshops } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { TOKEN_LIFETIME_MS, issueToken } from '@/lib/auth/one-time-tokens';
import { hashPassword } from '@/lib/auth/password';
import { isRateLimited, recordAttempt, subjectsFor } from '@/lib/auth/rate-limit';
import { AppError } from '@/lib/errors';
import { appLink } from '@/lib/mail/links';
import { enqueueEmail } from '@/lib/mail/outbox';
import { signUpSchema } from '@/lib/validation/sign-up';

/**
 * Sellers, buyers and dealers create their own account. The answer is the same for a new address
 * and one that already has an account (that one gets a mail instead), so the form cannot be used
 * to find out who uses Waygrade.
 */
export const signUp = defineOperation({
  name: 'account.sign-up',
  entityType: 'user',
  access: 'public',
  input: signUpSchema,
  async run({ input, ip, tx }) {
    // Refused alike for known and new addresses, so the limit tells nothing about who has an account.
    const subjects = subjectsFor('sign-up', input.email, ip);
    if (await isRateLimited(subjects)) throw new AppError('rate_limited');
    // Counted outside the transaction so that refused and failed requests count too.
    await recordAttempt(subjects);
    // Hash first in both cases so a known address does not answer faster.
    const passwordHash = await hashPassword(input.password);
    const [existing] = await tx.select({ id: users.id, name: users.name }).from(users).where(eq(users.email, input.email)).limit(1);
    if (existing) {
      await enqueueEmail(tx, {
        to: input.email,
        template: 'account-exists',
        data: { name: existing.name, signInUrl: appLink('/sign-in'), resetUrl: appLink('/forgot-password') },
      });
      return { data: { email: input.email }, entityId: existing.id, detail: { alreadyRegistered: true } };
    }
    const [workshop] = await tx
      .insert(workshops)
      .values({ name: input.businessName, town: input.town, region: input.region })
      .$returningId();
    const id = randomUUID();
    await tx.insert(users).values({ id, name: input.name, email: input.email, role: input.role, passwordHash, workshopId: workshop!.id });
    const token = await issueToken(tx, id, 'verify_email');
    await enqueueEmail(tx, {
      to: input.email,
      template: 'verify-email',
      data: { name: input.name, url: appLink('/confirm-email', { token }), expiresInHours: TOKEN_LIFETIME_MS.verify_email / 3_600_000 },
    });
    return { data: { email: input.email }, entityId: id, detail: { role: input.role } };
  },
});
