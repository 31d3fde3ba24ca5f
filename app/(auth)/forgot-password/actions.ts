'use server';

import { requestPasswordReset } from '@/lib/accounts/request-password-reset';
import { runAsCurrentUser } from '@/lib/auth/adapters';

export async function requestPasswordResetAction(input: unknown) {
  return runAsCurrentUser(requestPasswordReset, input);
}
