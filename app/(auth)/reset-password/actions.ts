'use server';

import { resetPassword } from '@/lib/accounts/set-password-from-link';
import { runAsCurrentUser } from '@/lib/auth/adapters';

export async function resetPasswordAction(input: unknown) {
  return runAsCurrentUser(resetPassword, input);
}
