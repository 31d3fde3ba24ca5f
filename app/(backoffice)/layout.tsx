import type { ReactNode } from 'react';
import Link from 'next/link';
import { Logo } from '@/components/ui/logo';
import { requirePageSession } from '@/lib/auth/session';
import { ROLE_LABELS, ROLE_NAVIGATION } from '@/lib/roles';
import { signOutAction } from './sign-out-action';

export default async function BackofficeLayout({ children }: { children: ReactNode }) {
  const user = await requirePageSession();
  const navigation = ROLE_NAVIGATION[user.role];
  // A long menu (the coordinators' nine pages) gets a row of its own at every width rather than
  // squeezing against the name; short ones sit beside the logo from tablet width up.
  const ownRow = navigation.length > 5;
  return (
    <div className="min-h-screen">
      <header className="border-b border-line bg-paper-raised">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 px-5 py-1.5">
          <Logo href="/dashboard" />
          <nav
            aria-label="Main"
            className={`order-last -mx-2 flex w-full gap-1 overflow-x-auto ${ownRow ? 'border-t border-line pt-1' : 'md:order-none md:mx-0 md:w-auto md:flex-1'}`}
          >
            {navigation.map((item) => (
              <Link
                key={item.href}
                href={item.href}
                className="flex min-h-touch shrink-0 items-center rounded-lg px-3 font-medium text-ink-soft hover:bg-paper-sunken hover:text-ink"
              >
                {item.label}
              </Link>
            ))}
          </nav>
          <div className="ml-auto flex items-center gap-2">
            <span className="text-sm text-ink-soft">
              <span className="font-medium text-ink">{user.name ?? user.email}</span> · {ROLE_LABELS[user.role]}
            </span>
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
