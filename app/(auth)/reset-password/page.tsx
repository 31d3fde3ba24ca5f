import type { Metadata } from 'next';
import Link from 'next/link';
import { FormAlert } from '@/components/forms/form-alert';
import { findTokenHolder } from '@/db/queries/user-tokens';
import { linkToken } from '@/lib/validation/one-time-link';
import { PasswordFromLinkForm } from '../password-from-link-form';
import { resetPasswordAction } from './actions';

export const metadata: Metadata = { title: 'Choose a new password' };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  const parsed = linkToken.safeParse(token ?? '');
  const holder = parsed.success ? await findTokenHolder(parsed.data, 'reset_password') : null;
  return (
    <>
      <h1 className="text-3xl font-semibold">Choose a new password</h1>
      {holder ? (
        <>
          <p className="mb-6 mt-2 text-ink-soft">
            For <strong className="text-ink">{holder.email}</strong>. Saving it signs this account out on every other device.
          </p>
          <PasswordFromLinkForm token={parsed.data!} email={holder.email} action={resetPasswordAction} submitLabel="Save new password" />
        </>
      ) : (
        <div className="mt-4 space-y-4">
          <FormAlert tone="error">This reset link has expired or was already used. Links work once and for an hour.</FormAlert>
          <Link href="/forgot-password" className="inline-flex min-h-touch items-center font-medium text-copper-dark underline-offset-4 hover:underline">
            Ask for a new link
          </Link>
        </div>
      )}
    </>
  );
}
