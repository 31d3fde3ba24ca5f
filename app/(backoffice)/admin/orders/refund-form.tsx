'use client';

import { useActionState } from 'react';
import { Button } from '@/components/ui/button';
import { refundOrderAction, type RefundState } from './actions';

/** Refund with a reason the buyer will read; the buyer's access ends with it. */
export function RefundForm({ orderId, receipt }: { orderId: number; receipt: string }) {
  const [state, action, pending] = useActionState<RefundState, FormData>(refundOrderAction, {});
  if (state.refunded) return <p role="status" className="text-sm font-medium text-band-worn">↩ Refunded; the buyer has been told.</p>;
  return (
    <details className="group">
      <summary className="inline-flex min-h-touch cursor-pointer list-none items-center rounded-lg border border-line-strong px-3 text-sm font-medium hover:bg-paper-sunken">
        Refund…
      </summary>
      <form action={action} className="mt-2 space-y-2">
        <input type="hidden" name="orderId" value={orderId} />
        <label className="block text-sm">
          <span className="font-medium">Reason, sent to the buyer ({receipt})</span>
          <input name="reason" required minLength={3} maxLength={300} className="mt-1 block min-h-touch w-full rounded-lg border border-line-strong bg-paper-raised px-3" />
        </label>
        <Button type="submit" disabled={pending} className="text-sm">
          {pending ? 'Refunding…' : 'Refund and revoke access'}
        </Button>
        {state.message ? (
          <p role="alert" className="text-sm text-band-rebuild">
            {state.message}
          </p>
        ) : null}
      </form>
    </details>
  );
}
