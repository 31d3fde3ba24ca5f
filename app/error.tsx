'use client';

import { Button } from '@/components/ui/button';

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto flex min-h-[60vh] max-w-xl flex-col justify-center px-5 py-12">
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">Something went wrong</p>
      <h1 className="mt-2 text-3xl font-semibold">This page could not be shown.</h1>
      <p className="mt-3 text-ink-soft">
        Nothing you saved before has been lost. Try again in a moment; if it keeps happening, tell the coordinator
        {error.digest ? (
          <>
            {' '}and quote the reference <span className="figures font-medium text-ink">{error.digest}</span>
          </>
        ) : null}
        .
      </p>
      <div className="mt-8">
        <Button onClick={() => reset()}>Try again</Button>
      </div>
    </main>
  );
}
