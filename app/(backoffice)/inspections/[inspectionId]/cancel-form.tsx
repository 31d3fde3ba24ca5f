'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { cancelBookingAction } from '../actions';

export function CancelForm({ inspectionId }: { inspectionId: number }) {
  const router = useRouter();
  const [reason, setReason] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  return (
    <form
      className="space-y-3"
      onSubmit={async (event) => {
        event.preventDefault();
        setPending(true);
        const result = await cancelBookingAction({ inspectionId, reason });
        setPending(false);
        if (!result.ok) return setMessage(result.fieldErrors?.reason?.[0] ?? result.message);
        router.refresh();
      }}
    >
      <Field id="reason" label="Reason for cancelling" hint="The seller sees this on their timeline.">
        <textarea id="reason" rows={2} value={reason} onChange={(e) => setReason(e.target.value)} className={`${INPUT_CLASS} py-2`} />
      </Field>
      <FormMessage message={message} />
      <Button type="submit" variant="secondary" disabled={pending}>
        {pending ? 'Cancelling…' : 'Cancel the inspection'}
      </Button>
    </form>
  );
}
