'use server';

import { AuthError } from 'next-auth';
import { signIn } from '@/lib/auth/config';
import { signInSchema } from '@/lib/validation/sign-in';

export type SignInState = { message?: string; email?: string };

/** Only same-site paths are followed after sign-in. */
function safeCallback(url: string | undefined) {
  return url && url.startsWith('/') && !url.startsWith('//') ? url : '/dashboard';
}

export async function signInAction(_previous: SignInState, formData: FormData): Promise<SignInState> {
  const parsed = signInSchema.safeParse(Object.fromEntries(formData));
  const email = String(formData.get('email') ?? '');
  if (!parsed.success) return { message: parsed.error.issues[0]?.message ?? 'Check the form', email };
  try {
    await signIn('credentials', {
      email: parsed.data.email,
      password: parsed.data.password,
      redirectTo: safeCallback(parsed.data.callbackUrl),
    });
    return {};
  } catch (error) {
    // The same answer whether the account exists or not.
    if (error instanceof AuthError) return { message: 'That e-mail and password do not match an active account.', email };
    throw error;
  }
}
