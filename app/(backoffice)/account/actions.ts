'use server';

import { changePassword } from '@/lib/accounts/change-password';
import { runAsCurrentUser } from '@/lib/auth/adapters';

export async function changePasswordAction(input: unknown) {
  return runAsCurrentUser(changePassword, input);
}
