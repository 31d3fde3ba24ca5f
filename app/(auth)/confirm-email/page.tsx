import type { Metadata } from 'next';
import { FormAlert } from '@/components/forms/form-alert';
import { findTokenHolder } from '@/db/queries/user-tokens';
import { linkToken } from '@/lib/validation/one-time-link';
import { ConfirmEmailButton } from './confirm-email-button';
import { ResendConfirmationForm } from './resend-confirmation-form';

export const metadata: Metadata = { title: 'Confirm your e-mail address' };

export default async function ConfirmEmailPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  const parsed = linkToken.safeParse(token ?? '');
  const usable = parsed.success && (await findTokenHolder(parsed.data, 'verify_email')) !== null;
  return (
    <>
      <h1 className="text-3xl font-semibold">Confirm your e-mail address</h1>
      {usable ? (
        <>
          <p className="mb-6 mt-2 text-ink-soft">One click and your account is ready to use.</p>
          <ConfirmEmailButton token={parsed.data!} />
        </>
      ) : (
        <>
          <div className="mb-6 mt-4">
            {token ? (
              <FormAlert tone="error">This link has expired or was already used. If you have not confirmed yet, ask for a new link.</FormAlert>
            ) : (
              <p className="text-ink-soft">Lost the mail? Enter the address you signed up with and we will send a new link.</p>
            )}
          </div>
          <ResendConfirmationForm />
        </>
      )}
    </>
  );
}
