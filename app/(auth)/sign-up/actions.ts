'use server';

import { signUp } from '@/lib/accounts/sign-up';
import { runAsCurrentUser } from '@/lib/auth/adapters';

export async function signUpAction(input: unknown) {
  return runAsCurrentUser(signUp, input);
}
