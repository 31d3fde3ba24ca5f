'use client';

import { useActionState } from 'react';
import Link from 'next/link';
import { FormAlert } from '@/components/forms/form-alert';
import { Button } from '@/components/ui/button';
import { signInAction, type SignInState } from './actions';

const FIELD = 'mt-1 block w-full min-h-touch rounded-lg border border-line-strong bg-paper-raised px-3 text-base';

export function SignInForm({ callbackUrl }: { callbackUrl?: string }) {
  const [state, action, pending] = useActionState<SignInState, FormData>(signInAction, {});
  return (
    <form action={action} className="space-y-5" noValidate>
      <input type="hidden" name="callbackUrl" value={callbackUrl ?? ''} />
      <label className="block">
        <span className="font-medium">E-mail</span>
        <input name="email" type="email" autoComplete="email" required defaultValue={state.email} className={FIELD} />
      </label>
      <label className="block">
        <span className="font-medium">Password</span>
        <input name="password" type="password" autoComplete="current-password" required className={FIELD} />
      </label>
      {state.message ? (
        <FormAlert tone="error">
          {state.message}
          {state.unconfirmed ? (
            <>
              {' '}
              <Link href="/confirm-email" className="font-semibold underline underline-offset-4">
                Send the link again
              </Link>
            </>
          ) : null}
        </FormAlert>
      ) : null}
      <Button type="submit" disabled={pending} className="w-full">
        {pending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
