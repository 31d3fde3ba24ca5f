import type { ReactNode } from 'react';

export const INPUT_CLASS =
  'mt-1 block w-full min-h-touch rounded-lg border border-line-strong bg-paper-raised px-3 text-base text-ink placeholder:text-ink-faint aria-[invalid=true]:border-band-rebuild';

/** A labelled form control with its hint and error, wired for screen readers. */
export function Field({
  id,
  label,
  hint,
  error,
  children,
  className = '',
}: {
  id: string;
  label: string;
  hint?: string;
  error?: string;
  children: ReactNode;
  className?: string;
}) {
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
      {children}
      {error ? (
        <p id={`${id}-error`} className="mt-1 text-sm font-medium text-band-rebuild">
          {error}
        </p>
      ) : null}
    </div>
  );
}

export function FormMessage({ message, tone = 'error' }: { message?: string | null; tone?: 'error' | 'ok' }) {
  if (!message) return null;
  return (
    <p
      role={tone === 'error' ? 'alert' : 'status'}
      className={`rounded-lg border px-3 py-2 ${tone === 'error' ? 'border-band-rebuild/40 bg-band-rebuild/5 text-band-rebuild' : 'border-band-true/40 bg-band-true/5 text-band-true'}`}
    >
      {message}
    </p>
  );
}
