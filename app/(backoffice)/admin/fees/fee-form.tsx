'use client';

import { useActionState } from 'react';
import { Button } from '@/components/ui/button';
import { saveFeeAction, type FeeFormState } from './actions';

export function FeeForm({ sizeClass, label, amount }: { sizeClass: string; label: string; amount: string }) {
  const [state, action, pending] = useActionState<FeeFormState, FormData>(saveFeeAction, {});
  const id = `fee-${sizeClass}`;
  return (
    <form action={action} className="flex flex-wrap items-end gap-3 py-4">
      <input type="hidden" name="sizeClass" value={sizeClass} />
      <label htmlFor={id} className="min-w-56 flex-1">
        <span className="font-medium">{label}</span>
        <span className="mt-1 flex items-center rounded-lg border border-line-strong bg-paper-raised px-3 focus-within:outline focus-within:outline-2 focus-within:outline-copper">
          <span aria-hidden="true" className="text-ink-soft">
            €
          </span>
          <input
            id={id}
            name="amount"
            inputMode="decimal"
            defaultValue={state.amount ?? amount}
            aria-invalid={state.message ? true : undefined}
            aria-describedby={`${id}-status`}
            className="figures min-h-touch w-full bg-transparent px-2 text-right outline-none"
          />
        </span>
      </label>
      <Button type="submit" disabled={pending} variant="secondary">
        {pending ? 'Saving…' : 'Save'}
      </Button>
      <p id={`${id}-status`} role="status" className={`w-full text-sm ${state.message ? 'text-band-rebuild' : 'text-band-true'}`}>
        {state.message ?? (state.saved ? '✓ Saved. New checkouts use this fee; orders already open keep theirs.' : '')}
      </p>
    </form>
  );
}
