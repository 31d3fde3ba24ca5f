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

/**
 * "Forgot password": mails a reset link to an active account; the same answer for any address.
 * Too many requests from one address are refused. Per account the budget only limits mail: past it
 * no new link is made (a new one would end the last one mailed), so however many requests strangers
 * send for an account, its owner's mailbox holds a working link.
 */
export const requestPasswordReset = defineOperation({
  name: 'account.request-password-reset',
  entityType: 'user',
  access: 'public',
  input: emailRequestSchema,
  async run({ input, ip, tx }) {
    // Counted outside the transaction, so that requests count even when this one fails.
    const admission = await admitLinkRequest(input.email, ip);
    if (admission === 'refused') throw new AppError('rate_limited');
    const [user] = await tx.select().from(users).where(eq(users.email, input.email)).limit(1);
    if (!user || user.deactivatedAt) return { data: { email: input.email }, entityId: user?.id, detail: { sent: false } };
    if (admission === 'quiet') return { data: { email: input.email }, entityId: user.id, detail: { sent: false, reason: 'a link was mailed recently' } };
    const token = await issueToken(tx, user.id, 'reset_password');
    await enqueueEmail(tx, {
      to: user.email,
      template: 'reset-password',
      data: { name: user.name, url: appLink('/reset-password', { token }), expiresInMinutes: TOKEN_LIFETIME_MS.reset_password / 60_000 },
    });
    return { data: { email: input.email }, entityId: user.id, detail: { sent: true } };
  },
});
