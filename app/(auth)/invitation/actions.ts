'use server';

import { acceptInvitation } from '@/lib/accounts/set-password-from-link';
import { runAsCurrentUser } from '@/lib/auth/adapters';

export async function acceptInvitationAction(input: unknown) {
  return runAsCurrentUser(acceptInvitation, input);
}
