'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { startVisitAction } from './actions';

export function StartVisitButton({ inspectionId }: { inspectionId: number }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [problem, setProblem] = useState<string | null>(null);
  return (
    <div className="flex flex-col gap-2">
      <button
        type="button"
        disabled={pending}
        onClick={() =>
          startTransition(async () => {
            setProblem(null);
            const result = await startVisitAction(inspectionId);
            if (result.ok) router.push(`/jobs/${inspectionId}/survey`);
            else setProblem(result.message);
          })
        }
        className="min-h-[56px] rounded-lg bg-copper px-5 text-lg font-semibold text-white hover:bg-copper-dark disabled:opacity-60"
      >
        {pending ? 'Starting…' : 'I am on site — start the visit'}
      </button>
      {problem ? (
        <p role="alert" className="font-medium text-band-rebuild">
          {problem}
        </p>
      ) : null}
    </div>
  );
}
