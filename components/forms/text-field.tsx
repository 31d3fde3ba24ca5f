import { useId, type ComponentProps } from 'react';
import { Field, INPUT_CLASS } from './field';

/** A labelled input with its hint and its error, linked for screen readers (an id of its own). */
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
    <Field id={id} label={label} hint={hint} error={error} className={className}>
      <input id={id} aria-invalid={error ? true : undefined} aria-describedby={describedBy} className={INPUT_CLASS} {...input} />
    </Field>
  );
}
