import Link from 'next/link';

/** Waygrade's mark: a level vial over a way, drawn in the accent colour. */
export function Logo({ href = '/' }: { href?: string }) {
  return (
    <Link href={href} className="flex min-h-touch items-center gap-2 text-xl font-semibold tracking-tight text-ink">
      <svg aria-hidden="true" width="28" height="28" viewBox="0 0 28 28" className="text-copper">
        <rect x="2" y="17" width="24" height="5" rx="1.5" fill="currentColor" />
        <rect x="6" y="6" width="16" height="8" rx="4" fill="none" stroke="currentColor" strokeWidth="2" />
        <circle cx="14" cy="10" r="2" fill="currentColor" />
      </svg>
      Waygrade
    </Link>
  );
}
