'use client';

import { BandBadge } from '@/components/ui/band-badge';
import type { CheckResult } from '@/lib/scoring';

function describeMeasured(check: CheckResult) {
  if (!check.measured) return null;
  const measured = check.measured.text ?? `${Number(check.measured.value.toPrecision(4))} ${check.measured.unit}`;
  if (!check.permissible) return measured;
  return `${measured} · limit ${Number(check.permissible.value.toPrecision(4))} ${check.permissible.unit}`;
}

/** The library's reason a check could not be graded yet, without its standard closing sentence. */
function notMeasuredReason(check: CheckResult) {
  return check.explanation.text.replace(/^Not measured: /, '').replace(/\s*Counts against confidence.*$/, '');
}

/**
 * The bands of this screen's checks, graded by the scoring library in the browser from what is typed
 * so far. Unmeasured checks say so; nothing is assumed to pass.
 */
export function SectionChecks({ checks, state }: { checks: readonly CheckResult[]; state: 'loading' | 'needs-size' | 'ready' }) {
  return (
    <section aria-labelledby="section-checks-title" className="rounded-card border border-line bg-paper-raised p-4" data-testid="section-checks" data-state={state}>
      <h3 id="section-checks-title" className="text-lg font-semibold">
        Results so far
      </h3>
      {state === 'loading' ? (
        <p className="mt-2 text-ink-soft" role="status">
          Working out the bands…
        </p>
      ) : state === 'needs-size' ? (
        <p className="mt-2 text-ink-soft">Bands appear once the swing over bed and the distance between centres are set on the first screen.</p>
      ) : (
        <ul className="mt-2 divide-y divide-line">
          {checks.map((check) => (
            <li key={check.id} className="flex flex-wrap items-center justify-between gap-x-3 gap-y-1 py-2.5">
              <div className="min-w-0 flex-1">
                <p className="font-medium leading-snug">{check.label}</p>
                {check.status === 'measured' ? (
                  <p className="figures text-sm text-ink-soft">{describeMeasured(check)}</p>
                ) : (
                  <p className="text-sm text-ink-soft">{notMeasuredReason(check)}</p>
                )}
                {typeof check.details.safetyFinding === 'string' ? <p className="text-sm font-semibold text-band-rebuild">Fix before use: {check.details.safetyFinding}</p> : null}
              </div>
              <BandBadge band={check.band} size="sm" />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
