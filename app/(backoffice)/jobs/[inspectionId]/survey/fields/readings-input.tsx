'use client';

import { useId, useState } from 'react';
import { parseReading } from './number-input';

/**
 * Level readings, one box per station in the order taken (headstock end first). The survey gets the
 * list only while every box holds a number, so a half-typed reading never shifts the stations after it.
 */
export function ReadingsInput({
  label,
  hint,
  values,
  onChange,
  unitLabel = 'div',
}: {
  label: string;
  hint?: string;
  values: readonly number[] | undefined;
  onChange: (values: number[] | undefined) => void;
  unitLabel?: string;
}) {
  const id = useId();
  const [texts, setTexts] = useState<string[]>(() => (values?.length ? values.map(String) : ['']));
  const errors = texts.map((text) => parseReading(text, { min: -1000, max: 1000 }).error);

  function commit(next: string[]) {
    setTexts(next);
    const parsed = next.map((text) => parseReading(text, { min: -1000, max: 1000 }));
    const filled = next.map((text) => text.trim() !== '');
    // Trailing empty boxes are stations not read yet; an empty box in the middle holds the list back.
    const lastFilled = filled.lastIndexOf(true);
    const holesOrErrors = parsed.slice(0, lastFilled + 1).some((p, i) => p.error || !filled[i]);
    if (holesOrErrors) return;
    const numbers = parsed.slice(0, lastFilled + 1).map((p) => p.value!);
    onChange(numbers.length ? numbers : undefined);
  }

  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="font-medium">{label}</legend>
      {hint ? <p className="-mt-1 text-sm text-ink-soft">{hint}</p> : null}
      <ol className="grid grid-cols-2 gap-2 sm:grid-cols-4">
        {texts.map((text, index) => (
          <li key={index} className="flex flex-col">
            <label htmlFor={`${id}-${index}`} className="text-sm text-ink-soft">
              Station {index + 1}
            </label>
            <div className="flex">
              <input
                id={`${id}-${index}`}
                type="text"
                inputMode="text"
                autoComplete="off"
                enterKeyHint="next"
                value={text}
                aria-invalid={errors[index] ? true : undefined}
                onChange={(event) => commit(texts.map((t, i) => (i === index ? event.target.value : t)))}
                onKeyDown={(event) => {
                  if (event.key === 'Enter' && index === texts.length - 1 && text.trim() !== '') {
                    event.preventDefault();
                    setTexts([...texts, '']);
                    requestAnimationFrame(() => document.getElementById(`${id}-${index + 1}`)?.focus());
                  }
                }}
                className={`figures min-h-[52px] w-full min-w-0 rounded-l-lg border bg-paper-raised px-3 text-xl ${errors[index] ? 'border-band-rebuild' : 'border-line-strong'}`}
              />
              <span className="flex items-center rounded-r-lg border border-l-0 border-line-strong bg-paper-sunken px-2 text-sm text-ink-soft">{unitLabel}</span>
            </div>
            {errors[index] ? <span className="text-sm font-medium text-band-rebuild">{errors[index]}</span> : null}
          </li>
        ))}
      </ol>
      <div className="flex gap-2">
        <button
          type="button"
          onClick={() => {
            setTexts([...texts, '']);
            requestAnimationFrame(() => document.getElementById(`${id}-${texts.length}`)?.focus());
          }}
          className="min-h-touch rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken"
        >
          + Add station
        </button>
        {texts.length > 1 ? (
          <button type="button" onClick={() => commit(texts.slice(0, -1))} className="min-h-touch rounded-lg px-4 font-medium text-ink-soft hover:bg-paper-sunken">
            Remove last
          </button>
        ) : null}
      </div>
    </fieldset>
  );
}
