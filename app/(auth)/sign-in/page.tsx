import type { Metadata } from 'next';
import { Logo } from '@/components/ui/logo';
import { SignInForm } from './sign-in-form';

export const metadata: Metadata = { title: 'Sign in' };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string }> }) {
  const { callbackUrl } = await searchParams;
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-5 py-12">
      <Logo />
      <h1 className="mt-8 text-3xl font-semibold">Sign in</h1>
      <p className="mb-6 mt-2 text-ink-soft">Sellers, inspectors, buyers, dealers and coordinators all sign in here.</p>
      <SignInForm callbackUrl={callbackUrl} />
    </main>
  );
}
