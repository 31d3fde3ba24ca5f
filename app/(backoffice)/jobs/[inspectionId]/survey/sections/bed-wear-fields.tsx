'use client';

import { useState } from 'react';
import { WearProfilePlot } from '@/components/charts/wear-profile-plot';
import { wayWearProfile } from '@/lib/scoring/measure/way-wear';
import { toMillimetres, type Length } from '@/lib/scoring/units/length';
import { LengthField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { FieldGroup } from './field-group';

const at = (...path: (string | number)[]) => ['bedAndWays', ...path];

type Station = { distanceFromHeadstock?: Length; thickness?: Length };

/**
 * Bed wear two ways: the carriage-lock test (lightly lock the carriage at the headstock end and
 * move it toward the tailstock; where it binds the unworn ways begin) and way thickness by
 * micrometer at stations along the bed. The wear profile is drawn as the readings are typed.
 */
export function BedWearFields({ form }: { form: SurveyForm }) {
  const stations = (form.get(at('wayThickness', 'stations')) as Station[] | undefined) ?? [];
  const [removals, setRemovals] = useState(0);
  const bindsAt = form.get(at('carriageLockTest', 'bindsAtFromHeadstock')) as Length | undefined;
  const complete = stations.filter((s): s is Required<Station> => typeof s.distanceFromHeadstock?.value === 'number' && typeof s.thickness?.value === 'number');
  const wear = wayWearProfile(complete.map((s) => ({ xMm: toMillimetres(s.distanceFromHeadstock), thicknessMm: toMillimetres(s.thickness) })));
  const series =
    wear || bindsAt?.value !== undefined
      ? {
          xUnit: 'mm' as const,
          yUnit: 'µm' as const,
          points: wear ? wear.points.map((p) => ({ x: p.xMm, y: Math.round(p.wearMm * 10_000) / 10 })) : [],
          carriageBindsAtMm: bindsAt?.value !== undefined ? toMillimetres(bindsAt as Length) : null,
        }
      : null;
  return (
    <FieldGroup title="Bed wear" hint="Carriage-lock test and way thickness; the wear profile sits beside the level profile above.">
      <LengthField
        form={form}
        path={at('carriageLockTest', 'bindsAtFromHeadstock')}
        label="Locked carriage binds at, from the headstock"
        hint="Lock the carriage lightly near the chuck, move it toward the tailstock; note where it binds."
      />
      {stations.map((_, index) => (
        <div key={`${removals}-${index}`} className="grid grid-cols-2 gap-3 rounded-lg border border-line p-3">
          <LengthField form={form} path={at('wayThickness', 'stations', index, 'distanceFromHeadstock')} label={`Station ${index + 1}: from the headstock`} />
          <LengthField form={form} path={at('wayThickness', 'stations', index, 'thickness')} label="Way thickness" positive />
          <button
            type="button"
            onClick={() => {
              form.set(at('wayThickness', 'stations', index), undefined);
              setRemovals((n) => n + 1);
            }}
            className="col-span-2 min-h-touch self-start justify-self-start rounded-lg px-3 font-medium text-ink-soft hover:bg-paper-sunken"
          >
            Remove station {index + 1}
          </button>
        </div>
      ))}
      <button
        type="button"
        onClick={() => {
          // An empty station would be dropped at once, so a new one starts one step beyond the last.
          const last = stations[stations.length - 1]?.distanceFromHeadstock?.value;
          const step = form.unit === 'mm' ? 250 : 10;
          form.set(at('wayThickness', 'stations', stations.length), { distanceFromHeadstock: { value: last === undefined ? 0 : last + step, unit: form.unit } });
        }}
        className="min-h-touch self-start rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken"
      >
        + Add a thickness station
      </button>
      {series ? <WearProfilePlot series={series} /> : <p className="rounded-lg bg-paper-sunken px-3 py-3 text-ink-soft">The wear profile appears with two thickness stations or the carriage-lock distance.</p>}
    </FieldGroup>
  );
}
