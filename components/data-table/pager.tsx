import Link from 'next/link';

/** Previous/next links for a list whose page number lives in the URL. */
export function Pager({ page, hasMore, href, summary }: { page: number; hasMore: boolean; href: (page: number) => string; summary?: string }) {
  if (page === 1 && !hasMore) return summary ? <p className="mt-3 text-sm text-ink-soft">{summary}</p> : null;
  const link = 'inline-flex min-h-touch items-center rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken';
  return (
    <nav aria-label="Pages" className="mt-4 flex flex-wrap items-center gap-3">
      {page > 1 ? (
        <Link href={href(page - 1)} className={link}>
          ← Previous
        </Link>
      ) : null}
      <span className="figures text-sm text-ink-soft">{summary ?? `Page ${page}`}</span>
      {hasMore ? (
        <Link href={href(page + 1)} className={link}>
          Next →
        </Link>
      ) : null}
    </nav>
  );
}
