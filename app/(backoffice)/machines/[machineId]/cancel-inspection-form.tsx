'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { cancelInspectionAction } from '../actions';

export function CancelInspectionForm({ inspectionId }: { inspectionId: number }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  if (!open) {
    return (
      <Button variant="quiet" className="mt-4" onClick={() => setOpen(true)}>
        Cancel this inspection…
      </Button>
    );
  }
  return (
    <form
      className="mt-4 space-y-3 rounded-lg border border-line p-4"
      onSubmit={async (event) => {
        event.preventDefault();
        setPending(true);
        const result = await cancelInspectionAction({ inspectionId, reason });
        setPending(false);
        if (!result.ok) return setMessage(result.fieldErrors?.reason?.[0] ?? result.message);
        router.refresh();
      }}
    >
      <Field id="cancel-reason" label="Why is it cancelled?" hint="The coordinator and the inspector will read this.">
        <textarea id="cancel-reason" rows={2} value={reason} onChange={(e) => setReason(e.target.value)} className={`${INPUT_CLASS} py-2`} />
      </Field>
      <FormMessage message={message} />
      <div className="flex gap-2">
        <Button type="submit" disabled={pending}>
          {pending ? 'Cancelling…' : 'Cancel inspection'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => setOpen(false)}>
          Keep it
        </Button>
      </div>
    </form>
  );
}
