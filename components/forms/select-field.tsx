import { useId, type ComponentProps } from 'react';

export function SelectField({
  label,
  error,
  options,
  className = '',
  ...select
}: ComponentProps<'select'> & { label: string; error?: string; options: ReadonlyArray<{ value: string; label: string }> }) {
  const id = useId();
  return (
    <div className={className}>
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={`mt-1 block w-full min-h-touch rounded-lg border bg-paper-raised px-3 text-base ${error ? 'border-band-rebuild' : 'border-line-strong'}`}
        {...select}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      {error ? (
        <p id={`${id}-error`} className="mt-1 text-sm font-medium text-band-rebuild">
          {error}
        </p>
      ) : null}
    </div>
  );
}
