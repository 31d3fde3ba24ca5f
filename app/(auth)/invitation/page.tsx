import type { Metadata } from 'next';
import { FormAlert } from '@/components/forms/form-alert';
import { findTokenHolder } from '@/db/queries/user-tokens';
import { ROLE_LABELS } from '@/lib/roles';
import { linkToken } from '@/lib/validation/one-time-link';
import { PasswordFromLinkForm } from '../password-from-link-form';
import { acceptInvitationAction } from './actions';

export const metadata: Metadata = { title: 'Join Waygrade' };

export default async function InvitationPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  const parsed = linkToken.safeParse(token ?? '');
  const holder = parsed.success ? await findTokenHolder(parsed.data, 'invitation') : null;
  return (
    <>
      <h1 className="text-3xl font-semibold">Join Waygrade</h1>
      {holder ? (
        <>
          <p className="mb-6 mt-2 text-ink-soft">
            Welcome{holder.name ? `, ${holder.name.split(' ')[0]}` : ''}. You are joining as {ROLE_LABELS[holder.role].toLowerCase()} with{' '}
            <strong className="text-ink">{holder.email}</strong>. Choose a password to finish.
          </p>
          <PasswordFromLinkForm token={parsed.data!} email={holder.email} action={acceptInvitationAction} submitLabel="Save password and continue" />
        </>
      ) : (
        <div className="mt-4">
          <FormAlert tone="error">
            This invitation has expired or was already used. If you have set your password already, sign in; otherwise ask your Waygrade coordinator to
            invite you again.
          </FormAlert>
        </div>
      )}
    </>
  );
}
