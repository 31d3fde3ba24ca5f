'use client';

import { useId } from 'react';

export interface Choice<V extends string | number> {
  value: V;
  label: string;
  meaning?: string;
}

/**
 * One answer from a short list, as big buttons (gloved or oily fingers miss small radios).
 * Tapping the chosen answer again clears it: "not checked" is a valid state.
 */
export function ChoiceInput<V extends string | number>({
  label,
  hint,
  choices,
  value,
  onChange,
  columns = 2,
}: {
  label: string;
  hint?: string;
  choices: readonly Choice<V>[];
  value: V | undefined;
  onChange: (value: V | undefined) => void;
  columns?: 1 | 2 | 3 | 4;
}) {
  const id = useId();
  const grid = { 1: 'grid-cols-1', 2: 'grid-cols-2', 3: 'grid-cols-3', 4: 'grid-cols-2 sm:grid-cols-4' }[columns];
  return (
    <fieldset className="flex flex-col gap-1" aria-describedby={hint ? `${id}-hint` : undefined}>
      <legend className="mb-1 font-medium leading-snug">{label}</legend>
      {hint ? (
        <p id={`${id}-hint`} className="-mt-0.5 mb-1 text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      <div className={`grid gap-2 ${grid}`}>
        {choices.map((choice) => {
          const chosen = choice.value === value;
          return (
            <button
              key={String(choice.value)}
              type="button"
              aria-pressed={chosen}
              onClick={() => onChange(chosen ? undefined : choice.value)}
              className={`flex min-h-[52px] flex-col items-start justify-center rounded-lg border px-3 py-2 text-left transition-colors ${
                chosen ? 'border-copper bg-copper-light text-ink ring-2 ring-copper' : 'border-line-strong bg-paper-raised hover:bg-paper-sunken'
              }`}
            >
              <span className="font-semibold">
                {chosen ? <span aria-hidden="true">✓ </span> : null}
                {choice.label}
              </span>
              {choice.meaning ? <span className="text-sm leading-snug text-ink-soft">{choice.meaning}</span> : null}
            </button>
          );
        })}
      </div>
    </fieldset>
  );
}
