import Link from 'next/link';

/** A GET search for a maker or model on a list of machines; "Show all" clears it. */
export function MachineSearchForm({ action, q }: { action: string; q: string | undefined }) {
  return (
    <form method="get" action={action} role="search" className="mt-6 flex max-w-xl flex-wrap items-end gap-3">
      <label className="block min-w-0 flex-1">
        <span className="font-medium">Maker or model</span>
        <input
          name="q"
          type="search"
          defaultValue={q ?? ''}
          placeholder="e.g. Corvane CL-330"
          className="mt-1 block min-h-touch w-full rounded-lg border border-line-strong bg-paper-raised px-3 text-base"
        />
      </label>
      <button type="submit" className="min-h-touch rounded-lg border border-line-strong bg-paper-sunken px-5 font-medium hover:bg-line">
        Search
      </button>
      {q ? (
        <Link href={action} className="flex min-h-touch items-center px-2 font-medium text-ink-soft hover:text-ink">
          Show all
        </Link>
      ) : null}
    </form>
  );
}
