'use client';

import { useActionState } from 'react';
import { Button } from '@/components/ui/button';
import { requestReinspectionAction, type ReinspectionRequestState } from './reinspection-actions';

export function ReinspectionButton({ reportId, price }: { reportId: number; price: string }) {
  const [state, action, pending] = useActionState<ReinspectionRequestState, FormData>(requestReinspectionAction, {});
  return (
    <form action={action} className="space-y-3">
      <input type="hidden" name="reportId" value={reportId} />
      <Button type="submit" variant="secondary" disabled={pending} className="w-full sm:w-auto">
        {pending ? 'Opening the payment page…' : `Request a re-inspection · ${price}`}
      </Button>
      {state.message ? (
        <p role="alert" className="rounded-lg border border-band-rebuild/40 bg-band-rebuild/5 px-3 py-2 text-band-rebuild">
          {state.message}
        </p>
      ) : null}
    </form>
  );
}
