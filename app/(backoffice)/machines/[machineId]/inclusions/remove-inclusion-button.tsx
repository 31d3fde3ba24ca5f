'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { removeInclusionAction } from './actions';

export function RemoveInclusionButton({ inclusionId, description }: { inclusionId: number; description: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  return (
    <>
      <Button
        variant="quiet"
        disabled={pending}
        aria-label={`Remove ${description}`}
        onClick={async () => {
          setPending(true);
          const result = await removeInclusionAction({ inclusionId });
          setPending(false);
          if (!result.ok) return setMessage(result.message);
          router.refresh();
        }}
      >
        Remove
      </Button>
      {message ? <span role="alert" className="text-sm text-band-rebuild">{message}</span> : null}
    </>
  );
}
