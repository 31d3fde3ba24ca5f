import type { ReactNode } from 'react';
import Link from 'next/link';
import { Logo } from '@/components/ui/logo';
import { requirePageSession } from '@/lib/auth/session';
import { ROLE_LABELS, ROLE_NAVIGATION } from '@/lib/roles';
import { signOutAction } from './sign-out-action';

export default async function BackofficeLayout({ children }: { children: ReactNode }) {
  const user = await requirePageSession();
  return (
    <div className="min-h-screen">
      <header className="border-b border-line bg-paper-raised">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-5 py-2">
          <Logo href="/dashboard" />
          <nav aria-label="Main" className="flex flex-1 flex-wrap gap-1">
            {ROLE_NAVIGATION[user.role].map((item) => (
              <Link
                key={item.href}
                href={item.href}
                className="flex min-h-touch items-center rounded-lg px-3 font-medium text-ink-soft hover:bg-paper-sunken hover:text-ink"
              >
                {item.label}
              </Link>
            ))}
          </nav>
          <div className="flex items-center gap-3">
            <Link href="/account" className="flex min-h-touch items-center rounded-lg px-2 text-sm text-ink-soft hover:bg-paper-sunken" title="Your account">
              <span>
                <span className="font-medium text-ink">{user.name ?? user.email}</span> · {ROLE_LABELS[user.role]}
              </span>
            </Link>
            <form action={signOutAction}>
              <button type="submit" className="min-h-touch rounded-lg px-3 text-sm font-medium text-ink-soft hover:bg-paper-sunken hover:text-ink">
                Sign out
              </button>
            </form>
          </div>
        </div>
      </header>
      <main className="mx-auto max-w-6xl px-5 py-8">{children}</main>
    </div>
  );
}
