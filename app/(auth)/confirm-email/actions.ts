'use server';

import { confirmEmail } from '@/lib/accounts/confirm-email';
import { resendConfirmation } from '@/lib/accounts/resend-confirmation';
import { runAsCurrentUser } from '@/lib/auth/adapters';

export async function confirmEmailAction(input: unknown) {
  return runAsCurrentUser(confirmEmail, input);
}

export async function resendConfirmationAction(input: unknown) {
  return runAsCurrentUser(resendConfirmation, input);
}
