'use client';

import { useId, useState } from 'react';

export interface NumberBounds {
  min?: number;
  /** Smallest allowed value is excluded (distances one divides by). */
  positive?: boolean;
  max?: number;
  integer?: boolean;
}

/** Reads what an inspector types: comma or point as decimal mark, spaces ignored. */
export function parseReading(text: string, bounds: NumberBounds): { value: number | undefined; error: string | null } {
  const cleaned = text.replace(/\s/g, '').replace(',', '.');
  if (cleaned === '') return { value: undefined, error: null };
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(cleaned)) return { value: undefined, error: 'Type a number, e.g. 0.012' };
  const value = Number(cleaned);
  if (bounds.integer && !Number.isInteger(value)) return { value: undefined, error: 'Type a whole number' };
  if (bounds.positive && value <= 0) return { value: undefined, error: 'Must be more than 0' };
  if (bounds.min !== undefined && value < bounds.min) return { value: undefined, error: `Must be at least ${bounds.min}` };
  if (bounds.max !== undefined && value > bounds.max) return { value: undefined, error: `Must be at most ${bounds.max.toLocaleString('en-GB')}` };
  return { value, error: null };
}

/**
 * A number field sized for a thumb: large text, tabular figures, the unit beside it. The text is
 * the inspector's own while typing; only a valid number reaches the survey, and a bad one is
 * named at once while the last good value stays saved.
 */
export function NumberInput({
  label,
  hint,
  unit,
  value,
  onChange,
  bounds = {},
  required = false,
}: {
  label: string;
  hint?: string;
  unit?: string;
  value: number | undefined;
  onChange: (value: number | undefined) => void;
  bounds?: NumberBounds;
  required?: boolean;
}) {
  const id = useId();
  const [text, setText] = useState(value === undefined ? '' : String(value));
  const [error, setError] = useState<string | null>(null);
  const signed = bounds.min === undefined || bounds.min < 0;

  function change(next: string) {
    setText(next);
    const parsed = parseReading(next, bounds);
    setError(parsed.error ?? (required && parsed.value === undefined ? 'Needed — the last value is kept until you type a new one' : null));
    if (parsed.error === null && !(required && parsed.value === undefined)) onChange(parsed.value);
  }

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-medium leading-snug">
        {label}
      </label>
      {hint ? <p className="-mt-0.5 text-sm text-ink-soft">{hint}</p> : null}
      <div className="flex items-stretch">
        <input
          id={id}
          type="text"
          inputMode={signed ? 'text' : 'decimal'}
          autoComplete="off"
          enterKeyHint="next"
          value={text}
          onChange={(event) => change(event.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className={`figures min-h-[52px] w-full min-w-0 rounded-l-lg border bg-paper-raised px-3 text-xl ${unit ? '' : 'rounded-r-lg'} ${
            error ? 'border-band-rebuild' : 'border-line-strong'
          }`}
        />
        {unit ? (
          <span className="flex min-w-[3.5rem] items-center justify-center rounded-r-lg border border-l-0 border-line-strong bg-paper-sunken px-3 text-lg text-ink-soft">
            {unit}
          </span>
        ) : null}
      </div>
      {error ? (
        <p id={`${id}-error`} className="text-sm font-medium text-band-rebuild">
          {error}
        </p>
      ) : null}
    </div>
  );
}
