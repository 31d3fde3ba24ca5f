'use client';

import { useState } from 'react';
import { ChoiceField, PlainNumberField, QuantityField, RatingField, TextField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { NOISE } from './rubrics';
import { FieldGroup } from './field-group';

const at = (...path: (string | number)[]) => ['powerRun', ...path];

const STATE_CHOICES = [
  { value: 'cold', label: 'Cold', meaning: 'not run yet today' },
  { value: 'warm', label: 'Warm', meaning: 'run long enough to warm the housings' },
] as const;

/**
 * When the spindle was first started: with the time each section's readings were taken, it tells
 * every measured section whether the machine was still cold or had warmed.
 */
function SpindleStartClock({ form }: { form: SurveyForm }) {
  const startedAt = form.get(at('startedAt')) as string | undefined;
  return (
    <div className="flex flex-col gap-2">
      <p className="font-medium">Spindle first started</p>
      <p className="figures text-ink-soft" data-spindle-started={startedAt ?? ''}>
        {startedAt ? `${new Date(startedAt).toISOString().slice(11, 16)} UTC` : 'Not marked yet: tap when you start the spindle.'}
      </p>
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          onClick={() => form.set(at('startedAt'), new Date().toISOString())}
          className="min-h-touch rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken"
        >
          {startedAt ? 'Mark the start again: now' : 'Spindle started: now'}
        </button>
        {startedAt ? (
          <button type="button" onClick={() => form.set(at('startedAt'), undefined)} className="min-h-touch rounded-lg px-3 font-medium text-ink-soft hover:bg-paper-sunken">
            Clear the start time
          </button>
        ) : null}
      </div>
    </div>
  );
}

/**
 * The power-run log: how warm the machine was at the start, how long it ran before the readings,
 * and noise and housing temperature in each speed range, each marked cold or warm, because
 * run-out, noise and play all change as a headstock warms.
 */
export function PowerRunSection({ form }: { form: SurveyForm }) {
  const ranges = (form.get(at('ranges')) as unknown[] | undefined) ?? [];
  const [removals, setRemovals] = useState(0);
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="Start">
        <ChoiceField form={form} path={at('startState')} label="Machine at the start" choices={STATE_CHOICES} />
        <PlainNumberField form={form} path={at('minutesRunBeforeReadings')} label="Minutes run before the readings" unit="min" bounds={{ min: 0, max: 600 }} />
        <SpindleStartClock form={form} />
      </FieldGroup>
      <FieldGroup title="Each speed range" hint="Run each range for a minute; rate the noise by ear; read the headstock housing with a contact or infrared thermometer.">
        {ranges.map((_, index) => (
          <div key={`${removals}-${index}`} className="flex flex-col gap-3 rounded-lg border border-line p-3">
            <TextField form={form} path={at('ranges', index, 'range')} label={`Range ${index + 1} as marked`} hint="e.g. low, high, back gear" maxLength={60} />
            <ChoiceField form={form} path={at('ranges', index, 'machineState')} label="Machine for this reading" choices={STATE_CHOICES} />
            <RatingField form={form} path={at('ranges', index, 'noise')} label="Noise" rubric={NOISE} />
            <QuantityField form={form} path={at('ranges', index, 'housingTemperatureRise')} label="Housing temperature above the room" unit="K" bounds={{ min: -50, max: 200 }} />
            <button
              type="button"
              onClick={() => {
                form.set(at('ranges', index), undefined);
                setRemovals((n) => n + 1);
              }}
              className="min-h-touch self-start rounded-lg px-3 font-medium text-ink-soft hover:bg-paper-sunken"
            >
              Remove range {index + 1}
            </button>
          </div>
        ))}
        <button
          type="button"
          onClick={() =>
            form.set(at('ranges', ranges.length), {
              range: ranges.length === 0 ? 'low' : ranges.length === 1 ? 'high' : `range ${ranges.length + 1}`,
              // A new range starts in the state the run is in now: warm once it has run a while.
              machineState: ((form.get(at('minutesRunBeforeReadings')) as number | undefined) ?? 0) > 0 ? 'warm' : ((form.get(at('startState')) as string | undefined) ?? 'cold'),
            })
          }
          className="min-h-touch self-start rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken"
        >
          + Add a speed range
        </button>
      </FieldGroup>
    </div>
  );
}
