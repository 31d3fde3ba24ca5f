/**
 * What a list page shows while its data loads. Only pages that never answer "not found" use it (as
 * their loading.tsx): above a notFound() a loading boundary starts the response with status 200
 * before the page can say 404.
 */
export function PageSkeleton() {
  return (
    <div role="status" aria-live="polite" className="mx-auto max-w-5xl px-5 py-12">
      <div className="h-8 w-64 animate-pulse rounded bg-paper-sunken" />
      <div className="mt-6 grid gap-4 sm:grid-cols-3">
        {[0, 1, 2].map((i) => (
          <div key={i} className="h-28 animate-pulse rounded-card bg-paper-sunken" />
        ))}
      </div>
      <span className="sr-only">Loading…</span>
    </div>
  );
}
