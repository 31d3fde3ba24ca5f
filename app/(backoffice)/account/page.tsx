import type { Metadata } from 'next';
import { Card } from '@/components/ui/card';
import { requirePageSession } from '@/lib/auth/session';
import { ROLE_LABELS } from '@/lib/roles';
import { ChangePasswordForm } from './change-password-form';

export const metadata: Metadata = { title: 'Your account' };

export default async function AccountPage() {
  const user = await requirePageSession();
  return (
    <div className="max-w-lg">
      <h1 className="text-3xl font-semibold">Your account</h1>
      <p className="mt-1 text-ink-soft">
        {user.name ?? user.email} · {ROLE_LABELS[user.role]} · {user.email}
      </p>
      <Card title="Change your password" className="mt-6">
        <p className="mb-4 text-ink-soft">Changing it signs you out everywhere, including here; sign in again with the new one.</p>
        <ChangePasswordForm email={user.email ?? null} />
      </Card>
    </div>
  );
}
