'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { FormAlert } from '@/components/forms/form-alert';
import { Button } from '@/components/ui/button';
import { confirmEmailAction } from './actions';

// A button rather than confirming on page load: mail scanners that open links must not use them up.
export function ConfirmEmailButton({ token }: { token: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<string | null>(null);
  const confirm = () =>
    startTransition(async () => {
      const result = await confirmEmailAction({ token });
      if (result.ok) router.push('/sign-in?notice=email-confirmed');
      else setMessage(result.message);
    });
  return (
    <div className="space-y-4">
      {message ? <FormAlert tone="error">{message}</FormAlert> : null}
      <Button type="button" onClick={confirm} disabled={pending} className="w-full">
        {pending ? 'Confirming…' : 'Confirm my address'}
      </Button>
    </div>
  );
}
