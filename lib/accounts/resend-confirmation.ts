import 'server-only';
import { eq } from 'drizzle-orm';
import { users } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { TOKEN_LIFETIME_MS, issueToken } from '@/lib/auth/one-time-tokens';
import { admitLinkRequest } from '@/lib/auth/rate-limit';
import { AppError } from '@/lib/errors';
import { appLink } from '@/lib/mail/links';
import { enqueueEmail } from '@/lib/mail/outbox';
import { emailRequestSchema } from '@/lib/validation/email-request';

/** A fresh confirmation link; answers the same whether or not the address has an unconfirmed account. */
export const resendConfirmation = defineOperation({
  name: 'account.resend-confirmation',
  entityType: 'user',
  access: 'public',
  input: emailRequestSchema,
  async run({ input, ip, tx }) {
    // Counted outside the transaction, so that requests count even when this one fails. Past the
    // account's mail budget nothing new is mailed and the last confirmation link keeps working.
    const admission = await admitLinkRequest(input.email, ip);
    if (admission === 'refused') throw new AppError('rate_limited');
    const [user] = await tx.select().from(users).where(eq(users.email, input.email)).limit(1);
    if (!user || user.emailVerified || user.deactivatedAt || !user.passwordHash) return { data: { email: input.email }, entityId: user?.id, detail: { sent: false } };
    if (admission === 'quiet') return { data: { email: input.email }, entityId: user.id, detail: { sent: false, reason: 'a link was mailed recently' } };
    const token = await issueToken(tx, user.id, 'verify_email');
    await enqueueEmail(tx, {
      to: user.email,
      template: 'verify-email',
      data: { name: user.name, url: appLink('/confirm-email', { token }), expiresInHours: TOKEN_LIFETIME_MS.verify_email / 3_600_000 },
    });
    return { data: { email: input.email }, entityId: user.id, detail: { sent: true } };
  },
});
