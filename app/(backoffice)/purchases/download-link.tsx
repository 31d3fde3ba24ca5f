/** A plain link to the PDF route (not next/link: the answer is a file, not a page). */
export function DownloadLink({ reportId, label = 'Download the PDF', quiet = false }: { reportId: number; label?: string; quiet?: boolean }) {
  const look = quiet
    ? 'border border-line-strong bg-paper-raised text-ink hover:bg-paper-sunken'
    : 'border border-copper bg-copper text-white hover:bg-copper-dark';
  return (
    <a
      href={`/api/reports/${reportId}/pdf`}
      download
      className={`inline-flex min-h-touch items-center justify-center gap-2 rounded-lg px-5 py-2 font-medium transition-colors ${look}`}
    >
      <svg aria-hidden="true" width="16" height="16" viewBox="0 0 24 24">
        <path d="M12 3v12m0 0-5-5m5 5 5-5M4 21h16" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
      </svg>
      {label}
    </a>
  );
}
