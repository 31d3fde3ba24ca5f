import type { Metadata } from 'next';
import Link from 'next/link';
import { ForgotPasswordForm } from './forgot-password-form';

export const metadata: Metadata = { title: 'Forgot your password' };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="text-3xl font-semibold">Forgot your password?</h1>
      <p className="mb-6 mt-2 text-ink-soft">Enter the address you sign in with. We will mail you a link to choose a new password.</p>
      <ForgotPasswordForm />
      <p className="mt-6 border-t border-line pt-4">
        <Link href="/sign-in" className="inline-flex min-h-touch items-center font-medium text-copper-dark underline-offset-4 hover:underline">
          Back to sign in
        </Link>
      </p>
    </>
  );
}
