'use client';

import { tailstockAlignmentFromIndicator } from '@/lib/scoring/measure/tailstock-alignment';
import { fromMillimetres, toMillimetres, type Length } from '@/lib/scoring/units/length';
import type { SectionUnit } from '@/lib/survey/section-unit';
import { formatLength } from './format-length';

const MOVE_WORDS = { 'toward-operator': 'toward you (the operator side)', 'away-from-operator': 'away from you', none: '' } as const;

/** The tailstock correction from the two indicator readings, worked out as they are typed. */
export function TailstockLiveResult({ nearHeadstock, nearTailstock, distance, unit }: { nearHeadstock?: Length; nearTailstock?: Length; distance?: Length; unit: SectionUnit }) {
  if (nearHeadstock?.value === undefined || nearTailstock?.value === undefined || !distance?.value) {
    return <p className="rounded-lg bg-paper-sunken px-3 py-3 text-ink-soft">The correction appears once both readings and the distance are in.</p>;
  }
  const result = tailstockAlignmentFromIndicator(toMillimetres(nearHeadstock), toMillimetres(nearTailstock), toMillimetres(distance));
  const show = (mm: number) => formatLength(fromMillimetres(mm, unit), unit);
  return (
    <div className="figures rounded-lg border-2 border-copper bg-copper-light px-4 py-3" data-testid="tailstock-correction" aria-live="polite">
      <p className="text-sm font-semibold uppercase tracking-wide text-copper-dark">Tailstock correction</p>
      {result.move === 'none' ? (
        <p className="text-lg font-semibold">In line over {show(result.overMm)}: no set-over needed.</p>
      ) : (
        <p className="text-lg">
          Tailstock end is <strong>{show(Math.abs(result.offsetMm))}</strong> {result.offsetMm > 0 ? 'toward you' : 'away from you'} over {show(result.overMm)}. Move the tailstock{' '}
          <strong>
            {MOVE_WORDS[result.move]} by {show(result.moveByMm)}
          </strong>
          .
        </p>
      )}
    </div>
  );
}
