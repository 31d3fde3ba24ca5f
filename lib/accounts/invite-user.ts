import 'server-only';
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { users } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { TOKEN_LIFETIME_MS, issueToken } from '@/lib/auth/one-time-tokens';
import { AppError } from '@/lib/errors';
import { appLink } from '@/lib/mail/links';
import { enqueueEmail } from '@/lib/mail/outbox';
import { inviteUserSchema } from '@/lib/validation/people';

/** A coordinator adds an inspector or another coordinator; the person chooses a password from the mail. */
export const inviteUser = defineOperation({
  name: 'user.invite',
  entityType: 'user',
  access: 'users.manage',
  input: inviteUserSchema,
  async run({ actor, input, tx }) {
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, input.email)).limit(1);
    if (existing) {
      throw new AppError('invalid_input', 'This address already has a Waygrade account.', {
        email: ['This address already has an account. Change its role on the person’s page instead.'],
      });
    }
    const id = randomUUID();
    await tx.insert(users).values({ id, name: input.name, email: input.email, role: input.role, invitedById: actor!.id });
    const token = await issueToken(tx, id, 'invitation');
    await enqueueEmail(tx, {
      to: input.email,
      template: 'invitation',
      data: {
        name: input.name,
        role: input.role,
        invitedBy: actor!.name ?? 'A Waygrade coordinator',
        url: appLink('/invitation', { token }),
        expiresInDays: TOKEN_LIFETIME_MS.invitation / 86_400_000,
      },
    });
    return { data: { id }, entityId: id, detail: { role: input.role } };
  },
});
