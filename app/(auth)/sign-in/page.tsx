import type { Metadata } from 'next';
import Link from 'next/link';
import { FormAlert } from '@/components/forms/form-alert';
import { SignInForm } from './sign-in-form';

export const metadata: Metadata = { title: 'Sign in' };

/** Notices other pages send people here with, after a step that ends in signing in. */
const NOTICES = {
  'email-confirmed': 'Your address is confirmed. Sign in to start.',
  'password-set': 'Your password is saved. Sign in with it now.',
  'password-changed': 'Your password is changed and your other sessions have ended. Sign in with the new one.',
} as const;

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string; notice?: string }> }) {
  const { callbackUrl, notice } = await searchParams;
  const noticeText = notice && notice in NOTICES ? NOTICES[notice as keyof typeof NOTICES] : null;
  return (
    <>
      <h1 className="text-3xl font-semibold">Sign in</h1>
      <p className="mb-6 mt-2 text-ink-soft">Sellers, inspectors, buyers, dealers and coordinators all sign in here.</p>
      {noticeText ? (
        <div className="mb-5">
          <FormAlert tone="success">{noticeText}</FormAlert>
        </div>
      ) : null}
      <SignInForm callbackUrl={callbackUrl} />
      <div className="mt-6 flex flex-col gap-1 border-t border-line pt-4 text-ink-soft sm:flex-row sm:justify-between">
        <Link href="/forgot-password" className="flex min-h-touch items-center font-medium text-copper-dark underline-offset-4 hover:underline">
          Forgot your password?
        </Link>
        <Link href="/sign-up" className="flex min-h-touch items-center font-medium text-copper-dark underline-offset-4 hover:underline">
          New here? Create an account
        </Link>
      </div>
    </>
  );
}
