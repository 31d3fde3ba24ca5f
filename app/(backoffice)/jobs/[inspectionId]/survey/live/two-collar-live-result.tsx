'use client';

import { twoCollarTest } from '@/lib/scoring/measure/two-collar';
import { fromMillimetres, toMillimetres, type Length } from '@/lib/scoring/units/length';
import type { SectionUnit } from '@/lib/survey/section-unit';
import { formatLength } from './format-length';

const MOVE_WORDS = { 'toward-operator': 'toward you (the tool side)', 'away-from-operator': 'away from you', none: '' } as const;

/** Radial offset, taper and the tailstock set-over from the two collar diameters, shown as soon as both are typed. */
export function TwoCollarLiveResult({
  setup,
  nearHeadstock,
  nearTailstock,
  collarDistance,
  centresDistance,
  unit,
}: {
  setup?: 'between-centres' | 'in-chuck';
  nearHeadstock?: Length;
  nearTailstock?: Length;
  collarDistance?: Length;
  centresDistance?: Length;
  unit: SectionUnit;
}) {
  if (!setup || !nearHeadstock?.value || !nearTailstock?.value || !collarDistance?.value) {
    return <p className="rounded-lg bg-paper-sunken px-3 py-3 text-ink-soft">The offset appears once the set-up, both diameters and the collar distance are in.</p>;
  }
  const result = twoCollarTest({
    setup,
    diameterNearHeadstockMm: toMillimetres(nearHeadstock),
    diameterNearTailstockMm: toMillimetres(nearTailstock),
    collarDistanceMm: toMillimetres(collarDistance),
    ...(centresDistance?.value ? { centresDistanceMm: toMillimetres(centresDistance) } : {}),
  });
  const show = (mm: number) => formatLength(fromMillimetres(mm, unit), unit);
  const correction = result.tailstockCorrection;
  return (
    <div className="figures flex flex-col gap-2 rounded-lg border-2 border-copper bg-copper-light px-4 py-3" data-testid="two-collar-result" aria-live="polite">
      <p className="text-sm font-semibold uppercase tracking-wide text-copper-dark">Two-collar result</p>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-1">
        <dt>Diameter difference</dt>
        <dd className="text-right font-semibold">{show(result.diameterDifferenceMm)}</dd>
        <dt>Radial offset e</dt>
        <dd className="text-right text-lg font-semibold">{show(result.radialOffsetMm)}</dd>
        <dt>Taper on diameter</dt>
        <dd className="text-right font-semibold">{result.taperMmPerM.toFixed(3)} mm/m</dd>
      </dl>
      {correction ? (
        correction.move === 'none' ? (
          <p className="font-semibold">No taper: the tailstock needs no set-over.</p>
        ) : (
          <p className="text-lg">
            Move the tailstock <strong>{MOVE_WORDS[correction.move]} by {show(correction.byMm)}</strong>
            <span className="block text-sm text-ink-soft">{correction.basis}</span>
          </p>
        )
      ) : (
        <p className="text-ink-soft">Held in the chuck: the taper points at the headstock alignment, not the tailstock.</p>
      )}
    </div>
  );
}
