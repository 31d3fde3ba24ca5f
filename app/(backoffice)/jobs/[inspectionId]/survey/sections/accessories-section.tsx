'use client';

import { useState } from 'react';
import { ChoiceField, RatingField, TextField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { WEAR } from './rubrics';
import { FieldGroup } from './field-group';

const KINDS = [
  ['three-jaw-chuck', 'Three-jaw chuck'],
  ['four-jaw-chuck', 'Four-jaw chuck'],
  ['collet-chuck', 'Collet chuck'],
  ['faceplate', 'Faceplate'],
  ['fixed-steady', 'Fixed steady'],
  ['travelling-steady', 'Travelling steady'],
  ['tool-post', 'Tool post'],
  ['digital-readout', 'Digital readout'],
  ['taper-attachment', 'Taper attachment'],
  ['manuals', 'Manuals'],
  ['tooling', 'Tooling'],
  ['other', 'Other'],
] as const;

export function AccessoriesSection({ form }: { form: SurveyForm }) {
  const items = (form.get(['accessories']) as unknown[] | undefined) ?? [];
  // Inputs keep their own text; after a removal they start afresh so nothing shows in the wrong item.
  const [removals, setRemovals] = useState(0);
  return (
    <div className="flex flex-col gap-5">
      {items.map((_, index) => (
        <FieldGroup key={`${removals}-${index}`} title={`Item ${index + 1}`}>
          <ChoiceField form={form} path={['accessories', index, 'kind']} label="What it is" columns={2} choices={KINDS.map(([value, label]) => ({ value, label }))} />
          <TextField form={form} path={['accessories', index, 'description']} label="Size or note" hint="e.g. 160 mm, quick-change" />
          <RatingField form={form} path={['accessories', index, 'condition']} label="Condition" rubric={WEAR} />
          <button type="button" onClick={() => {
              form.set(['accessories', index], undefined);
              setRemovals((n) => n + 1);
            }} className="min-h-touch self-start rounded-lg px-3 font-medium text-ink-soft hover:bg-paper-sunken">
            Remove item {index + 1}
          </button>
        </FieldGroup>
      ))}
      {items.length === 0 ? <p className="text-ink-soft">No accessories listed yet.</p> : null}
      <button
        type="button"
        onClick={() => form.set(['accessories', items.length], { kind: 'three-jaw-chuck' })}
        className="min-h-touch self-start rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken"
      >
        + Add an accessory
      </button>
    </div>
  );
}
