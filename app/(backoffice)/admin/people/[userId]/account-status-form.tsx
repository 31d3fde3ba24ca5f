'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { FormAlert } from '@/components/forms/form-alert';
import { Button } from '@/components/ui/button';
import { deactivateAccountAction, reactivateAccountAction } from '../actions';

export function AccountStatusForm({ userId, active, name }: { userId: string; active: boolean; name: string }) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);

  const change = () =>
    startTransition(async () => {
      const result = await (active ? deactivateAccountAction : reactivateAccountAction)({ userId });
      if (result.ok) {
        setConfirming(false);
        router.refresh();
      } else setError(result.message);
    });

  if (!active) {
    return (
      <div className="space-y-4">
        <p className="text-ink-soft">{name} cannot sign in. Their records and audit history are kept.</p>
        {error ? <FormAlert tone="error">{error}</FormAlert> : null}
        <Button type="button" variant="secondary" onClick={change} disabled={pending}>
          {pending ? 'Reactivating…' : 'Reactivate account'}
        </Button>
      </div>
    );
  }
  return (
    <div className="space-y-4">
      <p className="text-ink-soft">Deactivating refuses sign-in and ends every open session at once. Nothing they recorded is deleted.</p>
      {error ? <FormAlert tone="error">{error}</FormAlert> : null}
      {confirming ? (
        <div className="flex flex-wrap gap-2">
          <Button type="button" onClick={change} disabled={pending} className="!border-band-rebuild !bg-band-rebuild">
            {pending ? 'Deactivating…' : `Yes, deactivate ${name}`}
          </Button>
          <Button type="button" variant="quiet" onClick={() => setConfirming(false)} disabled={pending}>
            Keep active
          </Button>
        </div>
      ) : (
        <Button type="button" variant="secondary" onClick={() => setConfirming(true)}>
          Deactivate account
        </Button>
      )}
    </div>
  );
}
