import type { ReactNode } from 'react';
import { Logo } from '@/components/ui/logo';

/** Sign-in, sign-up and the pages reached from mailed links share one quiet frame. */
export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-5 py-10">
      <Logo />
      <div className="mt-8">{children}</div>
    </main>
  );
}
