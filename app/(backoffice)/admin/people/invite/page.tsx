import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePagePermission } from '@/lib/auth/session';
import { InviteForm } from './invite-form';

export const metadata: Metadata = { title: 'Invite someone' };

export default async function InvitePage() {
  await requirePagePermission('users.manage');
  return (
    <div className="max-w-lg">
      <Link href="/admin/people" className="inline-flex min-h-touch items-center text-ink-soft hover:text-ink">
        ← People
      </Link>
      <h1 className="mt-2 text-3xl font-semibold">Invite an inspector or coordinator</h1>
      <p className="mb-6 mt-2 text-ink-soft">
        We mail them a link to choose their own password. The link works for seven days. Sellers, buyers and dealers sign up by themselves.
      </p>
      <InviteForm />
    </div>
  );
}
