'use client';

import { useState } from 'react';
import { DeviceField, OilLevelField, QuantityField, RatingField, TextField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { DEBRIS, NOISE, WEAR } from './rubrics';
import { FieldGroup } from './field-group';

const at = (...path: (string | number)[]) => ['gearboxAndFeeds', ...path];

export function GearboxSection({ form }: { form: SurveyForm }) {
  const ranges = (form.get(at('noiseBySpeedRange')) as unknown[] | undefined) ?? [];
  // Inputs keep their own text; after a removal they start afresh so nothing shows in the wrong range.
  const [removals, setRemovals] = useState(0);
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="Oil">
        <OilLevelField form={form} path={at('sightGlassOilLevel')} label="Oil at the sight glass" />
        <RatingField form={form} path={at('drainPlugDebris')} label="Debris on the drain plug" rubric={DEBRIS} />
      </FieldGroup>
      <FieldGroup title="Noise in each speed range" hint="Run each range for a minute; rate by ear and, if you have a meter, dB(A) at 1 m.">
        {ranges.map((_, index) => (
          <div key={`${removals}-${index}`} className="flex flex-col gap-3 rounded-lg border border-line p-3">
            <TextField form={form} path={at('noiseBySpeedRange', index, 'range')} label={`Range ${index + 1} as marked`} hint="e.g. low, high, back gear" maxLength={60} />
            <RatingField form={form} path={at('noiseBySpeedRange', index, 'rating')} label="Noise" rubric={NOISE} />
            <QuantityField form={form} path={at('noiseBySpeedRange', index, 'soundLevel')} label="Sound level at 1 m" unit="dB(A)" bounds={{ min: 0, max: 150 }} />
            <button type="button" onClick={() => {
                form.set(at('noiseBySpeedRange', index), undefined);
                setRemovals((n) => n + 1);
              }} className="min-h-touch self-start rounded-lg px-3 font-medium text-ink-soft hover:bg-paper-sunken">
              Remove range {index + 1}
            </button>
          </div>
        ))}
        <button
          type="button"
          onClick={() => form.set(at('noiseBySpeedRange', ranges.length), { range: ranges.length === 0 ? 'low' : ranges.length === 1 ? 'high' : `range ${ranges.length + 1}` })}
          className="min-h-touch self-start rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken"
        >
          + Add a speed range
        </button>
      </FieldGroup>
      <FieldGroup title="Feeds and threads">
        <DeviceField form={form} path={at('feedsEngage')} label="Every feed range engages and drives" />
        <DeviceField form={form} path={at('threadRangesEngage')} label="Every thread range engages and drives" />
        <RatingField form={form} path={at('halfNut')} label="Half-nut" rubric={WEAR} />
        <RatingField form={form} path={at('feedClutch')} label="Feed clutch" rubric={WEAR} />
      </FieldGroup>
    </div>
  );
}
