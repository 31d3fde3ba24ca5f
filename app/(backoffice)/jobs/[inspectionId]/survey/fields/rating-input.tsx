'use client';

import type { Rubric } from '@/lib/scoring';
import { ChoiceInput } from './choice-input';

/** A 0–3 rating on one of Waygrade's rubrics, each level with the words that define it. */
export function RatingInput({ label, rubric, value, onChange, hint }: { label: string; rubric: Rubric; value: number | undefined; onChange: (value: number | undefined) => void; hint?: string }) {
  return (
    <ChoiceInput
      label={label}
      hint={hint}
      columns={2}
      value={value}
      onChange={onChange}
      choices={rubric.levels.map((level) => ({ value: level.rating, label: `${level.rating} · ${level.label}`, meaning: level.meaning }))}
    />
  );
}
