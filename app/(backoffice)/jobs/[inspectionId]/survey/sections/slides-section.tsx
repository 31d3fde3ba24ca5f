'use client';

import { ChoiceInput } from '../fields/choice-input';
import { LengthField, PlainNumberField, RatingField, YesNoField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { DIALS, WEAR } from './rubrics';
import { FieldGroup } from './field-group';

const at = (...path: string[]) => ['slidesAndScrews', ...path];

function BacklashFields({ form, slide, title }: { form: SurveyForm; slide: 'crossSlideBacklash' | 'topSlideBacklash'; title: string }) {
  const method = form.get(at(slide, 'method')) as 'length' | 'dial' | undefined;
  return (
    <FieldGroup title={title} hint="Turn the handle until the slide just moves, then back until it just moves the other way.">
      <ChoiceInput
        label="Read as"
        value={method}
        // A new method starts the reading afresh: the other method's figures would not fit it.
        onChange={(value) => form.set(at(slide), value ? { method: value } : undefined)}
        choices={[
          { value: 'length' as const, label: 'Indicator on the slide' },
          { value: 'dial' as const, label: 'Dial divisions' },
        ]}
      />
      {method === 'length' ? <LengthField form={form} path={at(slide, 'backlash')} label="Backlash" /> : null}
      {method === 'dial' ? (
        <>
          <PlainNumberField form={form} path={at(slide, 'divisions')} label="Divisions turned before the slide moves" unit="div" bounds={{ min: 0, max: 10_000 }} />
          <LengthField form={form} path={at(slide, 'graduation')} label="Value of one division, as engraved" positive />
          <YesNoField form={form} path={at(slide, 'readsDiameter')} label="Dial reads diameter?" hint="Yes when the slide moves half the engraved value" />
        </>
      ) : null}
    </FieldGroup>
  );
}

export function SlidesSection({ form }: { form: SurveyForm }) {
  return (
    <div className="flex flex-col gap-5">
      <BacklashFields form={form} slide="crossSlideBacklash" title="Cross-slide screw" />
      <BacklashFields form={form} slide="topSlideBacklash" title="Top-slide screw" />
      <FieldGroup title="Leadscrew, slides and dials">
        <LengthField form={form} path={at('leadscrewEndPlay')} label="Leadscrew end play" />
        <RatingField form={form} path={at('slideWear')} label="Slide dovetails and gibs" rubric={WEAR} />
        <RatingField form={form} path={at('dials')} label="Dials" rubric={DIALS} />
      </FieldGroup>
    </div>
  );
}
