'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/forms/field';
import { setListingStatusAction } from '../actions';

type Target = 'sold' | 'withdrawn' | 'listed';

const CONFIRM: Record<Exclude<Target, 'listed'>, { ask: string; button: string }> = {
  sold: { ask: 'Mark this machine as sold?', button: 'Yes, it is sold' },
  withdrawn: { ask: 'Take this machine off the market?', button: 'Yes, withdraw it' },
};

/** The seller's one-click listing changes; leaving the market says what happens to paid re-inspections. */
export function ListingStatusControl({ machineId, listingStatus }: { machineId: number; listingStatus: string }) {
  const router = useRouter();
  const [confirming, setConfirming] = useState<Exclude<Target, 'listed'> | null>(null);
  const [pending, setPending] = useState(false);
  const [message, setMessage] = useState<string | null>(null);

  async function change(target: Target) {
    setPending(true);
    const result = await setListingStatusAction({ machineId, listingStatus: target });
    setPending(false);
    if (!result.ok) return setMessage(result.message);
    setConfirming(null);
    setMessage(null);
    router.refresh();
  }

  if (listingStatus === 'sold' || listingStatus === 'withdrawn') {
    return (
      <div className="mt-4 flex flex-wrap items-center gap-3">
        <Button variant="secondary" disabled={pending} onClick={() => change('listed')}>
          Put back on the market
        </Button>
        <FormMessage message={message} />
      </div>
    );
  }
  if (listingStatus !== 'listed') return null;
  if (!confirming) {
    return (
      <div className="mt-4 flex flex-wrap gap-2">
        <Button variant="secondary" onClick={() => setConfirming('sold')}>
          Mark as sold…
        </Button>
        <Button variant="quiet" onClick={() => setConfirming('withdrawn')}>
          Withdraw from sale…
        </Button>
      </div>
    );
  }
  return (
    <div className="mt-4 space-y-3 rounded-lg border border-line p-4">
      <p className="font-medium">{CONFIRM[confirming].ask}</p>
      <p className="text-sm text-ink-soft">
        Buyers will no longer be offered re-inspections. Any paid re-inspection whose visit has not started is cancelled, its fee refunded and
        the inspector told. A visit already started goes on, with no automatic refund.
      </p>
      <FormMessage message={message} />
      <div className="flex gap-2">
        <Button disabled={pending} onClick={() => change(confirming)}>
          {pending ? 'Saving…' : CONFIRM[confirming].button}
        </Button>
        <Button type="button" variant="secondary" onClick={() => setConfirming(null)}>
          Keep it listed
        </Button>
      </div>
    </div>
  );
}
