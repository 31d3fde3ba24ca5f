'use server';

import { AuthError, CredentialsSignin } from 'next-auth';
import { signIn } from '@/lib/auth/config';
import { safeCallbackPath } from '@/lib/auth/safe-callback-path';
import type { SignInRefusal } from '@/lib/auth/credentials';
import { signInSchema } from '@/lib/validation/sign-in';

export type SignInState = { message?: string; email?: string; unconfirmed?: boolean };

/** What a person is told for each refusal. Unknown address, wrong password and deactivated read the same. */
const REFUSALS: Record<SignInRefusal, string> = {
  invalid_credentials: 'That e-mail and password do not match an active account.',
  rate_limited: 'Too many attempts for this account. Wait a minute before trying again, or choose a new password.',
  unconfirmed: 'Please confirm your e-mail address first: open the link we mailed you when you signed up.',
};

export async function signInAction(_previous: SignInState, formData: FormData): Promise<SignInState> {
  const parsed = signInSchema.safeParse(Object.fromEntries(formData));
  const email = String(formData.get('email') ?? '');
  if (!parsed.success) return { message: parsed.error.issues[0]?.message ?? 'Check the form', email };
  try {
    await signIn('credentials', {
      email: parsed.data.email,
      password: parsed.data.password,
      // Only same-site paths are followed after sign-in.
      redirectTo: safeCallbackPath(parsed.data.callbackUrl),
    });
    return {};
  } catch (error) {
    if (error instanceof CredentialsSignin) {
      const reason = (error.code in REFUSALS ? error.code : 'invalid_credentials') as SignInRefusal;
      return { message: REFUSALS[reason], email, unconfirmed: reason === 'unconfirmed' };
    }
    if (error instanceof AuthError) return { message: REFUSALS.invalid_credentials, email };
    throw error;
  }
}
