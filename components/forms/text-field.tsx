import { useId, type ComponentProps } from 'react';

const INPUT =
  'mt-1 block w-full min-h-touch rounded-lg border bg-paper-raised px-3 text-base text-ink placeholder:text-ink-faint aria-[invalid=true]:border-band-rebuild';

/** A labelled input with its hint and its error, linked for screen readers. */
export function TextField({
  label,
  hint,
  error,
  className = '',
  ...input
}: ComponentProps<'input'> & { label: string; hint?: string; error?: string }) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      <input id={id} aria-invalid={error ? true : undefined} aria-describedby={describedBy} className={`${INPUT} ${error ? 'border-band-rebuild' : 'border-line-strong'}`} {...input} />
      {error ? (
        <p id={`${id}-error`} className="mt-1 text-sm font-medium text-band-rebuild">
          {error}
        </p>
      ) : null}
    </div>
  );
}
