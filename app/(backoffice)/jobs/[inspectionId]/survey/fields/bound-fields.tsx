'use client';

import type { Rubric } from '@/lib/scoring';
import { DEVICE_STATES, OIL_LEVELS } from '@/lib/scoring/survey/rubric-levels';
import type { SurveyPath } from '@/lib/survey/survey-paths';
import { ChoiceInput, type Choice } from './choice-input';
import { NumberInput, type NumberBounds } from './number-input';
import { RatingInput } from './rating-input';
import { TextInput } from './text-input';
import type { SurveyForm } from './survey-form';

type Quantity = { value?: number; unit?: string };

/** Fields bound to a path in the survey. Lengths take the section's unit; other quantities carry their fixed unit. */
export function LengthField({ form, path, label, hint, signed = false, positive = false, required = false }: { form: SurveyForm; path: SurveyPath; label: string; hint?: string; signed?: boolean; positive?: boolean; required?: boolean }) {
  const current = form.get(path) as Quantity | undefined;
  const bounds: NumberBounds = signed ? { min: -100_000, max: 100_000 } : { min: 0, max: 100_000, positive };
  return (
    <NumberInput
      label={label}
      hint={hint}
      unit={form.unit}
      value={current?.value}
      bounds={bounds}
      required={required}
      onChange={(value) => form.set(path, value === undefined ? undefined : { value, unit: form.unit })}
    />
  );
}

export function QuantityField({ form, path, label, hint, unit, bounds }: { form: SurveyForm; path: SurveyPath; label: string; hint?: string; unit: string; bounds: NumberBounds }) {
  const current = form.get(path) as Quantity | undefined;
  return <NumberInput label={label} hint={hint} unit={unit} value={current?.value} bounds={bounds} onChange={(value) => form.set(path, value === undefined ? undefined : { value, unit })} />;
}

export function PlainNumberField({ form, path, label, hint, unit, bounds }: { form: SurveyForm; path: SurveyPath; label: string; hint?: string; unit?: string; bounds: NumberBounds }) {
  return <NumberInput label={label} hint={hint} unit={unit} value={form.get(path) as number | undefined} bounds={bounds} onChange={(value) => form.set(path, value)} />;
}

export function RatingField({ form, path, label, rubric, hint }: { form: SurveyForm; path: SurveyPath; label: string; rubric: Rubric; hint?: string }) {
  return <RatingInput label={label} hint={hint} rubric={rubric} value={form.get(path) as number | undefined} onChange={(value) => form.set(path, value)} />;
}

export function ChoiceField<V extends string | number>({ form, path, label, hint, choices, columns }: { form: SurveyForm; path: SurveyPath; label: string; hint?: string; choices: readonly Choice<V>[]; columns?: 1 | 2 | 3 | 4 }) {
  return <ChoiceInput label={label} hint={hint} choices={choices} columns={columns} value={form.get(path) as V | undefined} onChange={(value) => form.set(path, value)} />;
}

export function TextField({ form, path, label, hint, multiline, maxLength }: { form: SurveyForm; path: SurveyPath; label: string; hint?: string; multiline?: boolean; maxLength?: number }) {
  return <TextInput label={label} hint={hint} multiline={multiline} maxLength={maxLength} value={form.get(path) as string | undefined} onChange={(value) => form.set(path, value)} />;
}

const DEVICE_STATE_WORDS: Record<(typeof DEVICE_STATES)[number], string> = { works: 'Works', faulty: 'Faulty', missing: 'Not fitted' };
export const DEVICE_STATE_CHOICES: readonly Choice<string>[] = DEVICE_STATES.map((value) => ({ value, label: DEVICE_STATE_WORDS[value] }));

const OIL_LEVEL_WORDS: Record<(typeof OIL_LEVELS)[number], string> = { correct: 'Correct', low: 'Low', empty: 'Empty', overfull: 'Overfull' };
export const OIL_LEVEL_CHOICES: readonly Choice<string>[] = OIL_LEVELS.map((value) => ({ value, label: OIL_LEVEL_WORDS[value] }));

export function DeviceField(props: { form: SurveyForm; path: SurveyPath; label: string; hint?: string }) {
  return <ChoiceField {...props} choices={DEVICE_STATE_CHOICES} columns={3} />;
}

export function OilLevelField(props: { form: SurveyForm; path: SurveyPath; label: string; hint?: string }) {
  return <ChoiceField {...props} choices={OIL_LEVEL_CHOICES} columns={4} />;
}

/** A yes/no fact stored as a boolean; unanswered stays absent. */
export function YesNoField({ form, path, label, hint }: { form: SurveyForm; path: SurveyPath; label: string; hint?: string }) {
  const current = form.get(path) as boolean | undefined;
  return (
    <ChoiceInput
      label={label}
      hint={hint}
      columns={2}
      choices={[
        { value: 'yes', label: 'Yes' },
        { value: 'no', label: 'No' },
      ]}
      value={current === undefined ? undefined : current ? 'yes' : 'no'}
      onChange={(value) => form.set(path, value === undefined ? undefined : value === 'yes')}
    />
  );
}
