import { REPORT_STATEMENTS, type DealBreaker } from '@/lib/scoring';

/**
 * Deal-breakers at the top of the report summary, whatever the overall grade. Readers of the full
 * report see each one with its evidence; others see that the report lists them, so nobody buys a
 * report unaware that it names a fault of this weight.
 */
export function DealBreakersPanel({ dealBreakers, showsFindings }: { dealBreakers: readonly DealBreaker[]; showsFindings: boolean }) {
  if (dealBreakers.length === 0) return null;
  const count = `${dealBreakers.length} deal-breaker${dealBreakers.length === 1 ? '' : 's'}`;
  return (
    <section aria-labelledby="deal-breakers-heading" className="mt-6 rounded-card border-2 border-band-rebuild bg-paper-raised p-5">
      <h2 id="deal-breakers-heading" className="flex items-center gap-2 text-xl font-semibold text-band-rebuild">
        <svg aria-hidden="true" width="20" height="20" viewBox="0 0 20 20">
          <rect x="1" y="1" width="18" height="18" rx="2" fill="currentColor" />
          <path d="M6 6l8 8M14 6l-8 8" stroke="white" strokeWidth="2.5" strokeLinecap="round" />
        </svg>
        Deal-breaker{dealBreakers.length === 1 ? '' : 's'}: {dealBreakers.length} found
      </h2>
      {showsFindings ? (
        <ul className="mt-3 space-y-2">
          {dealBreakers.map((d) => (
            <li key={d.id} data-deal-breaker={d.id}>
              <p className="font-semibold">{d.label}</p>
              <p className="text-ink-soft">{d.evidence}</p>
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-2">The full report names {count} and the evidence for each.</p>
      )}
      <p className="mt-3 text-sm text-ink-soft">{REPORT_STATEMENTS.dealBreakers}</p>
    </section>
  );
}
