import type { Metadata } from 'next';
import Link from 'next/link';
import { SignUpForm } from './sign-up-form';

export const metadata: Metadata = { title: 'Create an account' };

export default function SignUpPage() {
  return (
    <>
      <h1 className="text-3xl font-semibold">Create an account</h1>
      <p className="mb-6 mt-2 text-ink-soft">
        For workshops selling machines, and for buyers and dealers. Inspectors and coordinators are invited by the Waygrade office.
      </p>
      <SignUpForm />
      <p className="mt-6 border-t border-line pt-4 text-ink-soft">
        Already have an account?{' '}
        <Link href="/sign-in" className="inline-flex min-h-touch items-center font-medium text-copper-dark underline-offset-4 hover:underline">
          Sign in
        </Link>
      </p>
    </>
  );
}
